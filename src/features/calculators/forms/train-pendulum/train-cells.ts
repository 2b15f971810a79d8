/** A comma list from the draft split into its cells, blanks kept in place so that a row can be half typed. */
export const splitCells = (text: string | undefined) => (text ?? '').split(',').map((c) => c.trim());

export const joinCells = (cells: readonly (string | number)[]) => cells.join(', ');

const ARBOR = ['Centre', 'Third', 'Fourth', 'Fifth'];

/** Row i: the wheel on arbor i (from the centre) and the pinion it drives, the last being the escape pinion. */
export function rowNames(i: number, rows: number): { wheel: string; pinion: string } {
  return { wheel: `${ARBOR[i]} wheel`, pinion: i === rows - 1 ? 'Escape pinion' : `${ARBOR[i + 1]} pinion` };
}

/** Standard gravity as the form's starting text (CGPM 1901, from memory; TRADE.md §5). */
export const STANDARD_GRAVITY_TEXT = '9.80665';
