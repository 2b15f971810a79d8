import { z } from 'zod';
import type { Calculator, CalcStep } from './types';

const STANDARD_GRAVITY = 9.80665;
const MAX_PAIRS = 4;
// The search ranges: wheels and pinions a clockmaker can cut, escape wheels of the usual counts.
const WHEEL = { min: 48, max: 128 };
const PINION = { min: 6, max: 16 };
const ESCAPE = { min: 20, max: 45 };
// Common practice, no source: theoretical pendulum lengths seen in domestic clocks.
const USUAL_LENGTH_MM = { min: 50, max: 1600 };
// From memory: gravity at the Earth's surface lies within about 9.78–9.83 m/s².
const USUAL_GRAVITY = { min: 9.77, max: 9.84 };
const PERIOD_MISMATCH = 0.01;
// A train more than this share off the beat wanted keeps bad time with the right pendulum: 0.1 % is 86 s a day.
const BEAT_MISMATCH = 0.001;
const SECONDS_PER_DAY = 86_400;

const Teeth = z.number().int().min(1).max(1000);
const Length = z.number().positive().max(20000);

const RodPendulum = z.object({ kind: z.literal('rod'), rodLengthMm: Length });
const RodAndBobPendulum = z
  .object({
    kind: z.literal('rod-and-bob'),
    rodLengthMm: Length,
    rodMassG: z.number().min(0).max(1e6),
    bobMassG: z.number().positive().max(1e6),
    /** Distance from the suspension point to the bob's centre. */
    bobCentreMm: Length,
    /** Given: the bob is a uniform disc swinging in its own plane. Left out: a point mass. */
    bobRadiusMm: z.number().min(0).max(1000).optional(),
  })
  .refine((p) => (p.bobRadiusMm ?? 0) < p.bobCentreMm, {
    message: 'The bob radius must be smaller than the distance from the suspension to the bob centre.',
    path: ['bobRadiusMm'],
  });

export const TrainPendulumInput = z
  .object({
    /** From the centre wheel to the wheel that drives the escape pinion. */
    wheelTeeth: z.array(Teeth).min(1).max(MAX_PAIRS),
    /** From the pinion the centre wheel drives to the escape pinion. */
    pinionLeaves: z.array(Teeth).min(1).max(MAX_PAIRS),
    escapeTeeth: Teeth,
    gravity: z.number().min(9).max(10.5).default(STANDARD_GRAVITY),
    targetBeatsPerHour: z.number().int().min(100).max(200000).optional(),
    pendulum: z.discriminatedUnion('kind', [RodPendulum, RodAndBobPendulum]).optional(),
  })
  .refine((v) => v.wheelTeeth.length === v.pinionLeaves.length, {
    message: 'Give one pinion for every wheel.',
    path: ['pinionLeaves'],
  });
export type TrainPendulumInput = z.input<typeof TrainPendulumInput>;

interface TrainSuggestion {
  wheelTeeth: number[];
  pinionLeaves: number[];
  escapeTeeth: number;
  beatsPerHour: number;
}

export interface TrainPendulumResults {
  beatsPerHour: number;
  periodS: number;
  pendulumLengthMm: number;
  equivalentLengthMm?: number;
  physicalPeriodS?: number;
  suggestions?: TrainSuggestion[];
}

const num = (n: number) => String(Number(n.toPrecision(6)));
const product = (xs: number[]) => xs.reduce((p, x) => p * x, 1);
const sum = (xs: number[]) => xs.reduce((a, x) => a + x, 0);

/** Theoretical (simple) pendulum length in mm for a beat rate: L = gT²/(4π²) with T = 7200/BPH. */
export function lengthForBeats(bph: number, g: number = STANDARD_GRAVITY): number {
  const t = 7200 / bph;
  return ((g * t * t) / (4 * Math.PI * Math.PI)) * 1000;
}

/** Beats per hour of a simple pendulum of the given length in mm. */
export function beatsForLength(lengthMm: number, g: number = STANDARD_GRAVITY): number {
  return 7200 / (2 * Math.PI * Math.sqrt(lengthMm / 1000 / g));
}

/** Non-increasing lists of `k` pinion counts, so each set of pinions is tried once. */
function pinionSets(k: number, max: number = PINION.max): number[][] {
  if (k === 0) return [[]];
  const sets: number[][] = [];
  for (let p = max; p >= PINION.min; p--) for (const rest of pinionSets(k - 1, p)) sets.push([p, ...rest]);
  return sets;
}

/** Calls `visit` with every non-increasing list of `k` wheel counts in range whose product is `total`. */
function eachWheelSet(total: number, k: number, max: number, chosen: number[], visit: (w: number[]) => void) {
  if (k === 1) {
    if (total >= WHEEL.min && total <= max) visit([...chosen, total]);
    return;
  }
  for (let w = max; w >= WHEEL.min; w--) {
    if (total % w !== 0) continue;
    const rest = total / w;
    if (rest < WHEEL.min ** (k - 1) || rest > w ** (k - 1)) continue;
    chosen.push(w);
    eachWheelSet(rest, k - 1, w, chosen, visit);
    chosen.pop();
  }
}

function ratioSpread(s: TrainSuggestion): number {
  const ratios = s.wheelTeeth.map((w, i) => w / s.pinionLeaves[i]);
  return Math.max(...ratios) / Math.min(...ratios);
}

interface Ranked {
  suggestion: TrainSuggestion;
  smallPinions: number;
  count: number;
  spread: number;
}

const compareLists = (a: number[], b: number[]) => a.reduce((c, x, i) => c || x - b[i], 0);

// The last keys only make the order repeatable when two trains tie on everything that matters.
const compareRanked = (a: Ranked, b: Ranked) =>
  a.smallPinions - b.smallPinions ||
  a.count - b.count ||
  a.spread - b.spread ||
  a.suggestion.escapeTeeth - b.suggestion.escapeTeeth ||
  compareLists(a.suggestion.wheelTeeth, b.suggestion.wheelTeeth) ||
  compareLists(a.suggestion.pinionLeaves, b.suggestion.pinionLeaves);

/**
 * Trains of `pairs` wheel/pinion pairs and an escape wheel that give exactly `target` beats per hour, best first:
 * fewest pinions under 8 leaves, then fewest teeth and leaves in all (less cutting), then the most even ratios.
 */
export function searchTrains(target: number, pairs: number, limit: number): TrainSuggestion[] {
  const keep = Math.floor(limit);
  const valid = Number.isInteger(target) && Number.isInteger(pairs) && target > 0 && pairs >= 1 && pairs <= MAX_PAIRS;
  if (!valid || !(keep >= 1)) return [];
  // Each pinion set and escape wheel fixes the product the wheels must reach: BPH = 2·e·ΠW/ΠP, so
  // ΠW = target·ΠP/(2e), a whole number within the wheel range.
  const starts = pinionSets(pairs).flatMap((leaves) => {
    const smallPinions = leaves.filter((p) => p < 8).length;
    const needed = target * product(leaves);
    const base = sum(leaves);
    const found = [];
    for (let e = ESCAPE.min; e <= ESCAPE.max; e++) {
      if (needed % (2 * e) !== 0) continue;
      const wheelProduct = needed / (2 * e);
      if (wheelProduct < WHEEL.min ** pairs || wheelProduct > WHEEL.max ** pairs) continue;
      // Wheels of a fixed product add up to at least pairs·ⁿ√product (AM–GM), which bounds the count from below.
      const least = base + e + pairs * Math.max(WHEEL.min, wheelProduct ** (1 / pairs));
      found.push({ leaves, e, smallPinions, wheelProduct, base: base + e, least });
    }
    return found;
  });
  // Most promising first, so the search can stop once nothing left could beat the worst train kept.
  starts.sort((a, b) => a.smallPinions - b.smallPinions || a.least - b.least);

  const best: Ranked[] = [];
  for (const { leaves, e, smallPinions, wheelProduct, base, least } of starts) {
    const worst = best.length === keep ? best[keep - 1] : undefined;
    if (worst && (smallPinions > worst.smallPinions || least > worst.count + 1e-9)) break;
    eachWheelSet(wheelProduct, pairs, WHEEL.max, [], (wheels) => {
      const suggestion = { wheelTeeth: wheels, pinionLeaves: leaves, escapeTeeth: e, beatsPerHour: target };
      const entry = { suggestion, smallPinions, count: base + sum(wheels), spread: ratioSpread(suggestion) };
      if (best.length === keep && compareRanked(entry, best[keep - 1]) >= 0) return;
      let lo = 0;
      for (let hi = best.length; lo < hi;) {
        const mid = (lo + hi) >> 1;
        if (compareRanked(best[mid], entry) <= 0) lo = mid + 1;
        else hi = mid;
      }
      best.splice(lo, 0, entry);
      if (best.length > keep) best.pop();
    });
  }
  return best.map((b) => b.suggestion);
}

type Pendulum = NonNullable<z.output<typeof TrainPendulumInput>['pendulum']>;

/** Length of the simple pendulum that swings like the given one: L_eq = I/(m·d) about the suspension. */
function equivalentLength(p: Pendulum): { lengthMm: number; step: CalcStep } {
  if (p.kind === 'rod') {
    const lengthMm = (2 * p.rodLengthMm) / 3;
    return {
      lengthMm,
      step: {
        label: 'Equivalent length, uniform rod',
        formula: `2L/3 = 2 × ${num(p.rodLengthMm)} mm / 3`,
        result: `${num(lengthMm)} mm`,
      },
    };
  }
  const { rodLengthMm: l, rodMassG: mr, bobMassG: mb, bobCentreMm: c } = p;
  const rho = p.bobRadiusMm ?? 0;
  const inertia = (mr * l * l) / 3 + mb * (c * c + (rho * rho) / 2);
  const moment = (mr * l) / 2 + mb * c;
  const lengthMm = inertia / moment;
  return {
    lengthMm,
    step: {
      label: 'Equivalent length, rod and bob',
      formula: `I/(m·d) = [m_r·L²/3 + m_b(c² + ρ²/2)] / (m_r·L/2 + m_b·c) with L ${num(l)} mm, m_r ${num(mr)} g, m_b ${num(mb)} g, c ${num(c)} mm, ρ ${num(rho)} mm`,
      result: `${num(lengthMm)} mm`,
    },
  };
}

export const trainPendulum: Calculator<typeof TrainPendulumInput, TrainPendulumResults> = {
  name: 'train-pendulum',
  title: 'Train and pendulum',
  summary:
    'Beats per hour from the tooth counts, the pendulum length for that beat, the equivalent length of a real rod-and-bob pendulum, and trains that give a chosen beat.',
  inputSchema: TrainPendulumInput,
  compute(raw) {
    const input = TrainPendulumInput.parse(raw);
    const { wheelTeeth, pinionLeaves, escapeTeeth, gravity: g } = input;
    const warnings: string[] = [];
    const steps: CalcStep[] = [];

    const beatsPerHour = (2 * escapeTeeth * product(wheelTeeth)) / product(pinionLeaves);
    const periodS = 7200 / beatsPerHour;
    const pendulumLengthMm = lengthForBeats(beatsPerHour, g);
    steps.push(
      {
        label: 'Beats per hour',
        formula: `2 × ${escapeTeeth} × (${wheelTeeth.join(' × ')}) / (${pinionLeaves.join(' × ')})`,
        result: `${num(beatsPerHour)} beats/h`,
      },
      { label: 'Full period', formula: `T = 7200 / ${num(beatsPerHour)}`, result: `${num(periodS)} s` },
      {
        label: 'Theoretical pendulum length',
        formula: `L = gT²/(4π²) = ${num(g)} m/s² × (${num(periodS)} s)² / (4π²)`,
        result: `${num(pendulumLengthMm)} mm`,
      },
    );
    const results: TrainPendulumResults = { beatsPerHour, periodS, pendulumLengthMm };

    if (pendulumLengthMm < USUAL_LENGTH_MM.min || pendulumLengthMm > USUAL_LENGTH_MM.max) {
      warnings.push(
        `A pendulum of ${num(pendulumLengthMm)} mm is outside the usual range for clocks (about ${USUAL_LENGTH_MM.min}–${USUAL_LENGTH_MM.max} mm); check the tooth counts.`,
      );
    }
    if (g < USUAL_GRAVITY.min || g > USUAL_GRAVITY.max) {
      warnings.push(
        `Gravity of ${num(g)} m/s² is outside what is found at the Earth's surface (about 9.78–9.83 m/s²).`,
      );
    }
    if (pinionLeaves.some((p) => p < PINION.min)) {
      warnings.push(`A pinion of fewer than ${PINION.min} leaves is unusual in a clock train and runs roughly.`);
    }

    if (input.pendulum) {
      const { lengthMm, step } = equivalentLength(input.pendulum);
      const physicalPeriodS = 2 * Math.PI * Math.sqrt(lengthMm / 1000 / g);
      results.equivalentLengthMm = lengthMm;
      results.physicalPeriodS = physicalPeriodS;
      steps.push(step, {
        label: 'Period of this pendulum',
        formula: `T = 2π√(L_eq/g) = 2π√(${num(lengthMm / 1000)} m / ${num(g)} m/s²)`,
        result: `${num(physicalPeriodS)} s`,
      });
      const off = (physicalPeriodS - periodS) / periodS;
      if (Math.abs(off) > PERIOD_MISMATCH) {
        warnings.push(
          `This pendulum swings with a period of ${num(physicalPeriodS)} s but the train needs ${num(periodS)} s (${num(off * 100)} % off); move the bob or change the train.`,
        );
      }
    }

    if (input.targetBeatsPerHour !== undefined) {
      const target = input.targetBeatsPerHour;
      const off = (beatsPerHour - target) / target;
      if (Math.abs(off) > BEAT_MISMATCH) {
        // A pendulum beating `target` drives the centre wheel round in beatsPerHour/target hours.
        const perDay = SECONDS_PER_DAY * (target / beatsPerHour - 1);
        warnings.push(
          `This train gives ${num(beatsPerHour)} beats an hour, ${num(Math.abs(off) * 100)} % ${off > 0 ? 'over' : 'under'} the ${target} wanted: with a pendulum beating ${target} the hands would ${perDay < 0 ? 'lose' : 'gain'} ${num(Math.abs(perDay))} s a day. Change the counts.`,
        );
      }
      const suggestions = searchTrains(target, wheelTeeth.length, 10);
      results.suggestions = suggestions;
      steps.push({
        label: 'Trains for the target beat',
        formula: `2·e·ΠW/ΠP = ${target} with wheels ${WHEEL.min}–${WHEEL.max}, pinions ${PINION.min}–${PINION.max}, escape ${ESCAPE.min}–${ESCAPE.max}`,
        result: `${suggestions.length} shown`,
      });
      if (suggestions.length === 0) {
        warnings.push(
          `No train of ${wheelTeeth.length} wheel and pinion pair(s) with wheels of ${WHEEL.min}–${WHEEL.max} teeth, pinions of ${PINION.min}–${PINION.max} leaves and an escape wheel of ${ESCAPE.min}–${ESCAPE.max} teeth gives exactly ${target} beats per hour.`,
        );
      }
    }
    return { results, warnings, steps };
  },
  assumptions: [
    'Tooth counts run from the centre wheel (one turn an hour) to the escape pinion; each escape tooth gives two beats.',
    'The theoretical length is that of a simple pendulum swinging through a small arc; circular error is ignored.',
    'A uniform rod pivoted at its top end has an equivalent length of 2L/3.',
    'A rod and bob: the rod is uniform and hangs from the suspension point; the bob is a point mass, or a uniform disc swinging in its own plane when its radius is given. The suspension spring is ignored.',
    'Standard gravity 9.80665 m/s² is the default; enter local gravity for more accuracy.',
    'Suggested trains use wheels of 48–128 teeth, pinions of 6–16 leaves and escape wheels of 20–45 teeth, and are ranked by fewest pinions under 8 leaves, then fewest teeth in all, then the most even ratios. They do not check whether the escape arbor can carry a seconds hand.',
    'The usual pendulum range used for warnings (about 50–1600 mm) is common practice, not a published figure.',
  ],
  sources: [
    'Wikipedia "Seconds pendulum"',
    'HyperPhysics "Rod pendulum" (hyperphysics.phy-astr.gsu.edu/hbase/penrod.html)',
    'Standard gravity g_n = 9.80665 m/s² exactly (CGPM 1901, from memory)',
  ],
  cautions: [
    'A heavy bob on a suspension spring can drop, so check the suspension before swinging.',
    'Mercury-compensated pendulums: do not open jars; spilled mercury is a toxic hazard.',
    'Effective length is to the centre of oscillation, not the bob centre.',
  ],
};
