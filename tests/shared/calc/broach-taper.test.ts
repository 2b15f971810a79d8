import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import {
  broachTaper,
  diameterAtDepth,
  taperFromDiameters,
  taperFromRatio,
  type BroachTaperInput,
} from '../../../shared/calc/broach-taper';
import { inchToMm, mmToInch } from '../../../shared/units/convert';
import { numericLeaves } from './numeric-leaves';

const base: BroachTaperInput = {
  taperPerMm: 1 / 50,
  refDiameterMm: 0.5,
  targetDiameterMm: 1.05,
  plateThicknessMm: 2,
  pivotDiameterMm: 1,
};
const run = (over: Partial<BroachTaperInput> = {}) => broachTaper.compute({ ...base, ...over });

describe('broach-taper check values', () => {
  it('when k = 1/50, the tip is 0.50 mm and the target 1.05 mm, then the insertion depth is 27.5 mm (computed)', () => {
    expect(run().results.insertionDepthMm).toBeCloseTo(27.5, 9);
  });

  it('when k = 0.0077, the tip is 0.50 mm and the target 1.05 mm, then the insertion depth is 71.4 mm (computed)', () => {
    expect(run({ taperPerMm: 0.0077 }).results.insertionDepthMm).toBeCloseTo(71.4, 1);
  });

  it('when a 2.0 mm plate is opened with k = 1/50, then one side leaves 0.040 mm and both sides 0.020 mm (computed)', () => {
    const { oneSideTaperMm, twoSideTaperMm } = run().results;
    expect(oneSideTaperMm).toBeCloseTo(0.04, 9);
    expect(twoSideTaperMm).toBeCloseTo(0.02, 9);
  });

  it('when a 1.00 mm pivot sits in a 1.05 mm hole 2.0 mm long, then it tilts 1.423° (small-angle 1.432°) (computed)', () => {
    const { tiltDeg, tiltSmallAngleDeg } = run().results;
    expect(tiltDeg).toBeCloseTo(1.423, 3);
    expect(tiltSmallAngleDeg).toBeCloseTo(1.432, 3);
  });

  it.each([
    { pivot: 1, hole: 1.02, h: 2, tilt: 0.572 },
    { pivot: 2, hole: 2.1, h: 3, tilt: 1.888 },
    { pivot: 1, hole: 1.05, h: 1, tilt: 2.794 },
  ])(
    'when pivot $pivot mm sits in hole $hole mm, $h mm long, then it tilts $tilt° (computed)',
    ({ pivot, hole, h, tilt }) => {
      const { results } = run({ pivotDiameterMm: pivot, targetDiameterMm: hole, plateThicknessMm: h });
      expect(results.tiltDeg).toBeCloseTo(tilt, 3);
    },
  );

  it('when Hall’s 12/2500 in watch pivot has a 13/2500 in hole, then the total shake is 1/2500 in, 0.0102 mm (E. E. Hall, A Treatise on Staff Making and Pivoting (c.1900))', () => {
    const { results } = run({ pivotDiameterMm: inchToMm(12 / 2500), targetDiameterMm: inchToMm(13 / 2500) });
    expect(mmToInch(results.clearanceMm)).toBeCloseTo(1 / 2500, 9);
    expect(results.clearanceMm).toBeCloseTo(0.0102, 4);
  });

  it('when Hall’s watch pivot has 1/2500 in total shake, then the shake per side is 1/5000 in (E. E. Hall, A Treatise on Staff Making and Pivoting (c.1900))', () => {
    const { results } = run({ pivotDiameterMm: inchToMm(12 / 2500), targetDiameterMm: inchToMm(13 / 2500) });
    expect(mmToInch(results.radialShakeMm)).toBeCloseTo(1 / 5000, 9);
  });

  it('when Hall’s watch pivot (0.1219 mm, shake 0.0102 mm) is entered in inches, then the shake is 8.3 % of the pivot (computed)', () => {
    const { results } = run({ pivotDiameterMm: inchToMm(12 / 2500), targetDiameterMm: inchToMm(13 / 2500) });
    expect(results.clearancePercent).toBeCloseTo(8.3, 1);
  });

  it('when a smoothing broach reads 8.6 mm and 7.6 mm 130 mm apart, then k = 0.0077, about 1:130 (a maker’s workshop blog (weak source))', () => {
    const k = taperFromDiameters(8.6, 7.6, 130);
    expect(k).toBeCloseTo(0.0077, 4);
    expect(taperFromRatio('1:130')).toBeCloseTo(0.0077, 4);
  });

  it('when k = 0.0077, then the included angle is about 0.44° (computed)', () => {
    expect(2 * run({ taperPerMm: 0.0077 }).results.halfAngleDeg).toBeCloseTo(0.44, 2);
  });
});

describe('broach-taper helpers', () => {
  it('when a ratio is typed as "1:50", "1 / 50" or "0.02", then each gives k = 0.02 (computed)', () => {
    expect(taperFromRatio('1:50')).toBeCloseTo(0.02, 12);
    expect(taperFromRatio(' 1 / 50 ')).toBeCloseTo(0.02, 12);
    expect(taperFromRatio('0.02')).toBeCloseTo(0.02, 12);
  });

  it('when the text is not a taper, then taperFromRatio gives null', () => {
    for (const text of ['', 'abc', '1:0', '0:50', '0', '-1:50', '1:50:2']) expect(taperFromRatio(text)).toBeNull();
  });

  it('when two readings are equal or the distance is not positive, then taperFromDiameters gives null', () => {
    expect(taperFromDiameters(1, 1, 25)).toBeNull();
    expect(taperFromDiameters(1, 1.2, 0)).toBeNull();
    expect(taperFromDiameters(1, 1.2, -10)).toBeNull();
  });

  it('when the readings are given in either order, then the taper is the same', () => {
    expect(taperFromDiameters(1.2, 1.0, 25)).toBeCloseTo(0.008, 12);
    expect(taperFromDiameters(1.0, 1.2, 25)).toBeCloseTo(0.008, 12);
  });
});

describe('broach-taper warnings and input checks', () => {
  it('when the hole is 0.03 mm over a 1 mm pivot, then there is no warning', () => {
    expect(run({ targetDiameterMm: 1.03 }).warnings).toEqual([]);
  });

  it('when the hole is exactly 0.05 mm over a 1 mm pivot, then the float remainder does not raise a warning', () => {
    expect(run().warnings).toEqual([]);
  });

  it('when the hole is 0.08 mm over a 1 mm pivot, then the common-practice clearance warning appears', () => {
    expect(run({ targetDiameterMm: 1.08 }).warnings.join(' ')).toMatch(/0\.02–0\.05 mm/);
  });

  it('when the pivot is larger than the hole, then shake and tilt are 0 and a warning says it will not go in', () => {
    const out = run({ pivotDiameterMm: 1.1 });
    expect(out.results.tiltDeg).toBe(0);
    expect(out.results.tiltSmallAngleDeg).toBe(0);
    expect(out.results.radialShakeMm).toBe(0);
    expect(out.results.clearanceMm).toBeCloseTo(-0.05, 9);
    expect(out.warnings.join(' ')).toMatch(/will not go in/);
  });

  it('when the target is smaller than the broach at the reference station, then the depth is negative and a warning says so', () => {
    const out = run({ refDiameterMm: 1.2 });
    expect(out.results.insertionDepthMm).toBeCloseTo(-7.5, 9);
    expect(out.warnings.join(' ')).toMatch(/smaller than the broach/);
  });

  it('when the taper is zero or missing, then compute throws a ZodError', () => {
    expect(() => run({ taperPerMm: 0 })).toThrow(ZodError);
    expect(() => broachTaper.compute({ ...base, taperPerMm: undefined } as unknown as BroachTaperInput)).toThrow(
      ZodError,
    );
  });

  it('when the calculator is described, then it names its sources and the broach cautions', () => {
    expect(broachTaper.name).toBe('broach-taper');
    expect(broachTaper.cautions.join(' ')).toMatch(/eye protection/);
    expect(broachTaper.sources.join(' ')).toMatch(/E\. E\. Hall/);
    expect(run().steps.find((s) => s.label === 'Insertion depth')?.result).toBe('27.5 mm');
  });
});

const validInput = fc.record({
  taperPerMm: fc.double({ min: 0.0001, max: 0.5, noNaN: true }),
  refDiameterMm: fc.double({ min: 0.01, max: 50, noNaN: true }),
  targetDiameterMm: fc.double({ min: 0.01, max: 50, noNaN: true }),
  plateThicknessMm: fc.double({ min: 0.01, max: 50, noNaN: true }),
  pivotDiameterMm: fc.double({ min: 0.01, max: 50, noNaN: true }),
});

describe('broach-taper properties', () => {
  it('when any valid input is given, then every number in the results is finite', () => {
    fc.assert(
      fc.property(validInput, (input) => {
        const leaves = numericLeaves(broachTaper.compute(input).results);
        expect(leaves.length).toBe(9);
        expect(leaves.every(Number.isFinite)).toBe(true);
      }),
    );
  });

  it('when the broach goes deeper, then the hole it leaves is never smaller', () => {
    fc.assert(
      fc.property(
        validInput,
        fc.double({ min: -100, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        (input, depth, further) => {
          expect(diameterAtDepth(input, depth + further)).toBeGreaterThanOrEqual(diameterAtDepth(input, depth));
        },
      ),
    );
  });

  it('when the insertion depth is fed back, then the broach measures the target there', () => {
    fc.assert(
      fc.property(validInput, (input) => {
        const depth = broachTaper.compute(input).results.insertionDepthMm;
        expect(diameterAtDepth(input, depth)).toBeCloseTo(input.targetDiameterMm, 6);
      }),
    );
  });

  it('when a length goes to inches and back, then it is the same to 1e-9 mm', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1000, noNaN: true }), (mm) => {
        expect(Math.abs(inchToMm(mmToInch(mm)) - mm)).toBeLessThanOrEqual(1e-9);
      }),
    );
    fc.assert(
      fc.property(fc.double({ min: 0, max: 40, noNaN: true }), (inch) => {
        expect(Math.abs(mmToInch(inchToMm(inch)) - inch)).toBeLessThanOrEqual(1e-9);
      }),
    );
  });
});
