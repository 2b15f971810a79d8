import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import { broachTaper, diameterAtDepth, type BroachTaperInput } from '../../../shared/calc/broach-taper';
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
// Plane geometry, worked out separately from the code: a five-sided broach of circumradius R reads R(1 + cos 36°).
const FIVE_SIDED = 2 / (1 + Math.cos((36 * Math.PI) / 180));

describe('broach-taper: where the hole is narrowest', () => {
  it('when a round broach (k = 1/50, 0.50 mm at the mark) opens a 2.0 mm plate from both faces to 1.05 mm at mid-plate, then the mark goes in 28.5 mm and the faces are 1.07 mm (computed)', () => {
    // (1.05 − 0.50)/0.02 = 27.5 mm reaches 1.05 mm at the entry face; mid-plate lies t/2 = 1 mm further (computed).
    const { insertionDepthMm, entryDiameterMm } = run({ openedFrom: 'both' }).results;
    expect(insertionDepthMm).toBeCloseTo(27.5 + 1, 9);
    expect(entryDiameterMm).toBeCloseTo(1.05 + 0.02 * 1, 9);
  });

  it('when the same hole is opened from one face, then the far face is the narrowest, the mark goes in 29.5 mm and the entry is 1.09 mm (computed)', () => {
    const { insertionDepthMm, entryDiameterMm } = run({ openedFrom: 'one' }).results;
    expect(insertionDepthMm).toBeCloseTo(27.5 + 2, 9);
    expect(entryDiameterMm).toBeCloseTo(1.05 + 0.02 * 2, 9);
  });

  it('when openedFrom is left out, then both faces is taken', () => {
    expect(run().results.insertionDepthMm).toBeCloseTo(28.5, 9);
  });

  it('when k = 1/50, the tip is 0.50 mm and the target 1.05 mm at the entry face, then the depth from the tip is 27.5 mm (TRADE.md §1, computed)', () => {
    // Opened from both faces, the entry is k·t/2 over mid-plate; a plate of 0.01 mm leaves the TRADE.md figure.
    expect(run({ plateThicknessMm: 0.01 }).results.insertionDepthMm).toBeCloseTo(27.5 + 0.005, 9);
  });

  it('when k = 0.0077, the tip is 0.50 mm and the target 1.05 mm, then the depth is 71.4 mm to the entry face (TRADE.md §1, computed)', () => {
    expect(run({ taperPerMm: 0.0077, plateThicknessMm: 0.01 }).results.insertionDepthMm).toBeCloseTo(71.4, 1);
  });

  it('when a 2.0 mm plate is opened with k = 1/50, then one side leaves 0.040 mm and both sides 0.020 mm (TRADE.md §1, computed)', () => {
    const { oneSideTaperMm, twoSideTaperMm } = run().results;
    expect(oneSideTaperMm).toBeCloseTo(0.04, 9);
    expect(twoSideTaperMm).toBeCloseTo(0.02, 9);
  });

  it('when the depth is fed back, then the cutting diameter at the narrowest point is the target, both ways of opening', () => {
    fc.assert(
      fc.property(validInput, (raw) => {
        const input = { ...raw, broachSides: raw.broachSides ?? 0, openedFrom: raw.openedFrom ?? 'both' };
        const { insertionDepthMm, cuttingFactor } = broachTaper.compute(input).results;
        const toNarrowest = input.openedFrom === 'both' ? input.plateThicknessMm / 2 : input.plateThicknessMm;
        const cut = cuttingFactor * diameterAtDepth(input, insertionDepthMm - toNarrowest);
        expect(cut).toBeCloseTo(input.targetDiameterMm, 6);
      }),
    );
  });
});

describe('broach-taper: published statements', () => {
  it('when a hole is broached from both faces to the same mark, then it tapers from each face to the middle, each face k_c·t/2 over mid-plate (NAWCC forum thread "Bush or not", forum opinion)', () => {
    const { entryDiameterMm, twoSideTaperMm } = run({ openedFrom: 'both', broachSides: 5 }).results;
    expect(entryDiameterMm - 1.05).toBeCloseTo(twoSideTaperMm, 12);
    expect(entryDiameterMm).toBeGreaterThan(1.05);
  });

  it('when the shop-made smoothing broach’s taper (8.6 to 7.6 mm over 130 mm) is entered, then its included angle is about 0.44° (a maker’s workshop blog (weak source); angle computed)', () => {
    const k = (8.6 - 7.6) / 130;
    expect(2 * run({ taperPerMm: k }).results.halfAngleDeg).toBeCloseTo(0.44, 2);
  });
});

describe('broach-taper: five-sided cutting broach', () => {
  it('when the readings are taken across a five-sided broach, then the cutting diameter is 1.1056 × the reading (plane geometry, computed)', () => {
    expect(run({ broachSides: 5 }).results.cuttingFactor).toBeCloseTo(1.1056, 4);
    expect(run({ broachSides: 5 }).results.cuttingFactor).toBeCloseTo(FIVE_SIDED, 12);
  });

  it('when Ruth’s five-sided broach (0.50 mm, k = 0.02) opens the 2 mm plate from both faces to 1.05 mm, then the mark is 23.49 mm and the faces 1.072 mm (computed)', () => {
    // Narrowest 1.05 → entry 1.05 + f·0.02·1 = 1.0721 mm; the broach reads 1.0721/f = 0.96973 mm there;
    // (0.96973 − 0.50)/0.02 = 23.487 mm (computed).
    const { insertionDepthMm, entryDiameterMm, cuttingTaperPerMm } = run({ broachSides: 5 }).results;
    expect(cuttingTaperPerMm).toBeCloseTo(0.02 * FIVE_SIDED, 12);
    expect(entryDiameterMm).toBeCloseTo(1.0721, 4);
    expect(insertionDepthMm).toBeCloseTo(23.487, 3);
  });

  it('when a five-sided broach is pushed to the mark worked as if the readings were cutting diameters, then the hole is about 0.1 mm oversize on a 1 mm pivot (computed)', () => {
    // The plain mark for 1.05 mm: the broach reads 1.05 mm there and cuts 1.05 × 1.1056 = 1.161 mm.
    const plainMark = run({ broachSides: 0, plateThicknessMm: 0.01 }).results.insertionDepthMm;
    const cut = FIVE_SIDED * diameterAtDepth({ taperPerMm: 0.02, refDiameterMm: 0.5 }, plainMark - 0.005);
    expect(cut - 1.05).toBeGreaterThan(0.1);
    expect(cut - 1.05).toBeGreaterThan(2 * 0.05); // more than twice the whole clearance
  });

  it('when a six-sided broach is read corner to corner, then the readings are cutting diameters and the depth is the round one', () => {
    expect(run({ broachSides: 6 }).results.insertionDepthMm).toBeCloseTo(run().results.insertionDepthMm, 12);
  });
});

describe('broach-taper: shake and tilt', () => {
  it('when Hall’s watch pivot has 1/2500 in total shake, then the shake per side is 1/5000 in (E. E. Hall, A Treatise on Staff Making and Pivoting (c.1900))', () => {
    const { results } = run({ pivotDiameterMm: inchToMm(12 / 2500), targetDiameterMm: inchToMm(13 / 2500) });
    expect(mmToInch(results.radialShakeMm)).toBeCloseTo(1 / 5000, 9);
  });

  it('when Hall’s watch pivot (0.1219 mm, shake 0.0102 mm) is entered, then the shake is 8.3 % of the pivot (TRADE.md §1, computed)', () => {
    const { results } = run({ pivotDiameterMm: inchToMm(12 / 2500), targetDiameterMm: inchToMm(13 / 2500) });
    expect(results.clearancePercent).toBeCloseTo(8.3, 1);
  });

  it('when the clearance is worked, then it is the narrowest diameter less the pivot, not the entry', () => {
    expect(run({ broachSides: 5, openedFrom: 'one' }).results.clearanceMm).toBeCloseTo(0.05, 12);
  });

  it('when the taper is almost nothing, then the tilt is the straight hole’s 1.423° (small-angle 1.432°) (TRADE.md §1, computed)', () => {
    const { tiltDeg, tiltSmallAngleDeg } = run({ taperPerMm: 0.0001 }).results;
    expect(tiltDeg).toBeCloseTo(1.423, 2);
    expect(tiltSmallAngleDeg).toBeCloseTo(1.432, 2);
  });

  it('when the pivot is shorter than the plate, then the short-pivot form is used and the steps say so', () => {
    const long = run({ taperPerMm: 0.0001 });
    const short = run({ taperPerMm: 0.0001, pivotLengthMm: 1 });
    // Straight 1.05 mm hole: long form over h = 2 mm gives 1.423°, short form over ℓ = 1 mm 2.942° (computed).
    expect(long.results.tiltDeg).toBeCloseTo(1.423, 2);
    expect(short.results.tiltDeg).toBeCloseTo(2.942, 2);
    expect(short.steps.some((s) => s.label.includes('pivot shorter than the hole'))).toBe(true);
    expect(long.steps.some((s) => s.label.includes('pivot longer than the hole'))).toBe(true);
  });

  it('when the pivot is longer than the plate, then the long form is used as if no length were given', () => {
    expect(run({ pivotLengthMm: 3 }).results.tiltDeg).toBeCloseTo(run().results.tiltDeg, 12);
  });

  it('when a tapered hole is opened from both faces, then it tilts more than a straight hole of its narrowest size', () => {
    expect(run({ broachSides: 5 }).results.tiltDeg).toBeGreaterThan(1.423);
  });
});

describe('broach-taper: warnings and input checks', () => {
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

  it('when the target is smaller than the broach cuts at the reference station, then the depth is negative and a warning says so', () => {
    const out = run({ refDiameterMm: 1.2 });
    expect(out.results.insertionDepthMm).toBeCloseTo(-6.5, 9);
    expect(out.warnings.join(' ')).toMatch(/towards the tip/);
  });

  it('when the taper is 0.0001, then a warning says it is far outside bench practice', () => {
    expect(run({ taperPerMm: 0.0001 }).warnings.join(' ')).toMatch(
      /taper of 0\.0001 mm\/mm is far outside bench practice/,
    );
  });

  it('when a 0.01 mm pivot sits in a 40 mm hole, then warnings say the pivot is far outside practice and the fit is no fit', () => {
    const { warnings } = run({ pivotDiameterMm: 0.01, targetDiameterMm: 40, refDiameterMm: 39 });
    expect(warnings.join(' ')).toMatch(/pivot of 0\.01 mm is far outside bench practice/);
    expect(warnings.join(' ')).toMatch(/no running fit/);
  });

  it('when a short pivot stands in a loose hole, then a warning says it could lie over', () => {
    const out = run({ targetDiameterMm: 1.3, pivotLengthMm: 0.5 });
    expect(out.results.tiltDeg).toBeCloseTo(90, 9);
    expect(out.warnings.join(' ')).toMatch(/could lie over/);
  });

  it('when the taper is zero or missing, or the broach has 2 or 13 sides, then compute throws a ZodError', () => {
    expect(() => run({ taperPerMm: 0 })).toThrow(ZodError);
    expect(() => broachTaper.compute({ ...base, taperPerMm: undefined } as unknown as BroachTaperInput)).toThrow(
      ZodError,
    );
    expect(() => run({ broachSides: 2 })).toThrow(ZodError);
    expect(() => run({ broachSides: 13 })).toThrow(ZodError);
  });

  it('when the calculator is described, then it names its sources, the broach cautions and the depth step', () => {
    expect(broachTaper.name).toBe('broach-taper');
    expect(broachTaper.cautions.join(' ')).toMatch(/eye protection/);
    expect(broachTaper.sources.join(' ')).toMatch(/E\. E\. Hall/);
    expect(run().steps.find((s) => s.label === 'Insertion depth')?.result).toBe('28.5 mm');
  });
});

const validInput = fc.record(
  {
    taperPerMm: fc.double({ min: 0.0001, max: 0.5, noNaN: true }),
    refDiameterMm: fc.double({ min: 0.01, max: 50, noNaN: true }),
    targetDiameterMm: fc.double({ min: 0.01, max: 50, noNaN: true }),
    plateThicknessMm: fc.double({ min: 0.01, max: 50, noNaN: true }),
    pivotDiameterMm: fc.double({ min: 0.01, max: 50, noNaN: true }),
    broachSides: fc.constantFrom(0, 3, 4, 5, 6, 7, 12),
    openedFrom: fc.constantFrom('both' as const, 'one' as const),
    pivotLengthMm: fc.double({ min: 0.01, max: 50, noNaN: true }),
  },
  { requiredKeys: ['taperPerMm', 'refDiameterMm', 'targetDiameterMm', 'plateThicknessMm', 'pivotDiameterMm'] },
);

describe('broach-taper properties', () => {
  it('when any valid input is given, then every number in the results is finite', () => {
    fc.assert(
      fc.property(validInput, (input) => {
        const leaves = numericLeaves(broachTaper.compute(input).results);
        expect(leaves.length).toBe(12);
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
});
