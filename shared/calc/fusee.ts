import { z } from 'zod';
import type { Calculator, CalcStep } from './types';

const STANDARD_GRAVITY = 9.80665;
// Daniels: the arbor is a third of the barrel diameter; warn only when it is clearly smaller.
const SMALLEST_USUAL_ARBOR_FRACTION = 0.9 / 3;
// A fill that loses more than this share of the half-fill turns deserves a second look.
const TURNS_LOSS_TO_WARN = 0.1;

const Size = z.number().positive().max(500);

const Reading = z.object({
  /** The sliding weight on the adjusting rod. */
  massG: z.number().positive().max(1e6),
  /** Where the weight balances, measured from the winding-square axis. */
  distanceMm: z.number().positive().max(5000),
});

export const FuseeInput = z
  .object({
    barrelDiameterMm: Size,
    arborDiameterMm: Size,
    springThicknessMm: z.number().positive().max(10),
    /** Left out: the length that fills half the free area of the barrel. */
    springLengthMm: z.number().positive().max(100000).optional(),
    /** Needed only for the beam-theory stiffness. */
    springWidthMm: z.number().positive().max(200).optional(),
    youngsModulusGPa: z.number().positive().max(1000).default(206),
    /** Adjusting-rod readings in winding order: the first at the first turn of winding, the last fully wound. */
    readings: z.array(Reading).max(100).default([]),
    /** Fusee radius at the weakest turn (the first reading). Left out: the barrel's chain radius. */
    maxRadiusMm: Size.optional(),
    /** Radius at which the chain pulls on the barrel. Left out: half the barrel diameter. */
    barrelRadiusMm: Size.optional(),
  })
  .superRefine((v, ctx) => {
    const R = v.barrelDiameterMm / 2;
    const r = v.arborDiameterMm / 2;
    if (r >= R) {
      ctx.addIssue({
        code: 'custom',
        path: ['arborDiameterMm'],
        message: 'The arbor must be smaller than the barrel.',
      });
      return;
    }
    if (v.springThicknessMm > R - r) {
      ctx.addIssue({
        code: 'custom',
        path: ['springThicknessMm'],
        message: 'The spring is thicker than the gap between arbor and barrel.',
      });
    }
    if (v.springLengthMm !== undefined && v.springLengthMm * v.springThicknessMm > Math.PI * (R * R - r * r)) {
      ctx.addIssue({
        code: 'custom',
        path: ['springLengthMm'],
        message: 'The spring is longer than the barrel can hold.',
      });
    }
  });
export type FuseeInput = z.input<typeof FuseeInput>;

export interface FuseeResults {
  springLengthMm: number;
  turns: number;
  coilsWoundUp: number;
  coilsRunDown: number;
  stiffnessNmmPerRad?: number;
  torquePerTurnNmm?: number;
  torqueCurve: { turn: number; springTorqueNmm: number }[];
  radiiMm: number[];
  fuseeTorqueNmm: number[];
  spreadBeforePercent: number;
  spreadAfterPercent: number;
}

const num = (n: number) => String(Number(n.toPrecision(5)));

/** (max − min)/mean × 100; zero for fewer than two values. */
function spreadPercent(values: number[]): number {
  if (values.length < 2) return 0;
  const mean = values.reduce((a, b) => a + b, 0) / values.length;
  return ((Math.max(...values) - Math.min(...values)) / mean) * 100;
}

/** Coils against the barrel wall and on the arbor, and the turns between, for a strip of area L·t. */
function barrelFill(R: number, r: number, t: number, L: number) {
  const area = (L * t) / Math.PI;
  const coilsRunDown = (R - Math.sqrt(Math.max(0, R * R - area))) / t;
  const coilsWoundUp = (Math.sqrt(r * r + area) - r) / t;
  return { coilsRunDown, coilsWoundUp, turns: coilsWoundUp - coilsRunDown };
}

export const fusee: Calculator<typeof FuseeInput, FuseeResults> = {
  name: 'fusee',
  title: 'Fusee and mainspring',
  summary:
    'Spring length and turns from the barrel, spring stiffness, the torque curve from adjusting-rod readings, and the fusee radii that even it out.',
  inputSchema: FuseeInput,
  compute(raw) {
    const input = FuseeInput.parse(raw);
    const { barrelDiameterMm: D, arborDiameterMm: d, springThicknessMm: t, youngsModulusGPa: E, readings } = input;
    const warnings: string[] = [];
    const steps: CalcStep[] = [];
    const R = D / 2;
    const r = d / 2;

    const halfFillLength = (Math.PI * (R * R - r * r)) / (2 * t);
    const springLengthMm = input.springLengthMm ?? halfFillLength;
    steps.push({
      label:
        input.springLengthMm === undefined
          ? 'Spring length (half the free area)'
          : 'Length at half fill, for comparison',
      formula: `L = π(R² − r²)/(2t) = π(${num(R)}² − ${num(r)}²) / (2 × ${num(t)}) mm`,
      result: `${num(halfFillLength)} mm`,
    });

    const fill = barrelFill(R, r, t, springLengthMm);
    steps.push(
      {
        label: 'Coils run down (against the barrel)',
        formula: `n_d = [R − √(R² − Lt/π)]/t`,
        result: num(fill.coilsRunDown),
      },
      { label: 'Coils wound up (on the arbor)', formula: `n_u = [√(r² + Lt/π) − r]/t`, result: num(fill.coilsWoundUp) },
      {
        label: 'Turns of the barrel',
        formula: `N = n_u − n_d = ${num(fill.coilsWoundUp)} − ${num(fill.coilsRunDown)}`,
        result: `${num(fill.turns)} turns`,
      },
    );
    const bestTurns = barrelFill(R, r, t, halfFillLength).turns;
    if (fill.turns < (1 - TURNS_LOSS_TO_WARN) * bestTurns) {
      warnings.push(
        `This spring gives ${num(fill.turns)} turns; a spring filling half the free area (${num(halfFillLength)} mm long) would give ${num(bestTurns)}.`,
      );
    }
    if (d < SMALLEST_USUAL_ARBOR_FRACTION * D) {
      warnings.push(
        'The arbor is smaller than about a third of the barrel diameter; the inner coil is bent hard and the spring may set.',
      );
    }

    const results: FuseeResults = {
      springLengthMm,
      turns: fill.turns,
      coilsWoundUp: fill.coilsWoundUp,
      coilsRunDown: fill.coilsRunDown,
      torqueCurve: [],
      radiiMm: [],
      fuseeTorqueNmm: [],
      spreadBeforePercent: 0,
      spreadAfterPercent: 0,
    };

    if (input.springWidthMm !== undefined) {
      const b = input.springWidthMm;
      const k = (E * 1000 * b * t ** 3) / (12 * springLengthMm);
      results.stiffnessNmmPerRad = k;
      results.torquePerTurnNmm = 2 * Math.PI * k;
      steps.push(
        {
          label: 'Stiffness (beam theory)',
          formula: `k = E·b·t³/(12L) = ${num(E * 1000)} N/mm² × ${num(b)} mm × (${num(t)} mm)³ / (12 × ${num(springLengthMm)} mm)`,
          result: `${num(k)} N·mm/rad`,
        },
        { label: 'Torque added per turn', formula: `M = 2π·k`, result: `${num(2 * Math.PI * k)} N·mm` },
      );
    }

    if (readings.length > 0) {
      const torques = readings.map((x) => (x.massG / 1000) * STANDARD_GRAVITY * x.distanceMm);
      const Rb = input.barrelRadiusMm ?? R;
      const rMax = input.maxRadiusMm ?? Rb;
      const tMin = Math.min(...torques);
      // Q = T·r/R_b is held at its value on the weakest turn, where the fusee is at its largest radius.
      const radiiMm = torques.map((T) => (rMax * tMin) / T);
      const fuseeTorqueNmm = torques.map((T, i) => (T * radiiMm[i]) / Rb);
      results.torqueCurve = torques.map((T, i) => ({ turn: i + 1, springTorqueNmm: T }));
      results.radiiMm = radiiMm;
      results.fuseeTorqueNmm = fuseeTorqueNmm;
      results.spreadBeforePercent = spreadPercent(torques);
      results.spreadAfterPercent = spreadPercent(fuseeTorqueNmm);
      steps.push(
        {
          label: 'Spring torque per reading',
          formula: 'T = m·g·x (m in kg, g = 9.80665 m/s², x in mm)',
          result: torques.map((T) => `${num(T)} N·mm`).join(', '),
        },
        {
          label: 'Chain tension on the weakest turn',
          formula: `F = T_min/R_b = ${num(tMin)} N·mm / ${num(Rb)} mm`,
          result: `${num(tMin / Rb)} N`,
        },
        {
          label: 'Fusee radii',
          formula: `r = r_max·T_min/T = ${num(rMax)} mm × ${num(tMin)} N·mm / T`,
          result: radiiMm.map((x) => `${num(x)} mm`).join(', '),
        },
        {
          label: 'Output torque at the fusee',
          formula: `Q = T·r/R_b`,
          result: `${num(fuseeTorqueNmm[0])} N·mm on every turn`,
        },
        {
          label: 'Spread of the spring torque',
          formula: '(max − min)/mean × 100',
          result: `${num(results.spreadBeforePercent)} %`,
        },
      );
      const falls = torques.findIndex((T, i) => i > 0 && T < torques[i - 1]);
      if (falls > 0) {
        warnings.push(
          `Reading ${falls + 1} is lower than reading ${falls}; the torque should rise as the spring is wound. Check that the readings run from the first turn of winding to the last.`,
        );
      }
      if (readings.length > Math.ceil(fill.turns) + 1) {
        warnings.push(
          `There are ${readings.length} readings but the barrel gives only about ${num(fill.turns)} turns; check the spring sizes.`,
        );
      }
    }
    return { results, warnings, steps };
  },
  assumptions: [
    'The spring fills half the free area of the barrel unless a length is given; this gives the most turns. Theory of Horology is said to put the practical length about 20 % longer (from memory, not read).',
    'Coils are packed tight against the barrel wall when run down and on the arbor when wound; the hook and the arbor hook are ignored.',
    'Stiffness uses beam theory for a straight strip, k = E·b·t³/(12L); real springs lose some torque to coil friction.',
    'Adjusting-rod readings are taken one per turn in winding order: the first at the first turn of winding (weakest), the last fully wound (strongest). The rod is balanced about the winding square, so the torque is the weight times its distance from the axis.',
    'Fusee radii hold the output torque at its value on the weakest turn: r = r_max·T_min/T, where r_max is the largest fusee radius (by default the barrel radius). The radii are to the centre line of the chain.',
    'The chain pulls on the barrel at half the barrel diameter unless a barrel radius is given; measure to the centre line of the chain for accuracy.',
    'Young’s modulus for spring steel defaults to 206 GPa.',
  ],
  sources: [
    'Daniels, Watchmaking, ch. 9 (worked example on watchmaking.weebly.com "The Mainsprings")',
    'Theory of Horology §4.2.5 (from memory / secondhand, not read)',
    'Tokai Bane "Flat springs formulas", Table 2, and "Flat spiral springs calculation examples"',
    'Wikipedia "Fusee (horology)"',
    'D. de Carle, Practical Clock Repairing; altrish.co.uk "Clock adjuster rod for measuring spring and fusee drive power" (2022)',
  ],
  cautions: [
    'Always let down a spring through the click with a let-down key. Never remove or insert a spring by hand; use a mainspring winder with the spring contained.',
    'Wear eye protection, and keep fingers out of the line of coils.',
    'Check the click, click spring and fusee stop-work before winding.',
    'A broken fusee chain under tension whips.',
    'Springs set if over-stressed. The 1/3-arbor rule limits bending of the inner coil.',
  ],
};
