import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import { meshDrawing, wheelPinion } from '../../../shared/calc/wheel-pinion';

const allFinite = (v: unknown): boolean =>
  typeof v === 'number'
    ? Number.isFinite(v)
    : Array.isArray(v)
      ? v.every(allFinite)
      : v !== null && typeof v === 'object'
        ? Object.values(v).every(allFinite)
        : true;

describe('wheel-pinion', () => {
  it('when a module 0.5 wheel has 64 teeth, then its blank is 33.38 mm', () => {
    // NAWCC forum "Cycloidal Gears Blanks", post by A. Wolff (forum; quoted as the BS-type rule): m(z + 2.76)
    const { results } = wheelPinion.compute({ moduleMm: 0.5, wheelTeeth: 64, pinionLeaves: 8 });
    expect(results.wheelBlankDiameterMm).toBeCloseTo(33.38, 6);
    expect(results.wheelAddendumMm).toBeCloseTo(0.69, 6); // 1.38 m (computed)
  });

  it('when a module 0.5 pinion has 8 leaves, then its blank is 4.855 mm', () => {
    // NAWCC forum "Cycloidal Gears Blanks", post by A. Wolff: m(z + 1.71) below 10 leaves
    const { results } = wheelPinion.compute({ moduleMm: 0.5, wheelTeeth: 64, pinionLeaves: 8 });
    expect(results.pinionBlankDiameterMm).toBeCloseTo(4.855, 6);
  });

  it('when the pinion has 12 leaves, then the blank uses the 10–16 leaf allowance', () => {
    // NAWCC forum "Cycloidal Gears Blanks", post by A. Wolff: m(z + 1.61) for 10–16 leaves; 0.5 × 13.61 = 6.805 mm (computed)
    const { results } = wheelPinion.compute({ moduleMm: 0.5, wheelTeeth: 72, pinionLeaves: 12 });
    expect(results.pinionBlankDiameterMm).toBeCloseTo(6.805, 6);
    expect(results.pinionAddendumMm).toBeCloseTo(0.4025, 6);
  });

  it("when the pinion has 8 leaves at module 1, then Goodrich's wheel addendum is 1.40 mm", () => {
    // W. L. Goodrich, The Modern Clock (1905), pinion chapter: 7/20 of the pinion pitch radius = 0.35 × 4m = 1.40 m
    const { results } = wheelPinion.compute({ moduleMm: 1, wheelTeeth: 64, pinionLeaves: 8 });
    expect(results.goodrichWheelAddendumMm).toBeCloseTo(1.4, 9);
  });

  it("when the pinion has 6, 10 or 12 leaves, then Goodrich's 8-leaf rule is not applied and the steps name the forum rule instead", () => {
    // W. L. Goodrich, The Modern Clock (1905): the 7/20 rule is stated for the eight-leaf pinion only.
    for (const pinionLeaves of [6, 10, 12]) {
      const out = wheelPinion.compute({ moduleMm: 1, wheelTeeth: 72, pinionLeaves });
      expect(out.results.goodrichWheelAddendumMm).toBeNull();
      const step = out.steps.find((x) => x.label === "Goodrich's wheel addendum");
      expect(step?.result).toBe('not applied');
      expect(step?.formula).toMatch(/forum blank rule above governs/);
    }
  });

  it('when the wheel addendum is given, then its step says it comes from a forum post, not a standard', () => {
    const out = wheelPinion.compute({ moduleMm: 1, wheelTeeth: 64, pinionLeaves: 8 });
    expect(out.steps.some((x) => /^Wheel addendum \(forum post: A\. Wolff/.test(x.label))).toBe(true);
  });

  it('when a module 1 wheel of 60 drives a lantern pinion of 8, then the centres are 30 + 4 = 34 mm apart (AWCI "Clockmaking standard: Lantern pinion depthing": depth = sum of the pitch radii)', () => {
    // Pitch radii worked here from d = m·z: 60/2 = 30 mm and 8/2 = 4 mm (computed).
    const { results } = wheelPinion.compute({
      moduleMm: 1,
      wheelTeeth: 60,
      pinionLeaves: 8,
      pinionKind: 'lantern',
      trundleDiameterMm: 1.2,
    });
    expect(results.centreDistanceMm).toBeCloseTo(30 + 4, 9);
    expect(results.pinionBlankDiameterMm).toBeCloseTo(9.2, 9); // 8 mm + one trundle (computed)
    expect(results.trundleBacklashMm).toBeCloseTo(Math.PI / 2 - 1.2, 9);
    expect(results.trundleFits).toBe(true);
  });

  it('when a lantern trundle fills the tooth space with no play, then it does not read "fits" and a warning says it binds', () => {
    // Tooth space at module 1: π/2 = 1.5708 mm; a 1.5707 mm trundle leaves 0.0001 mm of play (computed).
    const out = wheelPinion.compute({
      moduleMm: 1,
      wheelTeeth: 64,
      pinionLeaves: 8,
      pinionKind: 'lantern',
      trundleDiameterMm: 1.5707,
    });
    expect(out.results.trundleFits).toBe(false);
    expect(out.warnings.join(' ')).toMatch(/binds/);
    const exact = wheelPinion.compute({
      moduleMm: 1,
      wheelTeeth: 64,
      pinionLeaves: 8,
      pinionKind: 'lantern',
      trundleDiameterMm: Math.PI / 2,
    });
    expect(exact.results.trundleFits).toBe(false);
  });

  it('when module 0.5 drives 64 : 8, then the pitch diameters are 32 and 4 mm and the centres 18 mm apart (TRADE.md §4, computed)', () => {
    // Worked here: 0.5 × 64 = 32 mm, 0.5 × 8 = 4 mm, (32 + 4)/2 = 18 mm (computed).
    const { results, warnings } = wheelPinion.compute({ moduleMm: 0.5, wheelTeeth: 64, pinionLeaves: 8 });
    expect(results.wheelPitchDiameterMm).toBeCloseTo(32, 9);
    expect(results.pinionPitchDiameterMm).toBeCloseTo(4, 9);
    expect(results.centreDistanceMm).toBeCloseTo(18, 9);
    expect(results.ratio).toBe(8);
    expect(warnings).toEqual([]);
  });

  it('when the module is 1, then the tooth space is 1.571 mm and the circular pitch 3.1416 mm', () => {
    // (computed) πm/2 and πm
    const { results } = wheelPinion.compute({ moduleMm: 1, wheelTeeth: 64, pinionLeaves: 8 });
    expect(results.toothSpaceMm).toBeCloseTo(1.5708, 4);
    expect(results.circularPitchMm).toBeCloseTo(3.1416, 4);
    expect(results.trundleFits).toBeUndefined();
  });

  it('when the trundle is wider than the tooth space, then it does not fit and a warning says so', () => {
    // (computed) tooth space at module 1 is 1.5708 mm
    const out = wheelPinion.compute({
      moduleMm: 1,
      wheelTeeth: 64,
      pinionLeaves: 8,
      pinionKind: 'lantern',
      trundleDiameterMm: 1.6,
    });
    expect(out.results.trundleFits).toBe(false);
    expect(out.warnings.some((w) => w.includes('trundle'))).toBe(true);
  });

  it('when a lantern pinion has no trundle diameter, then the input is rejected', () => {
    expect(() => wheelPinion.compute({ moduleMm: 1, wheelTeeth: 64, pinionLeaves: 8, pinionKind: 'lantern' })).toThrow(
      ZodError,
    );
  });

  it('when the module is zero or the teeth fractional, then the input is rejected', () => {
    expect(() => wheelPinion.compute({ moduleMm: 0, wheelTeeth: 64, pinionLeaves: 8 })).toThrow(ZodError);
    expect(() => wheelPinion.compute({ moduleMm: 1, wheelTeeth: 64.5, pinionLeaves: 8 })).toThrow(ZodError);
  });

  it('when a wheel of 1000 teeth is asked for, then a warning says it is far outside bench practice', () => {
    const { warnings } = wheelPinion.compute({ moduleMm: 0.1, wheelTeeth: 1000, pinionLeaves: 8 });
    expect(warnings.join(' ')).toMatch(/wheel of 1000 teeth is far outside bench practice/);
  });

  it('when the wheel has few teeth and the pinion many leaves, then both leave the rules and warnings say so', () => {
    const { warnings } = wheelPinion.compute({ moduleMm: 1, wheelTeeth: 12, pinionLeaves: 20 });
    expect(warnings.some((w) => w.includes('17 teeth'))).toBe(true);
    expect(warnings.some((w) => w.includes('16 leaves'))).toBe(true);
    expect(warnings.some((w) => w.includes('fewer teeth'))).toBe(true);
  });

  it('when the mesh is drawn, then the pitch circles touch at the pitch point and the box holds both blanks', () => {
    const { results } = wheelPinion.compute({ moduleMm: 0.5, wheelTeeth: 64, pinionLeaves: 8 });
    const drawing = meshDrawing(results);
    expect(drawing.pinion.cx - drawing.wheel.cx).toBeCloseTo(
      drawing.wheel.pitchRadiusMm + drawing.pinion.pitchRadiusMm,
      9,
    );
    expect(drawing.pitchPoint.x).toBeCloseTo(16, 9);
    expect(drawing.bounds.minX).toBeCloseTo(-16.69, 9);
    expect(drawing.bounds.maxX).toBeCloseTo(18 + 2.4275, 9);
    expect(drawing.bounds.maxY).toBeCloseTo(16.69, 9);
  });

  it('when any valid sizes are entered, then every result and drawing number is finite and the blanks exceed the pitch circles', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 20, noNaN: true }),
        fc.integer({ min: 3, max: 1000 }),
        fc.integer({ min: 3, max: 200 }),
        fc.option(fc.double({ min: 0.01, max: 50, noNaN: true }), { nil: undefined }),
        (moduleMm, wheelTeeth, pinionLeaves, trundle) => {
          const input =
            trundle === undefined
              ? { moduleMm, wheelTeeth, pinionLeaves }
              : { moduleMm, wheelTeeth, pinionLeaves, pinionKind: 'lantern' as const, trundleDiameterMm: trundle };
          const out = wheelPinion.compute(input);
          expect(allFinite(out.results)).toBe(true);
          expect(allFinite(meshDrawing(out.results))).toBe(true);
          expect(out.results.wheelBlankDiameterMm).toBeGreaterThan(out.results.wheelPitchDiameterMm);
          expect(out.results.pinionBlankDiameterMm).toBeGreaterThan(out.results.pinionPitchDiameterMm);
        },
      ),
    );
  });
});
