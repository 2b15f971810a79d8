import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import { fusee } from '../../../shared/calc/fusee';
import { numericLeaves } from './numeric-leaves';

const G = 9.80665;
// Readings whose torques come out at exactly the wanted N·mm: 1/g kg on the rod, balanced at T mm.
const readingsFor = (torques: number[]) => torques.map((t) => ({ massG: 1000 / G, distanceMm: t }));
const barrel = { barrelDiameterMm: 30, arborDiameterMm: 10, springThicknessMm: 0.3 };

describe('fusee: barrel fill and stiffness', () => {
  it("when the arbor radius is 3.65 mm as in the blog's working, then the half-fill length is 619.04 mm (Daniels, Watchmaking, ch. 9, worked example on watchmaking.weebly.com)", () => {
    const { results } = fusee.compute({ barrelDiameterMm: 21.3, arborDiameterMm: 7.3, springThicknessMm: 0.254 });
    expect(results.springLengthMm).toBeCloseTo(619.04, 2);
  });

  it("when Daniels' barrel is entered with its true 7.1 mm arbor, then the spring is 623.49 mm and gives 6.599 turns (TRADE.md §6, computed)", () => {
    const { results } = fusee.compute({ barrelDiameterMm: 21.3, arborDiameterMm: 7.1, springThicknessMm: 0.254 });
    expect(results.springLengthMm).toBeCloseTo(623.49, 2);
    expect(results.turns).toBeCloseTo(6.599, 3);
    expect(results.coilsWoundUp).toBeCloseTo(17.276, 3);
    expect(results.coilsRunDown).toBeCloseTo(10.677, 3);
  });

  it('when the arbor is a third of the barrel, then no arbor warning is given, and a smaller arbor gets one (Daniels, Watchmaking, ch. 9: arbor one third of the barrel)', () => {
    const third = fusee.compute({ barrelDiameterMm: 21.3, arborDiameterMm: 7.1, springThicknessMm: 0.254 });
    expect(third.warnings.some((w) => w.includes('arbor'))).toBe(false);
    const small = fusee.compute({ barrelDiameterMm: 21.3, arborDiameterMm: 4, springThicknessMm: 0.254 });
    expect(small.warnings.some((w) => w.includes('arbor'))).toBe(true);
  });

  it('when no modulus is given, then spring steel’s E = 206×10³ N/mm² is used (Tokai Bane "Flat springs formulas", Table 2), giving k = 143.06 N·mm/rad for b 10, t 1, l 1200 (computed)', () => {
    // Worked here: 206 000 × 10 × 1³ / (12 × 1200) = 143.06 N·mm/rad, × 2π = 898.84 N·mm a turn (computed). Tokai's
    // own worked results for these figures were not visible on its page, so they are not quoted.
    const { results } = fusee.compute({ springThicknessMm: 1, springLengthMm: 1200, springWidthMm: 10 });
    expect(results.stiffnessNmmPerRad).toBeCloseTo((206_000 * 10) / (12 * 1200), 9);
    expect(results.stiffnessNmmPerRad).toBeCloseTo(143.06, 2);
    expect(results.torquePerTurnNmm).toBeCloseTo(898.84, 2);
  });

  it('when the barrel is 30 mm with a 10 mm arbor and 0.30 mm strip, then the spring is 1047.2 mm and gives 7.869 turns (TRADE.md §6, computed)', () => {
    const { results } = fusee.compute(barrel);
    expect(results.springLengthMm).toBeCloseTo(1047.2, 1);
    expect(results.turns).toBeCloseTo(7.869, 3);
  });

  it('when a strip 20 × 0.4 mm and 1000 mm long is wound one turn, then it gives 138.06 N·mm (TRADE.md §6, computed)', () => {
    const { results } = fusee.compute({ springThicknessMm: 0.4, springLengthMm: 1000, springWidthMm: 20 });
    expect(results.torquePerTurnNmm).toBeCloseTo(138.06, 2);
  });
});

describe('fusee: radii from the readings alone', () => {
  it('when the spring is the last to be wound, then the chain lies on the smallest fusee radius (Wikipedia "Fusee (horology)")', () => {
    const { results } = fusee.compute({ readings: readingsFor([450, 600, 750, 900]), maxRadiusMm: 10 });
    expect(Math.min(...results.radiiMm)).toBe(results.radiiMm[results.radiiMm.length - 1]);
    expect(Math.max(...results.radiiMm)).toBe(results.radiiMm[0]);
  });

  it('when the spring gives 450 to 900 N·mm and the fusee is 10 mm at its widest, then the radii are 10, 7.5, 6 and 5 mm with no barrel sizes at all (TRADE.md §6, computed)', () => {
    // TRADE.md §6: r = Q·R/T with R = 15 mm and Q = 300 N·mm; Q = T_min·r_max/R, so r = r_max·T_min/T and R cancels.
    const { results, warnings } = fusee.compute({ readings: readingsFor([450, 600, 750, 900]), maxRadiusMm: 10 });
    results.radiiMm.forEach((r, i) => expect(r).toBeCloseTo([10, 7.5, 6, 5][i], 9));
    expect(results.springLengthMm).toBeNull();
    expect(results.turns).toBeNull();
    expect(results.spreadBeforePercent).toBeCloseTo((450 / 675) * 100, 9);
    expect(results.spreadAfterPercent).toBeLessThan(1e-9);
    expect(results.fuseeTorqueNmm).toEqual([]);
    expect(warnings).toEqual([]);
  });

  it('when the barrel sizes change, then the radii do not', () => {
    const alone = fusee.compute({ readings: readingsFor([450, 600]), maxRadiusMm: 10 }).results.radiiMm;
    const withBarrel = fusee.compute({ ...barrel, readings: readingsFor([450, 600]), maxRadiusMm: 10 }).results.radiiMm;
    expect(withBarrel).toEqual(alone);
  });

  it('when the readings come without a largest radius, then the torque curve shows and the radii wait for it', () => {
    const out = fusee.compute({ readings: readingsFor([450, 600]) });
    expect(out.results.torqueCurve.map((p) => p.springTorqueNmm)).toEqual([
      expect.closeTo(450, 9),
      expect.closeTo(600, 9),
    ]);
    expect(out.results.radiiMm).toEqual([]);
    expect(out.results.spreadAfterPercent).toBeNull();
    expect(out.steps.find((s) => s.label === 'Fusee radii')?.result).toBe('give the largest radius');
  });

  it('when 1 lb balances 3 in from the square, then the spring torque is 0.3390 N·m (1 lb = 0.45359237 kg and 1 in = 25.4 mm by the 1959 international yard and pound agreement, from memory; computed)', () => {
    const { results } = fusee.compute({ readings: [{ massG: 453.59237, distanceMm: 76.2 }] });
    expect(results.torqueCurve[0].springTorqueNmm / 1000).toBeCloseTo(0.339, 4);
  });

  it('when a reading falls as the spring is wound, then a warning asks to check the order', () => {
    const { warnings } = fusee.compute({ readings: readingsFor([900, 750, 600]) });
    expect(warnings.some((w) => w.includes('Reading 2 is lower than reading 1'))).toBe(true);
  });

  it('when the readings give fusee radii of nanometres, then a warning says they are far outside bench practice', () => {
    const { warnings } = fusee.compute({ readings: readingsFor([450, 900]), maxRadiusMm: 0.000001 });
    expect(warnings.join(' ')).toMatch(/fusee radius of 0.000001 mm is far outside bench practice/);
  });
});

describe('fusee: the chain on the barrel', () => {
  it('when the barrel is 32 mm outside and the chain 1.0 mm thick, then the chain radius offered is 16.5 mm, not the 15 mm half inside diameter (computed)', () => {
    // Outside radius + half the chain: 32/2 + 1.0/2 = 16.5 mm (computed).
    const out = fusee.compute({ ...barrel, barrelOutsideDiameterMm: 32, chainThicknessMm: 1 });
    expect(out.results.chainRadiusMm).toBeCloseTo(16.5, 12);
    expect(out.steps.some((s) => s.label.startsWith('Chain radius on the barrel, offered'))).toBe(true);
  });

  it('when a chain radius is measured, then it is used in place of the offered one', () => {
    const out = fusee.compute({
      barrelOutsideDiameterMm: 32,
      chainThicknessMm: 1,
      chainRadiusMm: 16.4,
      readings: readingsFor([450]),
    });
    expect(out.results.chainRadiusMm).toBe(16.4);
  });

  it('when the chain pulls at 16.5 mm on 450 to 900 N·mm and the fusee is 10 mm at its widest, then the chain pulls 27.3–54.5 N and the fusee gives 272.7 N·mm on every turn (computed)', () => {
    // F = T/R_c: 450/16.5 = 27.27 N, 900/16.5 = 54.55 N; Q = F·r = 27.27 × 10 = 272.7 N·mm (computed).
    const { results } = fusee.compute({
      readings: readingsFor([450, 600, 750, 900]),
      maxRadiusMm: 10,
      chainRadiusMm: 16.5,
    });
    expect(results.chainTensionN[0]).toBeCloseTo(450 / 16.5, 9);
    expect(results.chainTensionN[3]).toBeCloseTo(900 / 16.5, 9);
    results.fuseeTorqueNmm.forEach((q) => expect(q).toBeCloseTo((450 * 10) / 16.5, 9));
  });
});

describe('fusee: input checks', () => {
  it('when the spring is longer than the barrel holds or the arbor fills the barrel, then the input is rejected', () => {
    expect(() => fusee.compute({ ...barrel, springLengthMm: 3000 })).toThrow(ZodError);
    expect(() => fusee.compute({ ...barrel, arborDiameterMm: 30 })).toThrow(ZodError);
  });

  it('when a barrel is given without its arbor, or nothing at all is given, then the input is rejected by field', () => {
    const fields = (input: object) => {
      try {
        fusee.compute(input);
        return [];
      } catch (err) {
        return (err as ZodError).issues.map((i) => i.path.join('.'));
      }
    };
    expect(fields({ barrelDiameterMm: 30, springThicknessMm: 0.3 })).toEqual(['arborDiameterMm']);
    expect(fields({})).toEqual(['barrelDiameterMm']);
    expect(fields({ readings: readingsFor([450]), barrelOutsideDiameterMm: 32 })).toEqual(['chainThicknessMm']);
    expect(fields({ ...barrel, barrelOutsideDiameterMm: 28, chainThicknessMm: 1 })).toEqual([
      'barrelOutsideDiameterMm',
    ]);
  });

  it('when a spring much shorter than half fill is entered, then a warning compares its turns with half fill', () => {
    const { warnings } = fusee.compute({ ...barrel, springLengthMm: 400 });
    expect(warnings.some((w) => w.includes('half the free area'))).toBe(true);
  });
});

describe('fusee properties', () => {
  it('when any readings, largest radius and chain radius are entered, then the radii even the fusee torque to within 1 % and all numbers are finite', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 80, noNaN: true }),
        fc.double({ min: 0.2, max: 0.5, noNaN: true }),
        fc.double({ min: 0.05, max: 0.5, noNaN: true }),
        fc.array(
          fc.record({
            massG: fc.double({ min: 1, max: 5000, noNaN: true }),
            distanceMm: fc.double({ min: 1, max: 1000, noNaN: true }),
          }),
          { minLength: 1, maxLength: 16 },
        ),
        fc.double({ min: 1, max: 100, noNaN: true }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        (D, arborShare, t, readings, maxRadiusMm, chainRadiusMm) => {
          const out = fusee.compute({
            barrelDiameterMm: D,
            arborDiameterMm: D * arborShare,
            springThicknessMm: t,
            springWidthMm: 5,
            readings,
            maxRadiusMm,
            chainRadiusMm,
          });
          expect(numericLeaves(out.results).every(Number.isFinite)).toBe(true);
          const q = out.results.fuseeTorqueNmm;
          const mean = q.reduce((a, b) => a + b, 0) / q.length;
          q.forEach((x) => expect(Math.abs(x - mean) / mean).toBeLessThan(0.01));
          expect(out.results.spreadAfterPercent).toBeLessThan(1);
          expect(out.results.radiiMm).toHaveLength(readings.length);
        },
      ),
      { numRuns: 300 },
    );
  });
});
