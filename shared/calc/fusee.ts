import { z } from 'zod';
import { inBench, outsideBench, pushWarnings, type BenchRange } from './bench-range';
import { barrelFill, barrelFillSteps, halfFillLength, springStiffness } from './fusee-barrel';
import type { Calculator, CalcStep } from './types';

const STANDARD_GRAVITY = 9.80665;
// Daniels: the arbor is a third of the barrel diameter; warn only when it is clearly smaller.
const SMALLEST_USUAL_ARBOR_FRACTION = 0.9 / 3;
// A fill that loses more than this share of the half-fill turns deserves a second look.
const TURNS_LOSS_TO_WARN = 0.1;
// Common practice, no source: what clock fusees and their springs span. Outside these an input is likely a slip.
const BENCH_RADIUS_MM: BenchRange = { min: 0.5, max: 100 };
const BENCH_TORQUE_NMM: BenchRange = { min: 5, max: 20_000 };

const Size = z.number().positive().max(500);

const Reading = z.object({
  /** The sliding weight on the adjusting rod. */
  massG: z.number().positive().max(1e6),
  /** Where the weight balances, measured from the winding-square axis. */
  distanceMm: z.number().positive().max(5000),
});

export const FuseeInput = z
  .object({
    /** Inside diameter: with the arbor and the strip thickness it gives the spring length and turns. */
    barrelDiameterMm: Size.optional(),
    arborDiameterMm: Size.optional(),
    springThicknessMm: z.number().positive().max(10).optional(),
    /** Left out: the length that fills half the free area of the barrel. */
    springLengthMm: z.number().positive().max(100000).optional(),
    /** Needed only for the beam-theory stiffness. */
    springWidthMm: z.number().positive().max(200).optional(),
    youngsModulusGPa: z.number().positive().max(1000).default(206),
    /** Adjusting-rod readings in winding order: the first at the first turn of winding, the last fully wound. */
    readings: z.array(Reading).max(100).default([]),
    /** Fusee radius at the weakest turn (the first reading); with the readings it fixes every radius. */
    maxRadiusMm: Size.optional(),
    /** The chain's centre line on the barrel, measured. Left out: offered from the two inputs below when given. */
    chainRadiusMm: Size.optional(),
    barrelOutsideDiameterMm: Size.optional(),
    chainThicknessMm: z.number().positive().max(20).optional(),
  })
  .superRefine((v, ctx) => {
    const issue = (path: string, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
    const barrel = v.barrelDiameterMm !== undefined || v.arborDiameterMm !== undefined;
    if (!barrel && v.readings.length === 0 && v.springLengthMm === undefined) {
      issue('barrelDiameterMm', 'Give the barrel sizes, adjusting-rod readings, or both.');
    }
    if (barrel) {
      for (const key of ['barrelDiameterMm', 'arborDiameterMm', 'springThicknessMm'] as const) {
        if (v[key] === undefined) issue(key, 'The barrel, its arbor and the spring thickness go together.');
      }
    }
    if ((v.barrelOutsideDiameterMm === undefined) !== (v.chainThicknessMm === undefined)) {
      const missing = v.chainThicknessMm === undefined ? 'chainThicknessMm' : 'barrelOutsideDiameterMm';
      issue(missing, "The barrel's outside diameter and the chain's thickness go together.");
    }
    if (v.springWidthMm !== undefined && v.springThicknessMm === undefined) {
      issue('springThicknessMm', 'The stiffness needs the spring thickness as well as its width.');
    }
    const { barrelDiameterMm: D, arborDiameterMm: d, springThicknessMm: t } = v;
    if (D !== undefined && v.barrelOutsideDiameterMm !== undefined && v.barrelOutsideDiameterMm <= D) {
      issue('barrelOutsideDiameterMm', 'The outside diameter must be larger than the inside.');
    }
    if (D === undefined || d === undefined || t === undefined) return;
    const [R, r] = [D / 2, d / 2];
    if (r >= R) return issue('arborDiameterMm', 'The arbor must be smaller than the barrel.');
    if (t > R - r) issue('springThicknessMm', 'The spring is thicker than the gap between arbor and barrel.');
    if (v.springLengthMm !== undefined && v.springLengthMm * t > Math.PI * (R * R - r * r)) {
      issue('springLengthMm', 'The spring is longer than the barrel can hold.');
    }
  });
export type FuseeInput = z.input<typeof FuseeInput>;

export interface FuseeResults {
  /** Null without the barrel sizes or a given length. */
  springLengthMm: number | null;
  turns: number | null;
  coilsWoundUp: number | null;
  coilsRunDown: number | null;
  stiffnessNmmPerRad?: number;
  torquePerTurnNmm?: number;
  torqueCurve: { turn: number; springTorqueNmm: number }[];
  /** From the readings and the largest radius alone; empty without both. */
  radiiMm: number[];
  /** The chain radius used: measured, or offered from the barrel's outside and the chain; null without either. */
  chainRadiusMm: number | null;
  /** Chain tension per reading; empty without the chain radius. */
  chainTensionN: number[];
  /** Torque at the fusee arbor per reading; empty without the radii and the chain radius. */
  fuseeTorqueNmm: number[];
  spreadBeforePercent: number;
  /** Spread of T·r, the same share at any chain radius; null until the radii are known. */
  spreadAfterPercent: number | null;
}

const num = (n: number) => String(Number(n.toPrecision(5)));

/** (max − min)/mean × 100; zero for fewer than two values. */
function spreadPercent(values: number[]): number {
  if (values.length < 2) return 0;
  const mean = values.reduce((a, b) => a + b, 0) / values.length;
  return ((Math.max(...values) - Math.min(...values)) / mean) * 100;
}

function chainRadius(input: z.output<typeof FuseeInput>, steps: CalcStep[]): number | null {
  if (input.chainRadiusMm !== undefined) return input.chainRadiusMm;
  const { barrelOutsideDiameterMm: OD, chainThicknessMm: c } = input;
  if (OD === undefined || c === undefined) return null;
  const offered = OD / 2 + c / 2;
  steps.push({
    label: 'Chain radius on the barrel, offered (measure it to confirm)',
    formula: `R_c = OD/2 + c/2 = ${num(OD)}/2 + ${num(c)}/2`,
    result: `${num(offered)} mm`,
  });
  return offered;
}

export const fusee: Calculator<typeof FuseeInput, FuseeResults> = {
  name: 'fusee',
  title: 'Fusee and mainspring',
  summary:
    'Spring length and turns from the barrel, spring stiffness, the torque curve from adjusting-rod readings, and the fusee radii that even it out.',
  inputSchema: FuseeInput,
  compute(raw) {
    const input = FuseeInput.parse(raw);
    const { springThicknessMm: t, youngsModulusGPa: E, readings } = input;
    const warnings: string[] = [];
    const steps: CalcStep[] = [];
    const results: FuseeResults = {
      springLengthMm: input.springLengthMm ?? null,
      turns: null,
      coilsWoundUp: null,
      coilsRunDown: null,
      torqueCurve: [],
      radiiMm: [],
      chainRadiusMm: null,
      chainTensionN: [],
      fuseeTorqueNmm: [],
      spreadBeforePercent: 0,
      spreadAfterPercent: null,
    };

    const { barrelDiameterMm: D, arborDiameterMm: d } = input;
    if (D !== undefined && d !== undefined && t !== undefined) {
      const [R, r] = [D / 2, d / 2];
      const half = halfFillLength(R, r, t);
      const L = input.springLengthMm ?? half;
      const fill = barrelFill(R, r, t, L);
      Object.assign(results, { springLengthMm: L, ...fill });
      steps.push(...barrelFillSteps(R, r, t, input.springLengthMm !== undefined, fill));
      const bestTurns = barrelFill(R, r, t, half).turns;
      if (fill.turns < (1 - TURNS_LOSS_TO_WARN) * bestTurns) {
        warnings.push(
          `This spring gives ${num(fill.turns)} turns; a spring filling half the free area (${num(half)} mm long) would give ${num(bestTurns)}.`,
        );
      }
      if (d < SMALLEST_USUAL_ARBOR_FRACTION * D) {
        warnings.push(
          'The arbor is smaller than about a third of the barrel diameter; the inner coil is bent hard and the spring may set.',
        );
      }
    }
    if (input.springWidthMm !== undefined && t !== undefined && results.springLengthMm !== null) {
      const stiffness = springStiffness(E, input.springWidthMm, t, results.springLengthMm);
      results.stiffnessNmmPerRad = stiffness.stiffnessNmmPerRad;
      results.torquePerTurnNmm = stiffness.torquePerTurnNmm;
      steps.push(...stiffness.steps);
    }

    const Rc = chainRadius(input, steps);
    results.chainRadiusMm = Rc;
    if (readings.length > 0) {
      const torques = readings.map((x) => (x.massG / 1000) * STANDARD_GRAVITY * x.distanceMm);
      const tMin = Math.min(...torques);
      results.torqueCurve = torques.map((T, i) => ({ turn: i + 1, springTorqueNmm: T }));
      results.spreadBeforePercent = spreadPercent(torques);
      steps.push(
        {
          label: 'Spring torque per reading',
          formula: 'T = m·g·x (m in kg, g = 9.80665 m/s², x in mm)',
          result: torques.map((T) => `${num(T)} N·mm`).join(', '),
        },
        {
          label: 'Spread of the spring torque',
          formula: '(max − min)/mean × 100',
          result: `${num(results.spreadBeforePercent)} %`,
        },
      );
      if (input.maxRadiusMm !== undefined) {
        const rMax = input.maxRadiusMm;
        // T·r is held at its value on the weakest turn, where the fusee is at its largest radius.
        results.radiiMm = torques.map((T) => (rMax * tMin) / T);
        results.spreadAfterPercent = spreadPercent(torques.map((T, i) => T * results.radiiMm[i]));
        steps.push({
          label: 'Fusee radii (the readings and the largest radius alone)',
          formula: `r = r_max·T_min/T = ${num(rMax)} mm × ${num(tMin)} N·mm / T`,
          result: results.radiiMm.map((x) => `${num(x)} mm`).join(', '),
        });
      } else {
        steps.push({ label: 'Fusee radii', formula: 'r = r_max·T_min/T', result: 'give the largest radius' });
      }
      if (Rc !== null) {
        results.chainTensionN = torques.map((T) => T / Rc);
        steps.push({
          label: 'Chain tension',
          formula: `F = T/R_c, from ${num(tMin)} N·mm / ${num(Rc)} mm`,
          result: results.chainTensionN.map((F) => `${num(F)} N`).join(', '),
        });
        if (results.radiiMm.length > 0) {
          results.fuseeTorqueNmm = torques.map((T, i) => (T * results.radiiMm[i]) / Rc);
          steps.push({
            label: 'Output torque at the fusee',
            formula: 'Q = F·r = T·r/R_c',
            result: `${num(results.fuseeTorqueNmm[0])} N·mm on every turn`,
          });
        }
      }
      const falls = torques.findIndex((T, i) => i > 0 && T < torques[i - 1]);
      if (falls > 0) {
        warnings.push(
          `Reading ${falls + 1} is lower than reading ${falls}; the torque should rise as the spring is wound. Check that the readings run from the first turn of winding to the last.`,
        );
      }
      if (results.turns !== null && readings.length > Math.ceil(results.turns) + 1) {
        warnings.push(
          `There are ${readings.length} readings but the barrel gives only about ${num(results.turns)} turns; check the spring sizes.`,
        );
      }
      // One warning for the first figure out of range says enough; a list of them would bury the others.
      const extremeTorque = torques.find((T) => !inBench(T, BENCH_TORQUE_NMM));
      const extremeRadius = results.radiiMm.find((r) => !inBench(r, BENCH_RADIUS_MM));
      pushWarnings(
        warnings,
        extremeTorque === undefined ? null : outsideBench('A spring torque', extremeTorque, BENCH_TORQUE_NMM, 'N·mm'),
        extremeRadius === undefined ? null : outsideBench('A fusee radius', extremeRadius, BENCH_RADIUS_MM, 'mm'),
      );
    }
    if (Rc !== null) pushWarnings(warnings, outsideBench('A chain radius', Rc, BENCH_RADIUS_MM, 'mm'));
    return { results, warnings, steps };
  },
  assumptions: [
    'The spring fills half the free area of the barrel unless a length is given; this gives the most turns. Theory of Horology is said to put the practical length about 20 % longer (from memory, not read).',
    'Coils are packed tight against the barrel wall when run down and on the arbor when wound; the hook and the arbor hook are ignored.',
    'Stiffness uses beam theory for a straight strip, k = E·b·t³/(12L); real springs lose some torque to coil friction.',
    'Adjusting-rod readings are taken one per turn in winding order: the first at the first turn of winding (weakest), the last fully wound (strongest). The rod is balanced about the winding square, so the torque is the weight times its distance from the axis.',
    'Fusee radii need only the readings and the largest radius: r = r_max·T_min/T holds T·r, and so the output, at its value on the weakest turn. The radii are to the centre line of the chain.',
    "The chain pulls on the barrel at its own centre line, on the barrel's outside: outside radius + half the chain's thickness, not half the inside diameter. Measure it; the offered figure is a starting point.",
    'Young’s modulus for spring steel defaults to 206 GPa.',
    'The ranges behind the "far outside bench practice" warnings are common practice, no source.',
  ],
  sources: [
    'Daniels, Watchmaking, ch. 9 (worked example on watchmaking.weebly.com "The Mainsprings")',
    'Theory of Horology §4.2.5 (from memory / secondhand, not read)',
    'Tokai Bane "Flat springs formulas", Table 2 (E = 206×10³ N/mm² for spring steel)',
    'Wikipedia "Fusee (horology)"',
    'D. de Carle, Practical Clock Repairing; altrish.co.uk "Clock adjuster rod for measuring spring and fusee drive power" (2022)',
  ],
  cautions: [
    'Always let down a spring through the click with a let-down key. Never remove or insert a spring by hand; use a mainspring winder with the spring contained.',
    "A fusee's winding click is inside the fusee and cannot be lifted from the winding square: let the train run down under control with a let-down key on the fusee square as a brake, then let down the set-up at the barrel ratchet, with your mentor present.",
    'Wear eye protection, and keep fingers out of the line of coils.',
    'Check the click, click spring and fusee stop-work before winding.',
    'A broken fusee chain under tension whips.',
    'Springs set if over-stressed. The 1/3-arbor rule limits bending of the inner coil.',
  ],
};
