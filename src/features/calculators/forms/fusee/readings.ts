import type { Draft } from '../../lib/draft';
import { cellNumber, readRows } from '../row-cells/json-rows';

const KEYS = ['massG', 'distanceMm'] as const;
export type ReadingRow = Record<(typeof KEYS)[number], string>;

/**
 * Invented practice readings for the example spring (a 200 g weight on the rod), not measured from any clock. The
 * form labels them as an example for as long as any of them is still in the table.
 */
export const EXAMPLE_READINGS: ReadingRow[] = [55, 63, 70, 76, 81].map((x) => ({
  massG: '200',
  distanceMm: String(x),
}));

export const EMPTY_ROWS = 5;
export const emptyRows = (n: number): ReadingRow[] => Array.from({ length: n }, () => ({ massG: '', distanceMm: '' }));

export const readingRows = (d: Draft) => readRows(d.readings, KEYS);

export const isBlankRow = (r: ReadingRow) => r.massG.trim() === '' && r.distanceMm.trim() === '';

export const showsExample = (rows: ReadingRow[]) =>
  rows.some((r, i) => EXAMPLE_READINGS[i]?.massG === r.massG && EXAMPLE_READINGS[i]?.distanceMm === r.distanceMm);

/** Blank rows are spare lines, not readings; the rest go to the calculator in table order. */
export const readingsInput = (rows: ReadingRow[]) =>
  rows.filter((r) => !isBlankRow(r)).map((r) => ({ massG: cellNumber(r.massG), distanceMm: cellNumber(r.distanceMm) }));
