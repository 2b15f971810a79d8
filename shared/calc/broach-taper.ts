import { z } from 'zod';
import { outsideBench, pushWarnings, withUnit as show, type BenchRange } from './bench-range';
import { cuttingFactor, pivotTilt, type HoleProfile } from './broach-geometry';
import type { Calculator, CalcStep } from './types';

export { cuttingFactor, taperFromDiameters, taperFromRatio } from './broach-geometry';

// Bounds keep every division finite; anything outside them is a slip of the keyboard, not a bench size.
export const BroachTaperInput = z.object({
  /** Diametral taper of the micrometer readings: millimetres of diameter per millimetre of length. */
  taperPerMm: z.number().positive().min(0.0001).max(0.5),
  /** Micrometer reading at the reference station the insertion depth is measured from. */
  refDiameterMm: z.number().positive().min(0.01).max(50),
  /** The hole's narrowest diameter: mid-plate when opened from both faces, the far face when opened from one. */
  targetDiameterMm: z.number().positive().min(0.01).max(50),
  plateThicknessMm: z.number().positive().min(0.01).max(50),
  pivotDiameterMm: z.number().positive().min(0.01).max(50),
  /** 0: a round broach, or readings that are already cutting diameters; 3–12: sides of the cutting broach measured. */
  broachSides: z
    .number()
    .int()
    .refine((n) => n === 0 || (n >= 3 && n <= 12), 'Enter 0 for a round broach, or 3 to 12 sides.')
    .default(0),
  openedFrom: z.enum(['both', 'one']).default('both'),
  /** Length of the pivot from its shoulder; shorter than the plate, it bears on this length only. */
  pivotLengthMm: z.number().positive().min(0.01).max(50).optional(),
});
export type BroachTaperInput = z.input<typeof BroachTaperInput>;

export interface BroachTaperResults {
  insertionDepthMm: number;
  /** Diameter at the face the broach enters. */
  entryDiameterMm: number;
  /** Cutting diameter ÷ micrometer reading for the broach's section. */
  cuttingFactor: number;
  cuttingTaperPerMm: number;
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
// Common practice, no source: what clock and watch work spans. Outside these the inputs are more likely a slip.
const BENCH_TAPER: BenchRange = { min: 0.002, max: 0.1 };
const BENCH_PIVOT_MM: BenchRange = { min: 0.05, max: 5 };
const BENCH_PLATE_MM: BenchRange = { min: 0.3, max: 12 };
const LONGEST_BROACH_MM = 150;
// A hole a quarter larger than its pivot no longer guides it; Hall's loose-looking watch fit is 8 %.
const LOOSEST_SHARE = 0.25;

/** Micrometer reading at `depthMm` past the reference station (negative depths lie towards the tip). */
export function diameterAtDepth(
  input: Pick<z.output<typeof BroachTaperInput>, 'taperPerMm' | 'refDiameterMm'>,
  depthMm: number,
): number {
  return input.refDiameterMm + input.taperPerMm * depthMm;
}

export const broachTaper: Calculator<typeof BroachTaperInput, BroachTaperResults> = {
  name: 'broach-taper',
  title: 'Broach taper',
  summary:
    'How far to push the broach so that the narrowest point of the hole is the size you want, what the faces come to, and the side shake and tilt the finished hole gives a pivot.',
  inputSchema: BroachTaperInput,
  compute(raw) {
    const input = BroachTaperInput.parse(raw);
    const { taperPerMm: k, refDiameterMm, targetDiameterMm: D, plateThicknessMm: t, pivotDiameterMm: d } = input;
    const both = input.openedFrom === 'both';
    const warnings: string[] = [];

    const factor = cuttingFactor(input.broachSides);
    const kc = factor * k;
    // The hole narrows from the entry face by k_c·t (one face) or k_c·t/2 (both faces, to mid-plate).
    const narrowing = both ? (kc * t) / 2 : kc * t;
    const entryDiameterMm = D + narrowing;
    const markReading = entryDiameterMm / factor;
    const insertionDepthMm = (markReading - refDiameterMm) / k;
    const oneSideTaperMm = kc * t;
    const twoSideTaperMm = (kc * t) / 2;
    const clearanceMm = D - d;
    const fits = clearanceMm >= 0;
    const radialShakeMm = fits ? clearanceMm / 2 : 0;
    const clearancePercent = (clearanceMm / d) * 100;
    const hole: HoleProfile = { narrowestMm: D, cuttingTaper: kc, thicknessMm: t, openedFrom: input.openedFrom };
    const tilt = pivotTilt(hole, d, input.pivotLengthMm);
    const tiltDeg = tilt.rad * DEG_PER_RAD;
    const tiltSmallAngleDeg = fits ? ((tilt.effectiveDiameterMm - d) / tilt.spanMm) * DEG_PER_RAD : 0;
    const halfAngleDeg = Math.atan(kc / 2) * DEG_PER_RAD;

    if (insertionDepthMm < 0) {
      warnings.push(
        `The broach cuts the entry face to ${show(entryDiameterMm, 'mm')} already at ${show(-insertionDepthMm, 'mm')} towards the tip from your reference mark: measure from a station nearer the tip.`,
      );
    }
    if (!fits) {
      warnings.push(
        `The pivot (${show(d, 'mm')}) is larger than the narrowest point of the hole (${show(D, 'mm')}): it will not go in, so shake and tilt are shown as 0.`,
      );
    } else if (clearanceMm > LOOSEST_SHARE * d) {
      warnings.push(
        `The hole is ${show(clearancePercent, '%')} larger than the pivot: that is no running fit for a pivot. Check both diameters.`,
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
    if (tilt.rad >= Math.PI / 2 - EPS) {
      warnings.push(
        'The pivot is too short for this hole to hold it upright: it could lie over. Give the pivot more length in the hole.',
      );
    }
    if (insertionDepthMm > LONGEST_BROACH_MM) {
      warnings.push(
        `An insertion depth of ${show(insertionDepthMm, 'mm')} is longer than clock broaches are: check the taper and the readings.`,
      );
    }
    pushWarnings(
      warnings,
      outsideBench('A taper', kc, BENCH_TAPER, 'mm/mm'),
      outsideBench('A pivot', d, BENCH_PIVOT_MM, 'mm'),
      outsideBench('A plate', t, BENCH_PLATE_MM, 'mm'),
    );

    const section =
      input.broachSides === 0
        ? 'round broach, or readings that are cutting diameters'
        : `${input.broachSides} sides, ${input.broachSides % 2 === 0 ? 'read corner to corner' : 'read corner to flat'}`;
    const where = both ? 'mid-plate' : 'the far face';
    const tiltForm = tilt.short
      ? `pivot shorter than the hole (engaged ${show(tilt.spanMm, 'mm')}): d·cos θ + ℓ·sin θ = D_eff`
      : `pivot longer than the hole (h = ${show(tilt.spanMm, 'mm')}): d + h·sin θ = D_eff·cos θ`;
    const steps: CalcStep[] = [
      {
        label: `Cutting diameter ÷ micrometer reading (${section})`,
        formula: 'f = 2 / (1 + cos(180°/n)) for odd n; 1 otherwise',
        result: factor.toFixed(4),
      },
      { label: 'Taper of the cutting diameter', formula: 'k_c = f·k', result: show(kc, 'mm/mm') },
      { label: 'Half-angle of the broach', formula: 'α = atan(k_c / 2)', result: show(halfAngleDeg, '°') },
      {
        label: `Entry face, with the narrowest point (${where}) at the target`,
        formula: both ? 'D_entry = D_target + k_c·t/2' : 'D_entry = D_target + k_c·t',
        result: show(entryDiameterMm, 'mm'),
      },
      { label: 'Micrometer reading at the mark', formula: 'D_entry / f', result: show(markReading, 'mm') },
      {
        label: 'Insertion depth',
        formula: 'x = (D_entry/f − D_ref) / k',
        result: show(insertionDepthMm, 'mm'),
      },
      { label: 'Taper left, opened from one side', formula: 'Δ = k_c·t', result: show(oneSideTaperMm, 'mm') },
      { label: 'Taper left, opened from both sides', formula: 'Δ = k_c·t / 2', result: show(twoSideTaperMm, 'mm') },
      { label: 'Diametral clearance at the narrowest point', formula: 'δ = D − d', result: show(clearanceMm, 'mm') },
      { label: 'Radial shake', formula: 'δ / 2', result: show(radialShakeMm, 'mm') },
      { label: 'Clearance as a share of the pivot', formula: '100·δ / d', result: show(clearancePercent, '%') },
      {
        label: 'Hole the tilt sees: mean diameter at the two contacts',
        formula: 'D_eff = (D at the face + D at the end of the engagement) / 2',
        result: show(tilt.effectiveDiameterMm, 'mm'),
      },
      {
        label: tilt.waistLimited ? 'Tilt, limited by the narrowest point' : `Tilt, ${tiltForm}`,
        formula: tilt.waistLimited ? 'cos θ = d / D_narrowest' : tiltForm,
        result: `${tiltDeg.toFixed(4)}°`,
      },
      { label: 'Tilt, small-angle form', formula: 'θ ≈ (D_eff − d) / length', result: show(tiltSmallAngleDeg, '°') },
    ];

    return {
      results: {
        insertionDepthMm,
        entryDiameterMm,
        cuttingFactor: factor,
        cuttingTaperPerMm: kc,
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
    'Across a broach with an odd number of sides the micrometer reads a corner and the opposite flat, less than the circle the corners cut: the cutting diameter is the reading × 2/(1 + cos(180°/n)), × 1.1056 for five sides. Across an even number it reads corner to corner, the cutting diameter itself.',
    'The target is the narrowest diameter of the hole: mid-plate when it is opened from both faces to the same mark, the far face when it is opened from one. The entry face is k_c·t/2 or k_c·t larger.',
    'The insertion depth runs along the broach from your reference station to the station that stands at the entry face when you stop; mark it, and stop when the mark reaches the face.',
    'The tilt takes the pivot in from the face the broach entered; it touches the hole at that face and at the end of its engagement, and passes the narrowest point between.',
    'Tilt is what one hole allows on its own; an arbor between two plates L apart tilts about tan θ ≈ (δ₁/2 + δ₂/2)/L.',
    'The ranges behind the "far outside bench practice" warnings are common practice, no source.',
  ],
  sources: [
    'horopedia.org "Broaches" (https://horopedia.org/?p=61100)',
    'time4u2.com clock-restoration page',
    'NAWCC forum thread "Bush or not" (mb.nawcc.org/threads/bush-or-not.194013), forum opinion',
    'E. E. Hall, A Treatise on Staff Making and Pivoting (c.1900), ch. on the pivot gauge',
    "a maker's workshop blog (weak source), for one measured smoothing-broach taper",
    'Corner-to-flat readings of odd-sided broaches: plane geometry (computed)',
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
