import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import { fusee } from '../../../shared/calc/fusee';

const allFinite = (v: unknown): boolean =>
  typeof v === 'number'
    ? Number.isFinite(v)
    : Array.isArray(v)
      ? v.every(allFinite)
      : v !== null && typeof v === 'object'
        ? Object.values(v).every(allFinite)
        : true;

const G = 9.80665;
// Readings whose torques come out at exactly the wanted N·mm: 1/g kg on the rod, balanced at T mm.
const readingsFor = (torques: number[]) => torques.map((t) => ({ massG: 1000 / G, distanceMm: t }));

describe('fusee', () => {
  it("when the arbor radius is 3.65 mm as in the blog's working, then the half-fill length is 619.04 mm", () => {
    // Daniels, Watchmaking, ch. 9 (worked example on watchmaking.weebly.com "The Mainsprings"): L = 619.04 mm
    const { results } = fusee.compute({ barrelDiameterMm: 21.3, arborDiameterMm: 7.3, springThicknessMm: 0.254 });
    expect(results.springLengthMm).toBeCloseTo(619.04, 2);
  });

  it("when Daniels' barrel is entered with its true 7.1 mm arbor, then the spring is 623.49 mm and gives 6.599 turns", () => {
    // Daniels' barrel (ID 21.3 mm, arbor 7.1 mm, strip 0.254 mm); L, N, n_u, n_d (computed)
    const { results } = fusee.compute({ barrelDiameterMm: 21.3, arborDiameterMm: 7.1, springThicknessMm: 0.254 });
    expect(results.springLengthMm).toBeCloseTo(623.49, 2);
    expect(results.turns).toBeCloseTo(6.599, 3);
    expect(results.coilsWoundUp).toBeCloseTo(17.276, 3);
    expect(results.coilsRunDown).toBeCloseTo(10.677, 3);
  });

  it('when the arbor is a third of the barrel, then no arbor warning is given, and a smaller arbor gets one', () => {
    // Daniels, Watchmaking, ch. 9: arbor one third of the barrel diameter
    const third = fusee.compute({ barrelDiameterMm: 21.3, arborDiameterMm: 7.1, springThicknessMm: 0.254 });
    expect(third.warnings.some((w) => w.includes('arbor'))).toBe(false);
    const small = fusee.compute({ barrelDiameterMm: 21.3, arborDiameterMm: 4, springThicknessMm: 0.254 });
    expect(small.warnings.some((w) => w.includes('arbor'))).toBe(true);
  });

  it('when no modulus is given, then the spring-steel 206 GPa is used', () => {
    // Tokai Bane "Flat springs formulas", Table 2: E = 206×10³ N/mm²; Tokai example b 10, t 1, l 1200 → k 143.06, M per turn 898.84 (computed)
    const { results } = fusee.compute({
      barrelDiameterMm: 60,
      arborDiameterMm: 20,
      springThicknessMm: 1,
      springLengthMm: 1200,
      springWidthMm: 10,
    });
    expect(results.stiffnessNmmPerRad).toBeCloseTo(143.06, 2);
    expect(results.torquePerTurnNmm).toBeCloseTo(898.84, 2);
  });

  it('when the spring is the last to be wound, then the chain lies on the smallest fusee radius', () => {
    // Wikipedia "Fusee (horology)": the chain is on the small diameter when fully wound
    const { results } = fusee.compute({
      barrelDiameterMm: 30,
      arborDiameterMm: 10,
      springThicknessMm: 0.3,
      readings: readingsFor([450, 600, 750, 900]),
    });
    expect(Math.min(...results.radiiMm)).toBe(results.radiiMm[results.radiiMm.length - 1]);
    expect(Math.max(...results.radiiMm)).toBe(results.radiiMm[0]);
  });

  it('when the barrel is 30 mm with a 10 mm arbor and 0.30 mm strip, then the spring is 1047.2 mm and gives 7.869 turns', () => {
    // (computed)
    const { results } = fusee.compute({ barrelDiameterMm: 30, arborDiameterMm: 10, springThicknessMm: 0.3 });
    expect(results.springLengthMm).toBeCloseTo(1047.2, 1);
    expect(results.turns).toBeCloseTo(7.869, 3);
  });

  it('when a strip 20 × 0.4 mm and 1000 mm long is wound one turn, then it gives 138.06 N·mm', () => {
    // (computed) M = 2π·E·b·t³/(12L)
    const { results } = fusee.compute({
      barrelDiameterMm: 40,
      arborDiameterMm: 13,
      springThicknessMm: 0.4,
      springLengthMm: 1000,
      springWidthMm: 20,
    });
    expect(results.torquePerTurnNmm).toBeCloseTo(138.06, 2);
  });

  it('when the spring gives 450 to 900 N·mm on a 15 mm barrel and the fusee is 10 mm at its widest, then the radii are 10, 7.5, 6 and 5 mm', () => {
    // (computed) r = Q·R_b/T with Q = 300 N·mm
    const { results } = fusee.compute({
      barrelDiameterMm: 30,
      arborDiameterMm: 10,
      springThicknessMm: 0.3,
      readings: readingsFor([450, 600, 750, 900]),
      maxRadiusMm: 10,
      barrelRadiusMm: 15,
    });
    results.radiiMm.forEach((r, i) => expect(r).toBeCloseTo([10, 7.5, 6, 5][i], 9));
    results.fuseeTorqueNmm.forEach((q) => expect(q).toBeCloseTo(300, 9));
    expect(results.torqueCurve.map((p) => p.turn)).toEqual([1, 2, 3, 4]);
    expect(results.spreadBeforePercent).toBeCloseTo((450 / 675) * 100, 9);
    expect(results.spreadAfterPercent).toBeLessThan(1e-9);
  });

  it('when 1 lb balances 3 in from the square, then the spring torque is 0.3390 N·m', () => {
    // (computed) 3 lbf·in
    const { results } = fusee.compute({
      barrelDiameterMm: 30,
      arborDiameterMm: 10,
      springThicknessMm: 0.3,
      readings: [{ massG: 453.59237, distanceMm: 76.2 }],
    });
    expect(results.torqueCurve[0].springTorqueNmm / 1000).toBeCloseTo(0.339, 4);
  });

  it('when a reading falls as the spring is wound, then a warning asks to check the order', () => {
    const { warnings } = fusee.compute({
      barrelDiameterMm: 30,
      arborDiameterMm: 10,
      springThicknessMm: 0.3,
      readings: readingsFor([900, 750, 600]),
    });
    expect(warnings.some((w) => w.includes('Reading 2 is lower than reading 1'))).toBe(true);
  });

  it('when the spring is longer than the barrel holds or the arbor fills the barrel, then the input is rejected', () => {
    expect(() =>
      fusee.compute({ barrelDiameterMm: 30, arborDiameterMm: 10, springThicknessMm: 0.3, springLengthMm: 3000 }),
    ).toThrow(ZodError);
    expect(() => fusee.compute({ barrelDiameterMm: 30, arborDiameterMm: 30, springThicknessMm: 0.3 })).toThrow(
      ZodError,
    );
  });

  it('when a spring much shorter than half fill is entered, then a warning compares its turns with half fill', () => {
    const { warnings } = fusee.compute({
      barrelDiameterMm: 30,
      arborDiameterMm: 10,
      springThicknessMm: 0.3,
      springLengthMm: 400,
    });
    expect(warnings.some((w) => w.includes('half the free area'))).toBe(true);
  });

  it('when any rising or falling readings are entered, then the radii even the fusee torque to within 1 % and all numbers are finite', () => {
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
          {
            minLength: 1,
            maxLength: 16,
          },
        ),
        fc.double({ min: 1, max: 100, noNaN: true }),
        (D, arborShare, t, readings, maxRadiusMm) => {
          const out = fusee.compute({
            barrelDiameterMm: D,
            arborDiameterMm: D * arborShare,
            springThicknessMm: t,
            springWidthMm: 5,
            readings,
            maxRadiusMm,
          });
          expect(allFinite(out.results)).toBe(true);
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
