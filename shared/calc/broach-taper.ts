import { z } from 'zod';
import type { Calculator, CalcStep } from './types';

// Bounds keep every division finite; anything outside them is a slip of the keyboard, not a bench size.
export const BroachTaperInput = z.object({
  /** Diametral taper: millimetres of diameter per millimetre of length. */
  taperPerMm: z.number().positive().min(0.0001).max(0.5),
  /** Broach diameter at the reference station the insertion depth is measured from. */
  refDiameterMm: z.number().positive().min(0.01).max(50),
  targetDiameterMm: z.number().positive().min(0.01).max(50),
  plateThicknessMm: z.number().positive().min(0.01).max(50),
  pivotDiameterMm: z.number().positive().min(0.01).max(50),
});
export type BroachTaperInput = z.input<typeof BroachTaperInput>;

export interface BroachTaperResults {
  insertionDepthMm: number;
  oneSideTaperMm: number;
  twoSideTaperMm: number;
  clearanceMm: number;
  radialShakeMm: number;
  clearancePercent: number;
  tiltDeg: number;
  tiltSmallAngleDeg: number;
  halfAngleDeg: number;
}

const DEG_PER_RAD = 180 / Math.PI;
// Float subtraction (1.05 − 1.00) lands a hair off the round figure; this keeps range checks honest.
const EPS = 1e-9;
// Common practice, no source: many repairers aim for 0.02–0.05 mm clearance on a 0.8–2 mm clock pivot.
const USUAL_CLEARANCE_MM = { min: 0.02, max: 0.05 };
const USUAL_PIVOT_MM = { min: 0.8, max: 2 };

// Degrees sit on the figure (1.4°); every other unit takes a space (27.5 mm).
const show = (n: number, unit: string) => `${String(Number(n.toPrecision(4)))}${unit === '°' ? '' : ' '}${unit}`;

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

/** Broach diameter at `depthMm` past the reference station (negative depths lie towards the tip). */
export function diameterAtDepth(
  input: Pick<z.output<typeof BroachTaperInput>, 'taperPerMm' | 'refDiameterMm'>,
  depthMm: number,
): number {
  return input.refDiameterMm + input.taperPerMm * depthMm;
}

/** Tilt of a pivot of diameter d in a hole of diameter D and length h (pivot longer than the hole). */
function exactTiltRad(d: number, D: number, h: number): number {
  return Math.acos(Math.min(1, d / Math.hypot(h, D))) - Math.atan2(h, D);
}

export const broachTaper: Calculator<typeof BroachTaperInput, BroachTaperResults> = {
  name: 'broach-taper',
  title: 'Broach taper',
  summary:
    'How far to push the broach for a target hole, how much taper one-side and two-side broaching leave, and the side shake and tilt the finished hole gives a pivot.',
  inputSchema: BroachTaperInput,
  compute(raw) {
    const input = BroachTaperInput.parse(raw);
    const { taperPerMm: k, refDiameterMm, targetDiameterMm: D, plateThicknessMm: t, pivotDiameterMm: d } = input;
    const warnings: string[] = [];

    const insertionDepthMm = (D - refDiameterMm) / k;
    const oneSideTaperMm = k * t;
    const twoSideTaperMm = (k * t) / 2;
    const clearanceMm = D - d;
    const fits = clearanceMm >= 0;
    const radialShakeMm = fits ? clearanceMm / 2 : 0;
    const clearancePercent = (clearanceMm / d) * 100;
    const tiltDeg = fits ? exactTiltRad(d, D, t) * DEG_PER_RAD : 0;
    const tiltSmallAngleDeg = fits ? (clearanceMm / t) * DEG_PER_RAD : 0;
    const halfAngleDeg = Math.atan(k / 2) * DEG_PER_RAD;

    if (D < refDiameterMm) {
      warnings.push(
        `The target hole (${show(D, 'mm')}) is smaller than the broach at the reference station (${show(refDiameterMm, 'mm')}): the mark lies ${show(-insertionDepthMm, 'mm')} towards the tip. Measure from a station nearer the tip.`,
      );
    }
    if (!fits) {
      warnings.push(
        `The pivot (${show(d, 'mm')}) is larger than the hole (${show(D, 'mm')}): it will not go in, so shake and tilt are shown as 0.`,
      );
    } else if (
      d >= USUAL_PIVOT_MM.min &&
      d <= USUAL_PIVOT_MM.max &&
      (clearanceMm < USUAL_CLEARANCE_MM.min - EPS || clearanceMm > USUAL_CLEARANCE_MM.max + EPS)
    ) {
      warnings.push(
        `The hole is ${show(clearanceMm, 'mm')} larger than the pivot. Many repairers aim for 0.02–0.05 mm on a 0.8–2 mm clock pivot (common practice, no source).`,
      );
    }

    const steps: CalcStep[] = [
      { label: 'Half-angle of the broach', formula: 'α = atan(k / 2)', result: show(halfAngleDeg, '°') },
      { label: 'Insertion depth', formula: 'x = (D_target − D_ref) / k', result: show(insertionDepthMm, 'mm') },
      {
        label: 'Hole at the far face, opened from one side',
        formula: 'D_far = D_ref + k·(x − t)',
        result: show(diameterAtDepth(input, insertionDepthMm - t), 'mm'),
      },
      { label: 'Taper left, opened from one side', formula: 'Δ = k·t', result: show(oneSideTaperMm, 'mm') },
      { label: 'Taper left, opened from both sides', formula: 'Δ = k·t / 2', result: show(twoSideTaperMm, 'mm') },
      { label: 'Diametral clearance', formula: 'δ = D − d', result: show(clearanceMm, 'mm') },
      { label: 'Radial shake', formula: 'δ / 2', result: show(radialShakeMm, 'mm') },
      { label: 'Clearance as a share of the pivot', formula: '100·δ / d', result: show(clearancePercent, '%') },
      { label: 'Tilt in one hole', formula: 'θ = acos(d / √(h² + D²)) − atan2(h, D)', result: show(tiltDeg, '°') },
      { label: 'Tilt, small-angle form', formula: 'θ ≈ δ / h', result: show(tiltSmallAngleDeg, '°') },
    ];

    return {
      results: {
        insertionDepthMm,
        oneSideTaperMm,
        twoSideTaperMm,
        clearanceMm,
        radialShakeMm,
        clearancePercent,
        tiltDeg,
        tiltSmallAngleDeg,
        halfAngleDeg,
      },
      warnings,
      steps,
    };
  },
  assumptions: [
    'The taper is measured on your own broach: no published taper for commercial clock broaches was found. Take two micrometer readings 20–30 mm apart.',
    'The insertion depth runs along the broach from the station where it measures D_ref to the station that measures the target; stop when that mark reaches the plate face.',
    'A hole opened from one side is k·t smaller at the far face; opened from both sides to the same mark, it is k·t/2 smaller at mid-plate than at either face.',
    'Shake and tilt take the hole as a plain cylinder of the target diameter, as long as the plate is thick, with the pivot longer than the hole.',
    'Tilt is what one hole allows on its own; an arbor between two plates L apart tilts about tan θ ≈ (δ₁/2 + δ₂/2)/L.',
  ],
  sources: [
    'horopedia.org "Broaches" (https://horopedia.org/?p=61100)',
    'time4u2.com clock-restoration page',
    'NAWCC forum thread "Bush or not" (mb.nawcc.org/threads/bush-or-not.194013), forum opinion',
    'E. E. Hall, A Treatise on Staff Making and Pivoting (c.1900), ch. on the pivot gauge',
    "a maker's workshop blog (weak source), for one measured smoothing-broach taper",
    'Clearance of 0.02–0.05 mm on a 0.8–2 mm pivot: common practice, no source',
  ],
  cautions: [
    'Broaches are glass-hard and brittle. Use a handle, turn gently, never lever sideways, and wear eye protection.',
    'Keep the broach perpendicular to the plate, because cutting on one side moves the hole centre.',
    'Stop often and try the pivot; you cannot put metal back.',
    'Deburr and chamfer, then clean all chips out of the oil sink.',
    'Follow your workshop rules and local codes for eye protection and hand tools.',
  ],
};
