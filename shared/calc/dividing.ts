import { z } from 'zod';
import { outsideBench, pushWarnings, type BenchRange } from './bench-range';
import type { Calculator, CalcStep } from './types';

interface PlateSet {
  key: string;
  label: string;
  circles: number[];
  source: string;
}

export const PLATE_SETS: PlateSet[] = [
  {
    key: 'brown-sharpe',
    label: 'Brown & Sharpe, three plates',
    circles: [15, 16, 17, 18, 19, 20, 21, 23, 27, 29, 31, 33, 37, 39, 41, 43, 47, 49],
    source:
      'Hole counts from memory; they reproduce the claim in Brown & Sharpe, A Practical Treatise on Milling and Milling Machines, that the plates "divide all numbers to 50 and all even numbers to 100, except 96".',
  },
  {
    key: 'cincinnati',
    label: '"Cincinnati standard" plate, two sides',
    circles: [24, 25, 28, 30, 34, 37, 38, 39, 41, 42, 43, 46, 47, 49, 51, 53, 54, 57, 58, 59, 62, 66],
    source: 'Hole counts from US Army Ordnance OD 16448, Fig. 11; the attribution to Cincinnati is from memory.',
  },
];

const Count = z.number().int().min(1).max(1000);
// Common practice, no source: the divisions clock wheels and pinions are cut with, and the largest hole circles made.
const BENCH_DIVISIONS: BenchRange = { min: 4, max: 400 };
const BENCH_CIRCLE: BenchRange = { min: 10, max: 200 };

export const DividingInput = z.object({
  teeth: Count,
  /** Worm ratio of the dividing head: crank turns for one turn of the spindle. */
  ratio: z.number().int().min(1).max(1000).default(40),
  circles: z
    .array(z.number().int().min(2).max(1000))
    .min(1)
    .max(100)
    .default(() => [...PLATE_SETS[0].circles]),
});
export type DividingInput = z.input<typeof DividingInput>;

interface IndexingSolution {
  wholeTurns: number;
  circle: number;
  /** Holes to move past the whole turns. */
  holes: number;
  /** Spaces between the sector arms; the arms take in one more hole than this, the hole the pin starts in. */
  sectorSpaces: number;
  /** Crank movement as text, e.g. "6 12/18". */
  fraction: string;
  /** The movement in words, for the bench. */
  instruction: string;
}

export interface DividingResults {
  solutions: IndexingSolution[];
  turnsExact: { numerator: number; denominator: number };
}

const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));
const turnsWord = (n: number) => `${n} whole turn${n === 1 ? '' : 's'}`;

function solutionFor(ratio: number, teeth: number, circle: number): IndexingSolution | null {
  // Holes moved per division on this circle: ratio·circle/teeth, which must be whole.
  if ((ratio * circle) % teeth !== 0) return null;
  const total = (ratio * circle) / teeth;
  const wholeTurns = Math.floor(total / circle);
  const holes = total - wholeTurns * circle;
  const fraction =
    holes === 0 ? `${wholeTurns}` : wholeTurns === 0 ? `${holes}/${circle}` : `${wholeTurns} ${holes}/${circle}`;
  const parts = [
    ...(wholeTurns > 0 ? [turnsWord(wholeTurns)] : []),
    ...(holes > 0
      ? [
          `${holes} hole${holes === 1 ? '' : 's'} on the ${circle} circle (set the sector arms ${holes} space${holes === 1 ? '' : 's'} apart, so they take in ${holes + 1} holes counting the one the pin starts in)`,
        ]
      : []),
  ];
  return { wholeTurns, circle, holes, sectorSpaces: holes, fraction, instruction: parts.join(', then ') };
}

export const dividing: Calculator<typeof DividingInput, DividingResults> = {
  name: 'dividing',
  title: 'Dividing head',
  summary:
    'Which hole circle to use and how many holes to move for any number of divisions on a worm-driven dividing head.',
  inputSchema: DividingInput,
  compute(raw) {
    const input = DividingInput.parse(raw);
    const { teeth, ratio } = input;
    const circles = [...new Set(input.circles)].sort((a, b) => a - b);
    const warnings: string[] = [];
    const steps: CalcStep[] = [];

    const g = gcd(ratio, teeth);
    const turnsExact = { numerator: ratio / g, denominator: teeth / g };
    steps.push({
      label: 'Crank turns per division',
      formula: `${ratio} / ${teeth}`,
      result: `${turnsExact.numerator}/${turnsExact.denominator} turn${turnsExact.denominator === 1 ? 's' : ''}`,
    });

    let solutions: IndexingSolution[];
    if (turnsExact.denominator === 1) {
      // Whole turns bring the pin back to the hole it left, on any circle; one answer says it all.
      const only = solutionFor(ratio, teeth, circles[0]) as IndexingSolution;
      solutions = [{ ...only, instruction: `${turnsWord(only.wholeTurns)}, on any circle` }];
      steps.push({ label: 'Hole circle', formula: 'the division is a whole number of turns', result: 'any circle' });
    } else {
      solutions = circles.map((c) => solutionFor(ratio, teeth, c)).filter((s): s is IndexingSolution => s !== null);
      steps.push({
        label: 'Usable circles',
        formula: `hole count a multiple of ${turnsExact.denominator}`,
        result: solutions.length > 0 ? solutions.map((s) => `${s.circle}`).join(', ') : 'none',
      });
    }

    if (solutions.length === 0) {
      warnings.push(
        `Dividing into ${teeth} is not possible with these circles: it needs a circle whose hole count is a multiple of ${turnsExact.denominator}. Use another plate, or differential indexing.`,
      );
    }
    const oddCircle = circles.find((c) => c < BENCH_CIRCLE.min || c > BENCH_CIRCLE.max);
    pushWarnings(
      warnings,
      outsideBench('A division', teeth, BENCH_DIVISIONS, 'parts'),
      oddCircle === undefined ? null : outsideBench('A hole circle', oddCircle, BENCH_CIRCLE, 'holes'),
    );
    if (ratio !== 40) {
      warnings.push(`Most dividing heads have a 40 : 1 worm; check that yours really is ${ratio} : 1.`);
    }
    return { results: { solutions, turnsExact }, warnings, steps };
  },
  assumptions: [
    'Simple indexing: the crank turns ratio/teeth times per division, made up of whole turns and a number of holes on one circle.',
    'A circle works when its hole count times the ratio, divided by the number of divisions, is a whole number; the smallest usable circle is listed first.',
    'Sector arms are counted in spaces: the number of holes to move. Set across the arms, that takes in one more hole than the count, because the hole the pin starts in is not a move.',
    'The ranges behind the "far outside bench practice" warnings are common practice, no source.',
    'The Brown & Sharpe hole counts are from memory; they reproduce the divisions that Brown & Sharpe claims for its plates. The Cincinnati attribution of the two-sided plate is from memory; its hole counts are from OD 16448.',
  ],
  sources: [
    "Machinery's Handbook (1916), indexing for angles",
    'US Army Ordnance OD 16448, Fig. 11',
    'Brown & Sharpe, A Practical Treatise on Milling and Milling Machines',
  ],
  cautions: [
    'Take up backlash by always turning the crank in one direction.',
    'Use the sector arms and count spaces, not holes.',
    'Lock the spindle before cutting.',
    'Cutter guard, eye protection, and no brushing chips while the cutter runs.',
  ],
};
