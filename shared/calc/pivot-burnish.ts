import { z } from 'zod';
import { outsideBench, pushWarnings, type BenchRange } from './bench-range';
import type { Calculator, CalcStep } from './types';

const SCHNEIDER = 'Schneider Co. "Coefficient of friction reference chart" (schneider-company.com)';
const HANDBOOK = 'machining handbook tables (from memory)';
const M_PER_FOOT = 0.3048;

export interface FrictionRow {
  pair: string;
  lubrication: string;
  mu: number;
  source: string;
}

const BRASS_ON_STEEL_LUBRICATED: FrictionRow = {
  pair: 'brass on steel',
  lubrication: 'lubricated / greasy',
  mu: 0.19,
  source: SCHNEIDER,
};

/** Static coefficients; the chart's own caution applies: values depend on the whole system. */
export const FRICTION_TABLE: readonly FrictionRow[] = [
  { pair: 'brass on steel', lubrication: 'clean / dry', mu: 0.51, source: SCHNEIDER },
  BRASS_ON_STEEL_LUBRICATED,
  { pair: 'brass on steel', lubrication: 'castor oil', mu: 0.11, source: SCHNEIDER },
  { pair: 'bronze on steel', lubrication: 'lubricated', mu: 0.16, source: SCHNEIDER },
];

export interface SurfaceSpeedRow {
  material: string;
  tool: 'HSS';
  sfm: number;
  mPerMin: number;
  source: string;
}

const speedRow = (material: string, sfm: number): SurfaceSpeedRow => ({
  material,
  tool: 'HSS',
  sfm,
  mPerMin: sfm * M_PER_FOOT,
  source: HANDBOOK,
});

// Arbors are usually tool steel (silver steel), so its row sets the default speed.
const TOOL_STEEL = speedRow('tool steel', 50);

/** Remembered handbook figures for HSS turning: a starting point, never a test oracle on their own. */
export const SURFACE_SPEED_TABLE: readonly SurfaceSpeedRow[] = [
  speedRow('brass and bronze', 150),
  speedRow('mild steel', 90),
  TOOL_STEEL,
];

export const PivotBurnishInput = z.object({
  loadN: z.number().positive().min(0.001).max(10_000),
  /** Shoulder to the centre of the load, about half the engaged length. */
  leverArmMm: z.number().positive().min(0.001).max(100),
  pivotDiameterMm: z.number().positive().min(0.01).max(50),
  /** Length of the pivot in the hole, for the bearing pressure. Defaults to 1.5 × the pivot diameter when left out. */
  bearingLengthMm: z.number().positive().min(0.01).max(100).optional(),
  /** Length of the pivot from its shoulder to its end; checked against the usual 1.5–2 × its diameter. */
  pivotLengthMm: z.number().positive().min(0.01).max(100).optional(),
  /** A cautious working figure for hardened and tempered arbor steel (common practice, no source). */
  allowableStressMPa: z.number().positive().min(1).max(5000).default(200),
  frictionCoefficient: z.number().nonnegative().max(2).default(BRASS_ON_STEEL_LUBRICATED.mu),
  surfaceSpeedMPerMin: z.number().positive().min(0.1).max(2000).default(TOOL_STEEL.mPerMin),
});
export type PivotBurnishInput = z.input<typeof PivotBurnishInput>;

export interface PivotBurnishResults {
  bendingStressMPa: number;
  minDiameterMm: number;
  bearingPressureMPa: number;
  frictionTorqueNmm: number;
  spindleRpm: number;
  /** Safety factor on bending: allowable stress ÷ working (bending) stress. */
  safetyFactor: number;
}

// Common practice, no source: a small bench lathe tops out at about this speed.
const SMALL_LATHE_TOP_RPM = 3000;
// Common practice, no source: pivot length about 1.5–2 × its diameter.
const PIVOT_LENGTH_RATIO = { min: 1.5, max: 2 };
const EPS = 1e-9;
// Common practice, no source: what clock pivots carry and are made in. Outside these an input is likely a slip.
const BENCH_LOAD_N: BenchRange = { min: 0.005, max: 200 };
const BENCH_PIVOT_MM: BenchRange = { min: 0.05, max: 5 };
const BENCH_ALLOWABLE_MPA: BenchRange = { min: 50, max: 1500 };

const show = (n: number, unit: string) => `${String(Number(n.toPrecision(4)))} ${unit}`.trim();

export const pivotBurnish: Calculator<typeof PivotBurnishInput, PivotBurnishResults> = {
  name: 'pivot-burnish',
  title: 'Pivot & burnish',
  summary:
    'Whether a pivot is thick enough for its load, the bearing pressure and friction torque it runs with, and the lathe speed for turning it.',
  inputSchema: PivotBurnishInput,
  compute(raw) {
    const input = PivotBurnishInput.parse(raw);
    const { loadN: F, leverArmMm: a, pivotDiameterMm: d, allowableStressMPa: allow } = input;
    const mu = input.frictionCoefficient;
    const v = input.surfaceSpeedMPerMin;
    const length = input.bearingLengthMm ?? 1.5 * d;
    const warnings: string[] = [];

    const momentNmm = F * a;
    const bendingStressMPa = (32 * momentNmm) / (Math.PI * d ** 3);
    const minDiameterMm = Math.cbrt((32 * momentNmm) / (Math.PI * allow));
    const bearingPressureMPa = F / (d * length);
    const frictionTorqueNmm = mu * F * (d / 2);
    const spindleRpm = (1000 * v) / (Math.PI * d);
    const safetyFactor = allow / bendingStressMPa;

    if (bendingStressMPa > allow) {
      warnings.push(
        `Bending stress ${show(bendingStressMPa, 'MPa')} is over the allowable ${show(allow, 'MPa')}: the pivot may bend or snap. Make it at least ${show(minDiameterMm, 'mm')}.`,
      );
    }
    const pivotLength = input.pivotLengthMm;
    if (pivotLength !== undefined) {
      const ratio = pivotLength / d;
      if (ratio < PIVOT_LENGTH_RATIO.min - EPS || ratio > PIVOT_LENGTH_RATIO.max + EPS) {
        warnings.push(
          `The pivot is ${show(ratio, '×')} its diameter long; about 1.5–2 × is usual (common practice, no source).`,
        );
      }
      if (input.bearingLengthMm !== undefined && input.bearingLengthMm > pivotLength + EPS) {
        warnings.push('The bearing length is longer than the pivot: a pivot bears only on its own length.');
      }
    }
    if (a > (pivotLength ?? length)) {
      warnings.push(
        pivotLength === undefined
          ? 'The lever arm is longer than the bearing length: the load centre lies beyond the end of the pivot.'
          : 'The lever arm is longer than the pivot: the load centre lies beyond its end.',
      );
    }
    pushWarnings(
      warnings,
      outsideBench('A pivot load', F, BENCH_LOAD_N, 'N'),
      outsideBench('A pivot', d, BENCH_PIVOT_MM, 'mm'),
      outsideBench('An allowable stress', allow, BENCH_ALLOWABLE_MPA, 'MPa'),
    );
    if (spindleRpm > SMALL_LATHE_TOP_RPM) {
      warnings.push(
        `${show(spindleRpm, 'rpm')} is more than a small lathe gives (about ${SMALL_LATHE_TOP_RPM} rpm): the lathe's top speed will be the limit.`,
      );
    }

    const steps: CalcStep[] = [
      { label: 'Bending moment at the shoulder', formula: 'M = F·a', result: show(momentNmm, 'N·mm') },
      { label: 'Bending stress', formula: 'σ = 32M / (π·d³)', result: show(bendingStressMPa, 'MPa') },
      {
        label: 'Smallest safe diameter',
        formula: 'd_min = (32·F·a / (π·σ_allow))^(1/3)',
        result: show(minDiameterMm, 'mm'),
      },
      {
        label:
          raw.allowableStressMPa === undefined
            ? 'Allowable stress (200 MPa: common practice, no source)'
            : 'Allowable stress (as given)',
        formula: 'σ_allow',
        result: show(allow, 'MPa'),
      },
      {
        label: 'Safety factor on bending: allowable stress ÷ working stress',
        formula: 'σ_allow / σ',
        result: show(safetyFactor, ''),
      },
      {
        label: input.bearingLengthMm === undefined ? 'Bearing length (taken as 1.5 × d)' : 'Bearing length',
        formula: 'ℓ',
        result: show(length, 'mm'),
      },
      { label: 'Projected bearing pressure', formula: 'p = F / (d·ℓ)', result: show(bearingPressureMPa, 'MPa') },
      { label: 'Friction torque', formula: 'T_f = μ·F·d / 2', result: show(frictionTorqueNmm, 'N·mm') },
      { label: 'Spindle speed', formula: 'n = 1000·v / (π·d)', result: show(spindleRpm, 'rpm') },
    ];

    return {
      results: { bendingStressMPa, minDiameterMm, bearingPressureMPa, frictionTorqueNmm, spindleRpm, safetyFactor },
      warnings,
      steps,
    };
  },
  assumptions: [
    'The pivot is a round cantilever from the shoulder, loaded at one point a lever arm a from the shoulder (about half the engaged length).',
    'Bearing pressure is spread over the projected area d·ℓ.',
    'Friction acts at the pivot surface, radius d/2; the coefficients are static values from one chart and depend on the whole system.',
    'Surface speeds are remembered handbook figures for HSS tools; carbide runs at about double, carbon-steel cutters slower. On small work the lathe’s top speed, not the material, is usually the limit.',
    'Burnishing polishes and work-hardens the surface: do not burnish plated pivots, the plating flakes off.',
  ],
  sources: [
    'Standard strength-of-materials and tribology relations; no single source read',
    `${SCHNEIDER}; similar table at www-eng.lbl.gov/~ajdemell/coefficients_of_friction.html, which warns values are system-dependent`,
    `HSS cutting speeds: ${HANDBOOK}`,
    'U. Arizona MMT shop notes (cholla.mmto.arizona.edu/machining/speeds.html)',
    'US Army Ordnance OD 1645, lathe speeds (armyordnance.tpub.com)',
    'D. J. LaBounty, "Burnishing", NAWCC Bulletin, June 2006, p. 323 (text at docobook.com)',
    'Pivot length about 1.5–2 × d: common practice, no source',
  ],
  cautions: [
    'Pivots snap easily, so support the arbor and keep gravers sharp.',
    'Lathe safety: no gloves, loose sleeves or long loose hair near the spindle; eye protection.',
    'Kerosene is flammable.',
    'Clean away all abrasive before assembly.',
    'Follow your workshop rules, the machine maker’s instructions and local codes for lathe work.',
  ],
};
