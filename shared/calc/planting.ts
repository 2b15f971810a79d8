import { z } from 'zod';
import { inBench, outsideBench, pushWarnings, type BenchRange } from './bench-range';
import type { Calculator, CalcStep } from './types';

interface Point {
  x: number;
  y: number;
}

const Name = z.string().trim().min(1).max(40);
const Coord = z.number().min(-10000).max(10000);
const Distance = z.number().positive().max(10000);
const pitch = { pitchRadiusMm: z.number().positive().max(1000).optional() };

export const FixedArbor = z.object({ name: Name, x: Coord, y: Coord, ...pitch });
export const TwoCircleArbor = z.object({
  name: Name,
  from: z.tuple([Name, Name]),
  distances: z.tuple([Distance, Distance]),
  /** Side of the directed line from the first arbor named to the second, y upwards. */
  side: z.enum(['left', 'right']),
  ...pitch,
});
export const PolarArbor = z.object({
  name: Name,
  from: Name,
  distance: Distance,
  /** Counter-clockwise from the +x datum line, y upwards. */
  angleDeg: z.number().min(-360).max(360),
  ...pitch,
});

export const PlantingInput = z
  .object({
    /** The datum point (a pillar or the centre arbor), in mm from the datum lines. */
    datum: z.object({ x: Coord, y: Coord }).default({ x: 0, y: 0 }),
    arbors: z
      .array(z.union([TwoCircleArbor, PolarArbor, FixedArbor]))
      .min(1)
      .max(50),
  })
  .refine((v) => 'x' in v.arbors[0], {
    message: 'The first arbor must be placed by its coordinates.',
    path: ['arbors', 0],
  });
export type PlantingInput = z.input<typeof PlantingInput>;

export interface PlantingResults {
  arbors: { name: string; x: number; y: number; fromDatum: Point; pitchRadiusMm?: number }[];
  depths: { from: string; to: string; distanceMm: number; angleDeg: number }[];
  problems: { arbor: string; reason: string }[];
}

type CircleIntersection =
  { ok: true; left: Point; right: Point; d: number; a: number; h: number } | { ok: false; reason: string };

const num = (n: number) => String(Number(n.toPrecision(6)));
// Below this share of the smaller distance, the crossing is so flat that small errors move the point a long way.
const FLAT_CROSSING = 0.01;
// Common practice, no source: clock plates and the centre distances planted on them.
const BENCH_CENTRE_DISTANCE_MM: BenchRange = { min: 2, max: 400 };
const BENCH_FROM_DATUM_MM: BenchRange = { min: -500, max: 500 };

/**
 * Where the circle of radius r0 about p0 meets the circle of radius r1 about p1. `left` and `right` are the
 * crossings on each side of the directed line p0 → p1, with y upwards.
 */
export function intersectCircles(p0: Point, r0: number, p1: Point, r1: number): CircleIntersection {
  if (![p0.x, p0.y, p1.x, p1.y, r0, r1].every(Number.isFinite) || r0 <= 0 || r1 <= 0) {
    return {
      ok: false,
      reason: 'The centres and distances must be finite numbers and the distances greater than zero.',
    };
  }
  const dx = p1.x - p0.x;
  const dy = p1.y - p0.y;
  const d = Math.hypot(dx, dy);
  const scale = Math.max(d, r0, r1);
  // Touching circles computed in floating point can land a hair either side; treat that hair as touching.
  const tolerance = 1e-12 * scale;
  if (d <= tolerance) return { ok: false, reason: 'The two centres coincide, so the distances cannot fix a point.' };
  if (d > r0 + r1 + tolerance) {
    return {
      ok: false,
      reason: `The centres are ${num(d)} mm apart, more than ${num(r0)} + ${num(r1)} = ${num(r0 + r1)} mm: the circles do not meet.`,
    };
  }
  if (d < Math.abs(r0 - r1) - tolerance) {
    return {
      ok: false,
      reason: `The centres are ${num(d)} mm apart, less than |${num(r0)} − ${num(r1)}| = ${num(Math.abs(r0 - r1))} mm: one circle lies inside the other.`,
    };
  }
  const a = (r0 * r0 - r1 * r1 + d * d) / (2 * d);
  const h = Math.sqrt(Math.max(0, r0 * r0 - a * a));
  const mx = p0.x + (a * dx) / d;
  const my = p0.y + (a * dy) / d;
  const ox = (-dy * h) / d;
  const oy = (dx * h) / d;
  return { ok: true, left: { x: mx + ox, y: my + oy }, right: { x: mx - ox, y: my - oy }, d, a, h };
}

const direction = (from: Point, to: Point) => {
  const deg = (Math.atan2(to.y - from.y, to.x - from.x) * 180) / Math.PI;
  return deg < 0 ? deg + 360 : deg;
};

export const planting: Calculator<typeof PlantingInput, PlantingResults> = {
  name: 'planting',
  title: 'Planting layout',
  summary:
    'Arbor positions from centre distances and the datum lines, with the drilling coordinates of every hole and each centre distance used.',
  inputSchema: PlantingInput,
  compute(raw) {
    const input = PlantingInput.parse(raw);
    const { datum } = input;
    const warnings: string[] = [];
    const steps: CalcStep[] = [];
    const placed = new Map<string, Point>();
    const leftOut = new Set<string>();
    const results: PlantingResults = { arbors: [], depths: [], problems: [] };

    const fail = (arbor: string, reason: string) => {
      results.problems.push({ arbor, reason });
      warnings.push(`${arbor}: ${reason}`);
    };
    // Returns the centre of a named earlier arbor, or the reason it cannot be used.
    const lookUp = (name: string): Point | string => {
      const p = placed.get(name);
      if (p) return p;
      if (leftOut.has(name)) return `it is measured from ${name}, which could not be placed, so it is left out.`;
      return `no arbor named "${name}" is listed before it, so it is left out.`;
    };
    const addDepth = (from: string, fromPoint: Point, to: string, toPoint: Point) => {
      const distanceMm = Math.hypot(toPoint.x - fromPoint.x, toPoint.y - fromPoint.y);
      const angleDeg = direction(fromPoint, toPoint);
      results.depths.push({ from, to, distanceMm, angleDeg });
      steps.push({
        label: `Centre distance ${from} → ${to}`,
        formula: `|${to} − ${from}|, direction from +x`,
        result: `${num(distanceMm)} mm at ${num(angleDeg)}°`,
      });
    };

    for (const arbor of input.arbors) {
      const { name } = arbor;
      if (placed.has(name) || leftOut.has(name)) {
        fail(name, `the name "${name}" is used twice; the second one is left out.`);
        continue;
      }
      let point: Point | null = null;
      if ('x' in arbor) {
        point = { x: arbor.x, y: arbor.y };
        steps.push({
          label: `${name} placed`,
          formula: 'given coordinates',
          result: `(${num(point.x)}, ${num(point.y)}) mm`,
        });
      } else if ('distance' in arbor) {
        const a = lookUp(arbor.from);
        if (typeof a === 'string') fail(name, a);
        else {
          const t = (arbor.angleDeg * Math.PI) / 180;
          point = { x: a.x + arbor.distance * Math.cos(t), y: a.y + arbor.distance * Math.sin(t) };
          steps.push({
            label: `${name} from ${arbor.from}`,
            formula: `${arbor.from} + ${num(arbor.distance)} mm × (cos ${num(arbor.angleDeg)}°, sin ${num(arbor.angleDeg)}°)`,
            result: `(${num(point.x)}, ${num(point.y)}) mm`,
          });
          addDepth(arbor.from, a, name, point);
        }
      } else {
        const [nameA, nameB] = arbor.from;
        const [rA, rB] = arbor.distances;
        const a = lookUp(nameA);
        const b = lookUp(nameB);
        if (typeof a === 'string') fail(name, a);
        else if (typeof b === 'string') fail(name, b);
        else {
          const cut = intersectCircles(a, rA, b, rB);
          if (!cut.ok)
            fail(
              name,
              `${cut.reason} It cannot be placed ${num(rA)} mm from ${nameA} and ${num(rB)} mm from ${nameB}.`,
            );
          else {
            point = cut[arbor.side];
            steps.push({
              label: `${name} from ${nameA} and ${nameB}`,
              formula: `d = ${num(cut.d)} mm; a = (r₀² − r₁² + d²)/(2d) = ${num(cut.a)} mm; h = √(r₀² − a²) = ${num(cut.h)} mm; ${arbor.side} of ${nameA} → ${nameB}`,
              result: `(${num(point.x)}, ${num(point.y)}) mm`,
            });
            if (cut.h < FLAT_CROSSING * Math.min(rA, rB)) {
              warnings.push(
                `${name} lies almost on the line from ${nameA} to ${nameB}; a small error in either distance moves it a long way. Check it with a depthing tool.`,
              );
            }
            addDepth(nameA, a, name, point);
            addDepth(nameB, b, name, point);
          }
        }
      }
      if (point === null) {
        leftOut.add(name);
        continue;
      }
      placed.set(name, point);
      results.arbors.push({
        name,
        x: point.x,
        y: point.y,
        fromDatum: { x: point.x - datum.x, y: point.y - datum.y },
        ...(arbor.pitchRadiusMm === undefined ? {} : { pitchRadiusMm: arbor.pitchRadiusMm }),
      });
    }
    const shortOrLong = results.depths.find((x) => !inBench(x.distanceMm, BENCH_CENTRE_DISTANCE_MM));
    const farOff = results.arbors.find(
      (x) => !inBench(x.fromDatum.x, BENCH_FROM_DATUM_MM) || !inBench(x.fromDatum.y, BENCH_FROM_DATUM_MM),
    );
    pushWarnings(
      warnings,
      shortOrLong === undefined
        ? null
        : outsideBench(
            `The centre distance ${shortOrLong.from} → ${shortOrLong.to}`,
            shortOrLong.distanceMm,
            BENCH_CENTRE_DISTANCE_MM,
            'mm',
          ),
      farOff === undefined
        ? null
        : `${farOff.name} lies ${num(Math.hypot(farOff.fromDatum.x, farOff.fromDatum.y))} mm from the datum, far outside any clock plate (about 500 mm; common practice, no source): check the coordinates.`,
    );
    return { results, warnings, steps };
  },
  assumptions: [
    'All positions are in mm on the plate, x to the right and y upwards, measured from the datum lines; drilling coordinates are also given from the datum point.',
    'An arbor placed from two others sits at the crossing of two circles; "left" and "right" are seen looking from the first arbor named towards the second.',
    'An arbor placed from one other lies at the given distance and angle, the angle counter-clockwise from the x datum line.',
    'Centre distances are entered as wanted, including any depthing allowance; the calculator does not add one.',
    'An arbor that cannot be placed, and every arbor measured from it, is left out rather than put somewhere wrong.',
    'The ranges behind the "far outside bench practice" warnings are common practice, no source.',
  ],
  sources: ['ANU "Intersection between two circles (3)" (vrarchitect.net/anu/cg/Maths/circleIntersect3.en.html)'],
  cautions: [
    "Put both plates' datum on the same reference (pillar holes) and drill pinned plates together.",
    'Verify depth with a depthing tool before drilling.',
    'Centre-drill first; a twist drill wanders.',
    'Clamp the work; never hand-hold plates on a drill press.',
  ],
};
