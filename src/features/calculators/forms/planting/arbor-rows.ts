import { FixedArbor, PolarArbor, TwoCircleArbor, type PlantingInput } from '@shared/calc/planting';
import type { Draft, FieldIssues } from '../../lib/draft';
import { collectIssues } from '../../lib/draft';
import { cellNumber, readRows } from '../row-cells/json-rows';

const KEYS = [
  'name',
  'how',
  'x',
  'y',
  'fromA',
  'fromB',
  'distA',
  'distB',
  'side',
  'from',
  'distance',
  'angle',
  'pitch',
] as const;
export type ArborRow = Record<(typeof KEYS)[number], string>;
/** How an arbor is placed: by coordinates, from two arbors by two centre distances, or from one by distance and angle. */
export type PlacedBy = 'xy' | 'two' | 'polar';

export const blankArbor = (how: PlacedBy, name = ''): ArborRow => ({
  name,
  how,
  x: '',
  y: '',
  fromA: '',
  fromB: '',
  distA: '',
  distB: '',
  side: 'left',
  from: '',
  distance: '',
  angle: '',
  pitch: '',
});

/**
 * A small going train as the starting layout: the TRADE.md §8 check (an arbor 25 mm from one and 30 mm from another
 * 40 mm away) moved onto a plate. Pitch radii 32 + 8 and 25 + 5 make up those centre distances.
 */
export const EXAMPLE_ARBORS: ArborRow[] = [
  { ...blankArbor('xy', 'Centre'), x: '40', y: '40', pitch: '32' },
  { ...blankArbor('polar', 'Third'), from: 'Centre', distance: '40', angle: '0', pitch: '25' },
  {
    ...blankArbor('two', 'Escape'),
    fromA: 'Centre',
    fromB: 'Third',
    distA: '25',
    distB: '30',
    side: 'left',
    pitch: '5',
  },
];

export const arborRows = (d: Draft) => readRows(d.arbors, KEYS);

const optional = (cell: string) => (cell.trim() === '' ? undefined : cellNumber(cell));

type ArborInput = PlantingInput['arbors'][number];

/** One row as the calculator takes it; the first arbor is always placed by its coordinates. */
export function arborInput(row: ArborRow, index: number): ArborInput {
  const base = { name: row.name, pitchRadiusMm: optional(row.pitch) };
  const how = index === 0 ? 'xy' : row.how;
  if (how === 'two') {
    return {
      ...base,
      from: [row.fromA, row.fromB],
      distances: [cellNumber(row.distA), cellNumber(row.distB)],
      side: row.side === 'right' ? 'right' : 'left',
    };
  }
  if (how === 'polar')
    return { ...base, from: row.from, distance: cellNumber(row.distance), angleDeg: cellNumber(row.angle) };
  return { ...base, x: cellNumber(row.x), y: cellNumber(row.y) };
}

/**
 * The schema's complaints about one row, keyed by the row's own fields ("distances.0"). The calculator's list is
 * a union of three shapes, whose issues do not say which field was wrong, so each row is checked by its own shape.
 */
export function rowIssues(row: ArborRow, index: number): FieldIssues {
  const input = arborInput(row, index);
  const schema = 'x' in input ? FixedArbor : 'distance' in input ? PolarArbor : TwoCircleArbor;
  const parsed = schema.safeParse(input);
  return parsed.success ? {} : collectIssues(parsed.error);
}
