import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import { beatsForLength, lengthForBeats, searchTrains, trainPendulum } from '../../../shared/calc/train-pendulum';

const allFinite = (v: unknown): boolean =>
  typeof v === 'number'
    ? Number.isFinite(v)
    : Array.isArray(v)
      ? v.every(allFinite)
      : v !== null && typeof v === 'object'
        ? Object.values(v).every(allFinite)
        : true;

const product = (xs: number[]) => xs.reduce((p, x) => p * x, 1);

describe('train-pendulum', () => {
  it('when the beat is one second at standard gravity, then the pendulum is 0.994 m', () => {
    // Wikipedia "Seconds pendulum": "0.994 m (39.1 in) at standard gravity"; 993.621 mm (computed)
    expect(lengthForBeats(3600) / 1000).toBeCloseTo(0.994, 3);
    expect(lengthForBeats(3600)).toBeCloseTo(993.621, 3);
  });

  it('when gravity is 9.81 m/s², then the seconds pendulum is still 0.994 m', () => {
    // byjus.com gives 0.994 m; 993.961 mm (computed)
    expect(lengthForBeats(3600, 9.81) / 1000).toBeCloseTo(0.994, 3);
    expect(lengthForBeats(3600, 9.81)).toBeCloseTo(993.961, 3);
  });

  it('when a uniform rod of 1.5 m swings, then it acts as a 1 m pendulum with a period of 2.00641 s', () => {
    // HyperPhysics "Rod pendulum" formula (hyperphysics.phy-astr.gsu.edu/hbase/penrod.html): L_eq = 2L/3
    const { results } = trainPendulum.compute({
      wheelTeeth: [64, 60],
      pinionLeaves: [8, 8],
      escapeTeeth: 30,
      pendulum: { kind: 'rod', rodLengthMm: 1500 },
    });
    expect(results.equivalentLengthMm).toBeCloseTo(1000, 9);
    expect(results.physicalPeriodS).toBeCloseTo(2.00641, 5);
  });

  it('when the train is 80/12 × 72/8 with a 30-tooth escape wheel, then it beats 3600 an hour', () => {
    // (computed) 80/12 × 72/8 × 30 × 2 = 3600 BPH
    const { results, warnings } = trainPendulum.compute({
      wheelTeeth: [80, 72],
      pinionLeaves: [12, 8],
      escapeTeeth: 30,
    });
    expect(results.beatsPerHour).toBeCloseTo(3600, 9);
    expect(results.periodS).toBeCloseTo(2, 12);
    expect(results.pendulumLengthMm).toBeCloseTo(993.621, 3);
    expect(warnings).toEqual([]);
  });

  it('when the beat rate is 7200, 5400, 4800, 8100 or 9000, then the lengths are the tabled ones', () => {
    // (computed) L = gT²/(4π²), T = 7200/BPH, g = 9.80665
    expect(lengthForBeats(7200)).toBeCloseTo(248.405, 3);
    expect(lengthForBeats(5400)).toBeCloseTo(441.61, 3);
    expect(lengthForBeats(4800)).toBeCloseTo(558.912, 3);
    expect(lengthForBeats(8100)).toBeCloseTo(196.271, 3);
    expect(lengthForBeats(9000)).toBeCloseTo(158.979, 3);
  });

  it('when a simple pendulum is 1 m long, then its period is 2.00641 s', () => {
    // (computed)
    expect(7200 / beatsForLength(1000)).toBeCloseTo(2.00641, 5);
    expect(beatsForLength(lengthForBeats(5400))).toBeCloseTo(5400, 9);
  });

  it('when a heavy point bob hangs on a light rod, then the equivalent length is the bob centre, and a disc bob adds ρ²/2c', () => {
    // (computed) L_eq = I/(m·d)
    const point = trainPendulum.compute({
      wheelTeeth: [64, 60],
      pinionLeaves: [8, 8],
      escapeTeeth: 30,
      pendulum: { kind: 'rod-and-bob', rodLengthMm: 1000, rodMassG: 0, bobMassG: 1000, bobCentreMm: 994 },
    });
    expect(point.results.equivalentLengthMm).toBeCloseTo(994, 9);
    const disc = trainPendulum.compute({
      wheelTeeth: [64, 60],
      pinionLeaves: [8, 8],
      escapeTeeth: 30,
      pendulum: {
        kind: 'rod-and-bob',
        rodLengthMm: 1000,
        rodMassG: 100,
        bobMassG: 1000,
        bobCentreMm: 1000,
        bobRadiusMm: 100,
      },
    });
    // [100·1000²/3 + 1000·(1000² + 100²/2)] / (100·500 + 1000·1000) = 988.889 mm (computed)
    expect(disc.results.equivalentLengthMm).toBeCloseTo(988.889, 3);
  });

  it('when the pendulum does not match the train, then a warning gives both periods', () => {
    const { warnings } = trainPendulum.compute({
      wheelTeeth: [64, 60],
      pinionLeaves: [8, 8],
      escapeTeeth: 30,
      pendulum: { kind: 'rod', rodLengthMm: 1000 },
    });
    expect(warnings.some((w) => w.includes('period'))).toBe(true);
  });

  it('when a target of 3600 is asked with two pairs, then every suggestion beats exactly 3600 and the longcase train is among them', () => {
    // The longcase train 64 : 8, 60 : 8, escape 30 (from memory) gives 3600 BPH (computed)
    const all = searchTrains(3600, 2, 100000);
    expect(all.length).toBeGreaterThan(10);
    for (const s of all) {
      expect(2 * s.escapeTeeth * product(s.wheelTeeth)).toBe(3600 * product(s.pinionLeaves));
      expect(s.wheelTeeth.every((w) => w >= 48 && w <= 128)).toBe(true);
      expect(s.pinionLeaves.every((p) => p >= 6 && p <= 16)).toBe(true);
      expect(s.escapeTeeth >= 20 && s.escapeTeeth <= 45).toBe(true);
    }
    expect(all).toContainEqual({ wheelTeeth: [64, 60], pinionLeaves: [8, 8], escapeTeeth: 30, beatsPerHour: 3600 });
  });

  // Speed is measured by `npm run bench`, not here: a timed assertion fails on a busy machine.
  it('when only the best ten are asked, then they are the first ten of the full ranking', () => {
    for (const [target, pairs] of [
      [5400, 2],
      [8100, 3],
      [14400, 3],
    ]) {
      const best = searchTrains(target, pairs, 10);
      expect(best).toEqual(searchTrains(target, pairs, 1000000).slice(0, 10));
    }
  });

  it('when the target is given in compute, then suggestions follow the number of pairs entered', () => {
    const { results } = trainPendulum.compute({
      wheelTeeth: [80, 72],
      pinionLeaves: [12, 8],
      escapeTeeth: 30,
      targetBeatsPerHour: 5400,
    });
    expect(results.suggestions).toHaveLength(10);
    expect(results.suggestions?.every((s) => s.wheelTeeth.length === 2)).toBe(true);
  });

  it('when no train can reach the target, then suggestions are empty and a warning says so', () => {
    const { results, warnings } = trainPendulum.compute({
      wheelTeeth: [80],
      pinionLeaves: [8],
      escapeTeeth: 30,
      targetBeatsPerHour: 110,
    });
    expect(results.suggestions).toEqual([]);
    expect(warnings.some((w) => w.includes('110 beats per hour'))).toBe(true);
  });

  it('when the train is 3.3 % off the beat wanted, then a warning says how much a day the hands would lose (computed)', () => {
    // 80/12 × 72/8 × 31 × 2 = 3720 BPH; a 3600 BPH pendulum turns the centre wheel in 3720/3600 h, so the hands lose
    // 86 400 × (1 − 3600/3720) = 2787 s a day (computed).
    const { warnings } = trainPendulum.compute({
      wheelTeeth: [80, 72],
      pinionLeaves: [12, 8],
      escapeTeeth: 31,
      targetBeatsPerHour: 3600,
    });
    expect(warnings.join(' ')).toMatch(/3720 beats an hour, 3\.33333 % over the 3600 wanted.*lose 2787\.1 s a day/);
  });

  it('when the train gives exactly the beat wanted, then no beat warning is given', () => {
    const { warnings } = trainPendulum.compute({
      wheelTeeth: [80, 72],
      pinionLeaves: [12, 8],
      escapeTeeth: 30,
      targetBeatsPerHour: 3600,
    });
    expect(warnings.join(' ')).not.toMatch(/wanted/);
  });

  it('when wheels and pinions differ in number, then the input is rejected', () => {
    expect(() => trainPendulum.compute({ wheelTeeth: [80, 72], pinionLeaves: [12], escapeTeeth: 30 })).toThrow(
      ZodError,
    );
  });

  it('when any valid train and pendulum are entered, then every result is finite', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: 1, max: 1000 }), fc.integer({ min: 1, max: 1000 })), {
          minLength: 1,
          maxLength: 4,
        }),
        fc.integer({ min: 1, max: 1000 }),
        fc.double({ min: 9, max: 10.5, noNaN: true }),
        fc.double({ min: 1, max: 20000, noNaN: true }),
        fc.double({ min: 0, max: 1e6, noNaN: true }),
        (pairs, escapeTeeth, gravity, length, rodMassG) => {
          const out = trainPendulum.compute({
            wheelTeeth: pairs.map((p) => p[0]),
            pinionLeaves: pairs.map((p) => p[1]),
            escapeTeeth,
            gravity,
            pendulum: {
              kind: 'rod-and-bob',
              rodLengthMm: length,
              rodMassG,
              bobMassG: 500,
              bobCentreMm: length,
              bobRadiusMm: Math.min(length / 2, 1000),
            },
          });
          expect(allFinite(out.results)).toBe(true);
        },
      ),
      { numRuns: 200 },
    );
  });
});
