import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import { intersectCircles, planting } from '../../../shared/calc/planting';

const allFinite = (v: unknown): boolean =>
  typeof v === 'number'
    ? Number.isFinite(v)
    : Array.isArray(v)
      ? v.every(allFinite)
      : v !== null && typeof v === 'object'
        ? Object.values(v).every(allFinite)
        : true;

const dist = (p: { x: number; y: number }, q: { x: number; y: number }) => Math.hypot(p.x - q.x, p.y - q.y);

const SQUIRE = { p0: { x: -0.1, y: -0.2 }, r0: 2.0, p1: { x: 2.0, y: 1.0 }, r1: 2.1 };
const squire = () => {
  const cut = intersectCircles(SQUIRE.p0, SQUIRE.r0, SQUIRE.p1, SQUIRE.r1);
  if (!cut.ok) throw new Error(cut.reason);
  return cut;
};

describe('planting', () => {
  it('when the circles of the course example are crossed, then the centres are 2.418677 apart', () => {
    // UMBC, J. Squire course output (userpages.umbc.edu/~squire/download/circle_circle_c.out): d = 2.418677
    expect(squire().d).toBeCloseTo(2.418677, 6);
  });

  it('when the circles of the course example are crossed, then a = 1.124582 and h = 1.653879', () => {
    // UMBC, J. Squire course output (userpages.umbc.edu/~squire/download/circle_circle_c.out)
    expect(squire().a).toBeCloseTo(1.124582, 6);
    expect(squire().h).toBeCloseTo(1.653879, 6);
  });

  it('when the circles of the course example are crossed, then they meet at (1.696964, −1.078021) and (0.055856, 1.793918)', () => {
    // UMBC, J. Squire course output (userpages.umbc.edu/~squire/download/circle_circle_c.out)
    const { left, right } = squire();
    expect(right.x).toBeCloseTo(1.696964, 6);
    expect(right.y).toBeCloseTo(-1.078021, 6);
    expect(left.x).toBeCloseTo(0.055856, 6);
    expect(left.y).toBeCloseTo(1.793918, 6);
  });

  it('when the centres are too far apart or one circle is inside the other, then there is no crossing and a reason', () => {
    // ANU "Intersection between two circles (3)": no solution if d > r₀ + r₁ or d < |r₀ − r₁|
    const far = intersectCircles({ x: 0, y: 0 }, 10, { x: 50, y: 0 }, 20);
    expect(far).toMatchObject({ ok: false });
    if (!far.ok) expect(far.reason).toContain('do not meet');
    const inside = intersectCircles({ x: 0, y: 0 }, 30, { x: 5, y: 0 }, 10);
    expect(inside).toMatchObject({ ok: false });
    if (!inside.ok) expect(inside.reason).toContain('inside');
    expect(intersectCircles({ x: 3, y: 4 }, 5, { x: 3, y: 4 }, 5)).toMatchObject({ ok: false });
  });

  it('when C is 25 mm from A(0,0) and 30 mm from B(40,0), then C is at (16.5625, ±18.7265)', () => {
    // (computed)
    const { results, warnings } = planting.compute({
      arbors: [
        { name: 'A', x: 0, y: 0 },
        { name: 'B', x: 40, y: 0 },
        { name: 'C', from: ['A', 'B'], distances: [25, 30], side: 'left' },
        { name: 'D', from: ['A', 'B'], distances: [25, 30], side: 'right' },
      ],
    });
    const [c, d] = results.arbors.slice(2);
    expect(c.x).toBeCloseTo(16.5625, 9);
    expect(c.y).toBeCloseTo(18.7265, 4);
    expect(d.y).toBeCloseTo(-18.7265, 4);
    expect(results.depths.map((x) => [x.from, x.to])).toEqual([
      ['A', 'C'],
      ['B', 'C'],
      ['A', 'D'],
      ['B', 'D'],
    ]);
    expect(results.depths[1].distanceMm).toBeCloseTo(30, 9);
    expect(warnings).toEqual([]);
  });

  it('when the datum is a pillar and an arbor is placed by distance and angle, then drilling coordinates are measured from the pillar', () => {
    // (computed) 20 mm at 90° from (10, 5); datum (4, 2)
    const { results } = planting.compute({
      datum: { x: 4, y: 2 },
      arbors: [
        { name: 'centre', x: 10, y: 5, pitchRadiusMm: 16 },
        { name: 'third', from: 'centre', distance: 20, angleDeg: 90 },
      ],
    });
    expect(results.arbors[0]).toMatchObject({ fromDatum: { x: 6, y: 3 }, pitchRadiusMm: 16 });
    expect(results.arbors[1].x).toBeCloseTo(10, 9);
    expect(results.arbors[1].y).toBeCloseTo(25, 9);
    expect(results.arbors[1].fromDatum.y).toBeCloseTo(23, 9);
    expect(results.depths[0]).toMatchObject({ from: 'centre', to: 'third' });
    expect(results.depths[0].angleDeg).toBeCloseTo(90, 9);
  });

  it('when a placement is impossible, then that arbor and the ones measured from it are left out with reasons', () => {
    const { results, warnings } = planting.compute({
      arbors: [
        { name: 'A', x: 0, y: 0 },
        { name: 'B', x: 40, y: 0 },
        { name: 'C', from: ['A', 'B'], distances: [10, 10], side: 'left' },
        { name: 'D', from: 'C', distance: 5, angleDeg: 0 },
        { name: 'E', from: ['A', 'Z'], distances: [10, 10], side: 'left' },
        { name: 'B', x: 1, y: 1 },
      ],
    });
    expect(results.arbors.map((a) => a.name)).toEqual(['A', 'B']);
    expect(results.problems.map((p) => p.arbor)).toEqual(['C', 'D', 'E', 'B']);
    expect(results.problems[0].reason).toContain('do not meet');
    expect(results.problems[1].reason).toContain('could not be placed');
    expect(results.problems[2].reason).toContain('no arbor named "Z"');
    expect(results.problems[3].reason).toContain('used twice');
    expect(warnings).toHaveLength(4);
  });

  it('when an arbor is planted 0.5 mm from another or 9 m from the datum, then warnings say it is far outside bench practice', () => {
    const close = planting.compute({
      arbors: [
        { name: 'A', x: 0, y: 0 },
        { name: 'B', from: 'A', distance: 0.5, angleDeg: 0 },
      ],
    });
    expect(close.warnings.join(' ')).toMatch(/centre distance A → B of 0\.5 mm is far outside bench practice/);
    const far = planting.compute({ arbors: [{ name: 'A', x: 9000, y: 0 }] });
    expect(far.warnings.join(' ')).toMatch(/A lies 9000 mm from the datum/);
  });

  it('when the first arbor is not placed by coordinates, then the input is rejected', () => {
    expect(() => planting.compute({ arbors: [{ name: 'A', from: 'B', distance: 5, angleDeg: 0 }] })).toThrow(ZodError);
  });

  it('when any two circles cross, then the planted point lies at both distances to 1e-9 on the side asked for', () => {
    const coord = fc.double({ min: -200, max: 200, noNaN: true });
    fc.assert(
      fc.property(
        coord,
        coord,
        fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
        fc.double({ min: 1, max: 200, noNaN: true }),
        fc.double({ min: 1, max: 200, noNaN: true }),
        fc.double({ min: 0.001, max: 0.999, noNaN: true }),
        fc.constantFrom('left' as const, 'right' as const),
        (x0, y0, theta, r0, r1, share, side) => {
          // A centre distance chosen strictly between |r0 − r1| and r0 + r1 guarantees a crossing.
          const lo = Math.abs(r0 - r1);
          const d = lo + share * (r0 + r1 - lo);
          fc.pre(d > 1e-6);
          const b = { x: x0 + d * Math.cos(theta), y: y0 + d * Math.sin(theta) };
          const { results } = planting.compute({
            arbors: [
              { name: 'A', x: x0, y: y0 },
              { name: 'B', ...b },
              { name: 'C', from: ['A', 'B'], distances: [r0, r1], side },
            ],
          });
          expect(results.problems).toEqual([]);
          const c = results.arbors[2];
          expect(Math.abs(dist(c, { x: x0, y: y0 }) - r0)).toBeLessThan(1e-9);
          expect(Math.abs(dist(c, b) - r1)).toBeLessThan(1e-9);
          const cross = (b.x - x0) * (c.y - y0) - (b.y - y0) * (c.x - x0);
          if (Math.abs(cross) > 1e-6) expect(cross > 0).toBe(side === 'left');
          expect(allFinite(results)).toBe(true);
        },
      ),
      { numRuns: 500 },
    );
  });
});
