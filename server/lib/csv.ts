import Papa from 'papaparse';

/**
 * A spreadsheet runs a cell as a formula when it starts with = + - or @ (tab and carriage return lead some programs
 * to the same place). A cell is several lines when it holds line breaks, and some programs split it there, so the
 * check applies to the start of every line in the cell, not only the first.
 */
const FORMULA_START = /(?<=^|[\r\n])(?=[=+\-@\t\r])/g;

/** The cell with an apostrophe put before every line that a spreadsheet could take for a formula. */
export function neutraliseCell(value: string): string {
  return value.replace(FORMULA_START, "'");
}

export type CsvCell = string | number | null | undefined;

/**
 * Every CSV the product writes goes through here, so that no text an apprentice or anyone else typed can act inside
 * the spreadsheet that opens it. Numbers stay numbers; the byte-order mark lets spreadsheet programs read µm and other
 * non-ASCII text as UTF-8.
 */
export function toCsv(columns: string[], rows: CsvCell[][]): string {
  const guard = (cell: CsvCell) => (typeof cell === 'string' ? neutraliseCell(cell) : (cell ?? ''));
  return '\uFEFF' + Papa.unparse({ fields: columns.map(neutraliseCell), data: rows.map((row) => row.map(guard)) });
}
