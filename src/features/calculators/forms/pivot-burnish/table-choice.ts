import { num } from '../../lib/draft';

/** The choice value for "my own figure"; any other choice is a row index of the cited table. */
export const TYPED = 'typed';

export function fromTable(choice: string | undefined, typed: string | undefined, values: readonly number[]) {
  if (choice === TYPED || choice === undefined) return num(typed);
  return values[Number(choice)] ?? NaN;
}

/** The row a saved figure came from, so a reopened result shows the same choice; otherwise it was typed in. */
export function rowOf(value: number, values: readonly number[]): string {
  const i = values.findIndex((v) => Math.abs(v - value) < 1e-9);
  return i < 0 ? TYPED : String(i);
}
