/** Rows of text cells kept as JSON under one draft key, so a row editor survives the page address. */
export function readRows<K extends string>(text: string | undefined, keys: readonly K[]): Record<K, string>[] {
  let parsed: unknown;
  try {
    parsed = JSON.parse(text ?? '[]');
  } catch {
    return [];
  }
  if (!Array.isArray(parsed)) return [];
  return parsed
    .filter((row): row is Record<string, unknown> => row !== null && typeof row === 'object')
    .map(
      (row) =>
        Object.fromEntries(keys.map((k) => [k, row[k] === undefined ? '' : String(row[k])])) as Record<K, string>,
    );
}

export const writeRows = (rows: readonly object[]) => JSON.stringify(rows);

/** A cell as a number for the calculator: blank and unreadable text become NaN, which the schema reports. */
export const cellNumber = (cell: string) => (cell.trim() === '' ? NaN : Number(cell.trim().replace(',', '.')));
