import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import { PLATE_SETS, dividing } from '../../../shared/calc/dividing';

const plate = (key: string) => {
  const set = PLATE_SETS.find((p) => p.key === key);
  if (!set) throw new Error(`no plate set ${key}`);
  return set.circles;
};
const BS = plate('brown-sharpe');
const CINCINNATI = plate('cincinnati');
const moves = (teeth: number, circles: number[]) =>
  dividing.compute({ teeth, circles }).results.solutions.map((s) => s.fraction);
const possible = (teeth: number, circles: number[]) =>
  dividing.compute({ teeth, circles }).results.solutions.length > 0;

describe('dividing', () => {
  it('when 6 divisions are wanted, then it is 6 turns and 12 holes on the 18 circle, or 26 on the 39', () => {
    // OD 16448: 6 turns + 12 holes/18 (or 26/39)
    expect(moves(6, BS)).toEqual(expect.arrayContaining(['6 12/18', '6 26/39']));
    expect(moves(6, CINCINNATI)).toContain('6 26/39');
    const s = dividing.compute({ teeth: 6 }).results.solutions.find((x) => x.circle === 18);
    expect(s).toMatchObject({ wholeTurns: 6, holes: 12, sectorSpaces: 12 });
  });

  it('when 42 divisions are wanted, then it is 40 holes on the 42 circle or 20 on the 21', () => {
    // OD 16448: 40 holes/42 or 20 holes/21
    expect(moves(42, CINCINNATI)).toContain('40/42');
    expect(moves(42, BS)).toContain('20/21');
  });

  it('when the Brown & Sharpe plates are used, then they divide all numbers to 50 and all even numbers to 100, except 96', () => {
    // Brown & Sharpe, A Practical Treatise on Milling and Milling Machines: "divide all numbers to 50 and all even numbers to 100, except 96"
    for (let n = 2; n <= 50; n++) expect(possible(n, BS)).toBe(true);
    const evenFailures = [];
    for (let n = 52; n <= 100; n += 2) if (!possible(n, BS)) evenFailures.push(n);
    expect(evenFailures).toEqual([96]);
  });

  it('when one degree is wanted, then it is 2 holes on the 18 circle or 3 on the 27', () => {
    // Machinery's Handbook (1916), indexing for angles: 2 holes on the 18 circle = 1°, 3 holes on the 27 circle = 1°
    const found = moves(360, BS);
    expect(found).toEqual(expect.arrayContaining(['2/18', '3/27']));
  });

  it('when 60 or 64 divisions are wanted, then the smallest circles are 10/15 and 10/16 (B&S), 16/24 and 15/24 (Cincinnati)', () => {
    // (computed)
    expect(moves(60, BS)[0]).toBe('10/15');
    expect(moves(60, CINCINNATI)[0]).toBe('16/24');
    expect(moves(64, BS)[0]).toBe('10/16');
    expect(moves(64, CINCINNATI)[0]).toBe('15/24');
  });

  it('when 96 divisions are wanted, then the B&S plates cannot and the Cincinnati plate gives 10/24', () => {
    // computed and B&S statement
    const out = dividing.compute({ teeth: 96 });
    expect(out.results.solutions).toEqual([]);
    expect(
      out.warnings.some((w) => w.includes('not possible with these circles') && w.includes('differential indexing')),
    ).toBe(true);
    expect(moves(96, CINCINNATI)[0]).toBe('10/24');
  });

  it('when 127 divisions are wanted, then neither plate can do it', () => {
    // (computed)
    expect(possible(127, BS)).toBe(false);
    expect(possible(127, CINCINNATI)).toBe(false);
  });

  it('when 144 divisions are wanted, then it is 5/18 (B&S) or 15/54 (Cincinnati)', () => {
    // (computed)
    expect(moves(144, BS)).toEqual(['5/18']);
    expect(moves(144, CINCINNATI)).toEqual(['15/54']);
  });

  it('when the Cincinnati plate is used, then it divides every number to 60 and every even number to 120', () => {
    // (computed)
    for (let n = 2; n <= 60; n++) expect(possible(n, CINCINNATI)).toBe(true);
    for (let n = 62; n <= 120; n += 2) expect(possible(n, CINCINNATI)).toBe(true);
  });

  it('when the division is whole turns, then one answer says any circle will do', () => {
    const { results } = dividing.compute({ teeth: 4 });
    expect(results.solutions).toHaveLength(1);
    expect(results.solutions[0]).toMatchObject({ wholeTurns: 10, holes: 0, fraction: '10' });
    expect(results.solutions[0].instruction).toContain('any circle');
    expect(results.turnsExact).toEqual({ numerator: 10, denominator: 1 });
  });

  it('when 48 divisions are wanted, then the exact turns are 5/6 in lowest terms and the sector text counts spaces on the 18 circle', () => {
    const { results } = dividing.compute({ teeth: 48 });
    expect(results.turnsExact).toEqual({ numerator: 5, denominator: 6 });
    expect(results.solutions[0].instruction).toContain('15 spaces apart');
    expect(results.solutions[0].instruction).toContain('16 holes counting the one the pin starts in');
  });

  it('when 900 divisions or a 5-hole circle are asked for, then warnings say they are far outside bench practice', () => {
    expect(dividing.compute({ teeth: 900 }).warnings.join(' ')).toMatch(/division of 900 parts is far outside/);
    expect(dividing.compute({ teeth: 60, circles: [5, 24] }).warnings.join(' ')).toMatch(
      /hole circle of 5 holes is far outside bench practice/,
    );
    expect(dividing.compute({ teeth: 60 }).warnings).toEqual([]);
  });

  it('when the teeth are zero or fractional, then the input is rejected', () => {
    expect(() => dividing.compute({ teeth: 0 })).toThrow(ZodError);
    expect(() => dividing.compute({ teeth: 12.5 })).toThrow(ZodError);
  });

  it('when any teeth, ratio and circles are entered, then every solution divides exactly and the circles rise', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 1000 }),
        fc.integer({ min: 1, max: 120 }),
        fc.array(fc.integer({ min: 2, max: 200 }), { minLength: 1, maxLength: 30 }),
        (teeth, ratio, circles) => {
          const { results } = dividing.compute({ teeth, ratio, circles });
          const circlesUsed = results.solutions.map((s) => s.circle);
          expect(circlesUsed).toEqual([...circlesUsed].sort((a, b) => a - b));
          for (const s of results.solutions) {
            expect(circles).toContain(s.circle);
            expect((s.wholeTurns * s.circle + s.holes) * teeth).toBe(ratio * s.circle);
            expect(s.holes).toBeLessThan(s.circle);
            expect(s.sectorSpaces).toBe(s.holes);
          }
          const { numerator, denominator } = results.turnsExact;
          expect(numerator * teeth).toBe(ratio * denominator);
        },
      ),
      { numRuns: 300 },
    );
  });
});
