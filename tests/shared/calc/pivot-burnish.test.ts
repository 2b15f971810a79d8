import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import {
  FRICTION_TABLE,
  pivotBurnish,
  SURFACE_SPEED_TABLE,
  type PivotBurnishInput,
} from '../../../shared/calc/pivot-burnish';
import { inchToMm, mmToInch } from '../../../shared/units/convert';
import { numericLeaves } from './numeric-leaves';

const base: PivotBurnishInput = { loadN: 10, leverArmMm: 0.75, pivotDiameterMm: 1 };
const run = (over: Partial<PivotBurnishInput> = {}) => pivotBurnish.compute({ ...base, ...over });
const mu = (pair: string, lubrication: string) =>
  FRICTION_TABLE.find((r) => r.pair === pair && r.lubrication === lubrication)?.mu;

describe('pivot-burnish check values', () => {
  it('when F = 10 N, a = 0.75 mm and σ_allow = 200 MPa, then d_min = 0.726 mm (computed)', () => {
    expect(run().results.minDiameterMm).toBeCloseTo(0.726, 3);
  });

  it('when d = 1.0 mm, F = 10 N and a = 0.75 mm, then σ = 76.4 MPa and the safety factor is 2.62 (computed)', () => {
    const { bendingStressMPa, safetyFactor } = run().results;
    expect(bendingStressMPa).toBeCloseTo(76.4, 1);
    expect(safetyFactor).toBeCloseTo(2.62, 2);
  });

  it('when F = 10 N, d = 1.0 mm and ℓ = 1.5 mm, then p = 6.67 MPa (computed)', () => {
    expect(run({ bearingLengthMm: 1.5 }).results.bearingPressureMPa).toBeCloseTo(6.67, 2);
  });

  it('when the bearing length is left out, then it is taken as 1.5 × d and p is the same 6.67 MPa (computed)', () => {
    expect(run().results.bearingPressureMPa).toBeCloseTo(6.67, 2);
  });

  it('when μ = 0.15, F = 10 N and d = 1.0 mm, then T_f = 0.75 N·mm (computed)', () => {
    expect(run({ frictionCoefficient: 0.15 }).results.frictionTorqueNmm).toBeCloseTo(0.75, 9);
  });

  it.each([
    { d: 1, rpm: 9549 },
    { d: 2, rpm: 4775 },
  ])('when v = 30 m/min on a $d mm pivot, then the spindle turns $rpm rpm (computed)', ({ d, rpm }) => {
    expect(run({ pivotDiameterMm: d, surfaceSpeedMPerMin: 30 }).results.spindleRpm).toBeCloseTo(rpm, 0);
  });

  it('when speed and diameter are in sfm and inches, then n ≈ 3.82·v/d agrees with the metric form to 0.1 % (computed)', () => {
    const sfm = 150;
    const inches = 0.04;
    const { spindleRpm } = run({ pivotDiameterMm: inchToMm(inches), surfaceSpeedMPerMin: sfm * 0.3048 }).results;
    expect(Math.abs(spindleRpm / ((3.82 * sfm) / inches) - 1)).toBeLessThan(0.001);
  });

  it('when brass runs dry on steel, then μ = 0.51 (Schneider Co. "Coefficient of friction reference chart")', () => {
    expect(mu('brass on steel', 'clean / dry')).toBe(0.51);
  });

  it('when brass runs on steel in castor oil, then μ = 0.11 (Schneider Co. "Coefficient of friction reference chart")', () => {
    expect(mu('brass on steel', 'castor oil')).toBe(0.11);
  });

  it('when bronze runs lubricated on steel, then μ = 0.16 (Schneider Co. "Coefficient of friction reference chart")', () => {
    expect(mu('bronze on steel', 'lubricated')).toBe(0.16);
  });

  it('when no μ is given, then the lubricated brass-on-steel μ = 0.19 is used (Schneider Co. "Coefficient of friction reference chart"), giving 0.95 N·mm at 10 N on 1 mm', () => {
    expect(mu('brass on steel', 'lubricated / greasy')).toBe(0.19);
    expect(run().results.frictionTorqueNmm).toBeCloseTo(0.95, 9);
  });

  it.each([
    { inches: 1, sfm: 100, rpm: 382 },
    { inches: 0.1, sfm: 100, rpm: 3820 },
    { inches: 0.5, sfm: 800, rpm: 6112 },
  ])(
    'when $sfm sfm is wanted on $inches in, then the spindle turns about $rpm rpm (cncoptimization.com "How to Calculate Cutting Speed (RPM)", worked with 3.82 × SFM / D)',
    ({ inches, sfm, rpm }) => {
      const { spindleRpm } = run({ pivotDiameterMm: inchToMm(inches), surfaceSpeedMPerMin: sfm * 0.3048 }).results;
      // The page rounds 12/π to 3.82, which moves the figure by 0.003 %; a whole rpm either way covers it.
      expect(Math.abs(spindleRpm - rpm)).toBeLessThanOrEqual(1);
    },
  );

  it('when the remembered HSS speeds are read, then none is faster than the U. Arizona shop notes allow for that material (cholla.mmto.arizona.edu/machining/speeds.html: brass 600+, mild steel 120, alloy steel 50–60 sfm)', () => {
    const sfm = (material: string) => SURFACE_SPEED_TABLE.find((r) => r.material === material)!.sfm;
    expect(sfm('brass and bronze')).toBeLessThanOrEqual(600);
    expect(sfm('mild steel')).toBeLessThanOrEqual(120);
    expect(sfm('tool steel')).toBeLessThanOrEqual(60);
    // The table's figures themselves are remembered (machining handbook tables, from memory): 150, 90 and 50 sfm.
    expect(SURFACE_SPEED_TABLE.every((r) => r.source.includes('from memory'))).toBe(true);
  });

  it('when no surface speed is given, then the tool-steel row sets it, 50 sfm = 15.24 m/min: 4 851 rpm on 1 mm (computed)', () => {
    expect(run().results.spindleRpm).toBeCloseTo((1000 * 50 * 0.3048) / Math.PI, 6);
    expect(Math.round(run().results.spindleRpm)).toBe(4851);
  });

  it('when the class regulator’s third arbor carries 1.42 N on a 1.0 mm pivot, then bending is no concern: σ = 10.85 MPa, a safety factor of 18.4 and d_min = 0.379 mm (computed)', () => {
    // 1.42 N is the pivots lesson's upper bound from a 3 kg weight through the train; σ = 32 × 1.42 × 0.75 / π (computed).
    const { results } = run({ loadN: 1.42, bearingLengthMm: 1.5 });
    expect(results.bendingStressMPa).toBeCloseTo((32 * 1.42 * 0.75) / Math.PI, 9);
    expect(results.bendingStressMPa).toBeCloseTo(10.85, 2);
    expect(results.safetyFactor).toBeCloseTo(18.4, 1);
    expect(results.minDiameterMm).toBeCloseTo(0.379, 3);
  });
});

describe('pivot-burnish warnings and input checks', () => {
  it('when the spindle would need over 3 000 rpm, then a warning says the lathe’s top speed will be the limit', () => {
    expect(run({ surfaceSpeedMPerMin: 30 }).warnings.join(' ')).toMatch(/lathe's top speed will be the limit/);
    expect(run({ pivotDiameterMm: 5, surfaceSpeedMPerMin: 30 }).warnings.join(' ')).not.toMatch(/top speed/);
  });

  it('when the bending stress is over the allowable, then a warning gives the smallest safe diameter', () => {
    const out = run({ pivotDiameterMm: 0.6, bearingLengthMm: 1 });
    expect(out.results.safetyFactor).toBeLessThan(1);
    expect(out.warnings.join(' ')).toMatch(/over the allowable.*0\.7256 mm/);
  });

  it('when the pivot itself is 3 × its diameter long, then the 1.5–2 × common-practice warning appears', () => {
    expect(run({ pivotLengthMm: 3, surfaceSpeedMPerMin: 5 }).warnings.join(' ')).toMatch(/1\.5–2 ×/);
    expect(run({ pivotLengthMm: 2, bearingLengthMm: 1.5, surfaceSpeedMPerMin: 5 }).warnings).toEqual([]);
  });

  it('when only the bearing length is long, then the pivot-length rule is not applied to it', () => {
    expect(run({ bearingLengthMm: 3, surfaceSpeedMPerMin: 5 }).warnings.join(' ')).not.toMatch(/1\.5–2 ×/);
  });

  it('when the bearing length is longer than the pivot, then a warning says a pivot bears only on its own length', () => {
    const { warnings } = run({ pivotLengthMm: 1.5, bearingLengthMm: 2, surfaceSpeedMPerMin: 5 });
    expect(warnings.join(' ')).toMatch(/bears only on its own length/);
  });

  it('when the load is 5 000 N, then a warning says it is far outside bench practice', () => {
    expect(run({ loadN: 5000, pivotDiameterMm: 5 }).warnings.join(' ')).toMatch(
      /pivot load of 5000 N is far outside bench practice/,
    );
  });

  it('when the lever arm is longer than the bearing length, then a warning says the load lies beyond the pivot', () => {
    expect(run({ leverArmMm: 2, surfaceSpeedMPerMin: 5 }).warnings.join(' ')).toMatch(/beyond the end of the pivot/);
  });

  it('when the load is missing or negative, then compute throws a ZodError', () => {
    expect(() => run({ loadN: -1 })).toThrow(ZodError);
    expect(() => pivotBurnish.compute({ leverArmMm: 1, pivotDiameterMm: 1 } as PivotBurnishInput)).toThrow(ZodError);
  });

  it('when the calculator is described, then it carries the lathe cautions and the friction source', () => {
    expect(pivotBurnish.name).toBe('pivot-burnish');
    expect(pivotBurnish.cautions.join(' ')).toMatch(/no gloves/);
    expect(pivotBurnish.sources.join(' ')).toMatch(/Schneider Co\./);
    expect(run().steps.find((s) => s.label === 'Bending stress')?.result).toBe('76.39 MPa');
    expect(run().steps.find((s) => s.label.startsWith('Safety factor on bending'))?.label).toBe(
      'Safety factor on bending: allowable stress ÷ working stress',
    );
    expect(run().steps.some((s) => s.label === 'Allowable stress (200 MPa: common practice, no source)')).toBe(true);
    expect(run({ allowableStressMPa: 300 }).steps.some((s) => s.label === 'Allowable stress (as given)')).toBe(true);
  });
});

const validInput = fc.record(
  {
    loadN: fc.double({ min: 0.001, max: 10_000, noNaN: true }),
    leverArmMm: fc.double({ min: 0.001, max: 100, noNaN: true }),
    pivotDiameterMm: fc.double({ min: 0.01, max: 50, noNaN: true }),
    bearingLengthMm: fc.double({ min: 0.01, max: 100, noNaN: true }),
    pivotLengthMm: fc.double({ min: 0.01, max: 100, noNaN: true }),
    allowableStressMPa: fc.double({ min: 1, max: 5000, noNaN: true }),
    frictionCoefficient: fc.double({ min: 0, max: 2, noNaN: true }),
    surfaceSpeedMPerMin: fc.double({ min: 0.1, max: 2000, noNaN: true }),
  },
  { requiredKeys: ['loadN', 'leverArmMm', 'pivotDiameterMm'] },
);

describe('pivot-burnish properties', () => {
  it('when any valid input is given, then every number in the results is finite', () => {
    fc.assert(
      fc.property(validInput, (input) => {
        const leaves = numericLeaves(pivotBurnish.compute(input).results);
        expect(leaves.length).toBe(6);
        expect(leaves.every(Number.isFinite)).toBe(true);
      }),
    );
  });

  it('when the pivot is made exactly d_min, then its bending stress equals the allowable (computed)', () => {
    fc.assert(
      fc.property(validInput, (input) => {
        const dMin = pivotBurnish.compute(input).results.minDiameterMm;
        fc.pre(dMin >= 0.01 && dMin <= 50);
        const again = pivotBurnish.compute({ ...input, pivotDiameterMm: dMin }).results;
        expect(again.safetyFactor).toBeCloseTo(1, 9);
      }),
    );
  });

  it('when a pivot diameter goes to inches and back, then it is the same to 1e-9 mm', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 100, noNaN: true }), (mm) => {
        expect(Math.abs(inchToMm(mmToInch(mm)) - mm)).toBeLessThanOrEqual(1e-9);
      }),
    );
  });
});
