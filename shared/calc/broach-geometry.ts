/** Plane geometry behind the broach-taper calculator: the cutting broach's section, the broached hole, the tilt. */

/** Diametral taper from two micrometer readings taken `lengthMm` apart; null when they cannot give one. */
export function taperFromDiameters(d1: number, d2: number, lengthMm: number): number | null {
  const k = Math.abs(d2 - d1) / lengthMm;
  return Number.isFinite(k) && k > 0 ? k : null;
}

/** Diametral taper from text such as "1:50", "1/130" or "0.02"; null when the text is not a taper. */
export function taperFromRatio(text: string): number | null {
  const ratio = /^\s*(\d*\.?\d+)\s*[:/]\s*(\d*\.?\d+)\s*$/.exec(text);
  const plain = /^\s*(\d*\.?\d+)\s*$/.exec(text);
  const k = ratio ? Number(ratio[1]) / Number(ratio[2]) : plain ? Number(plain[1]) : NaN;
  return Number.isFinite(k) && k > 0 ? k : null;
}

/**
 * Cutting diameter ÷ micrometer reading for a broach of `sides` flat sides. Across an odd number of sides the anvils
 * touch a corner and the opposite flat, R(1 + cos(180°/n)), while the corners cut a circle of 2R; across an even
 * number they touch two corners, the cutting diameter itself. 0 stands for a round broach, or for readings that are
 * already cutting diameters.
 */
export function cuttingFactor(sides: number): number {
  if (sides === 0 || sides % 2 === 0) return 1;
  return 2 / (1 + Math.cos(Math.PI / sides));
}

export type OpenedFrom = 'both' | 'one';

/**
 * The broached hole along its length, from the face the pivot enters (s = 0) to the other (s = t). A hole opened from
 * both faces to the same mark is narrowest at mid-plate; opened from one face, it is narrowest at the far face. The
 * pivot is taken to enter from the face the broach entered, so a hole opened from one face is widest where it starts.
 */
export interface HoleProfile {
  narrowestMm: number;
  /** Taper of the cutting diameter, mm of diameter per mm of length. */
  cuttingTaper: number;
  thicknessMm: number;
  openedFrom: OpenedFrom;
}

export function holeDiameterAt(hole: HoleProfile, s: number): number {
  const { narrowestMm, cuttingTaper: k, thicknessMm: t } = hole;
  return hole.openedFrom === 'both' ? narrowestMm + k * Math.abs(s - t / 2) : narrowestMm + k * (t - s);
}

/**
 * The narrowest point the whole section of the pivot must pass: mid-plate or the far face for a pivot right through
 * the hole; mid-plate for a short pivot that reaches past it; none for a short pivot that ends before the waist, whose
 * narrowest point is where its end touches the wall (a contact already counted).
 */
function waistPassed(hole: HoleProfile, short: boolean, span: number): number | null {
  if (!short) return hole.narrowestMm;
  return hole.openedFrom === 'both' && span > hole.thicknessMm / 2 ? hole.narrowestMm : null;
}

/** Pivot longer than the hole h: d + h·sin θ = D·cos θ (TRADE.md §1). Radians; 0 when the pivot does not go in. */
export function tiltLongPivotRad(d: number, D: number, h: number): number {
  if (d >= D) return 0;
  return Math.acos(Math.min(1, d / Math.hypot(h, D))) - Math.atan2(h, D);
}

/**
 * Pivot shorter than the hole, engaged length ℓ: d·cos θ + ℓ·sin θ = D (TRADE.md §1), the smaller root. When D reaches
 * √(d² + ℓ²) nothing stops the pivot falling over, and a right angle is returned.
 */
export function tiltShortPivotRad(d: number, D: number, l: number): number {
  if (d >= D) return 0;
  const diagonal = Math.hypot(d, l);
  if (D >= diagonal) return Math.PI / 2;
  return Math.atan2(l, d) - Math.acos(D / diagonal);
}

export interface Tilt {
  rad: number;
  /** Whether the engaged length is shorter than the hole, so the short-pivot form was used. */
  short: boolean;
  /** The length over which the pivot touches the hole: the plate thickness or the engaged length. */
  spanMm: number;
  /** Mean of the hole diameters at the two contacts: the straight hole that allows the same tilt. */
  effectiveDiameterMm: number;
  /** True when the narrowest point, not the contacts at the ends, limits the tilt. */
  waistLimited: boolean;
}

/**
 * How far a pivot of diameter d leans in the broached hole. It touches opposite walls at the face it enters and at
 * the end of its engagement (the far face, or its own end when it is shorter than the hole); for a tapered hole the
 * sum of the two half-widths there, their mean diameter, takes the place of a straight hole's diameter. Where the
 * pivot passes the narrowest point whole, its tilted section, d / cos θ across, must pass there too.
 */
export function pivotTilt(hole: HoleProfile, d: number, pivotLengthMm?: number): Tilt {
  const short = pivotLengthMm !== undefined && pivotLengthMm < hole.thicknessMm;
  const span = short ? pivotLengthMm : hole.thicknessMm;
  const effective = (holeDiameterAt(hole, 0) + holeDiameterAt(hole, span)) / 2;
  const atContacts = short ? tiltShortPivotRad(d, effective, span) : tiltLongPivotRad(d, effective, span);
  const waist = waistPassed(hole, short, span);
  const atWaist = waist === null ? Math.PI / 2 : d >= waist ? 0 : Math.acos(d / waist);
  return {
    rad: Math.min(atContacts, atWaist),
    short,
    spanMm: span,
    effectiveDiameterMm: effective,
    waistLimited: atWaist < atContacts,
  };
}
