import Papa from 'papaparse';
import { MAX_INVITES_PER_REQUEST } from '@shared/schemas/invitation';
import { AppError } from '../../lib/app-error';

export interface RosterFileRow {
  line: number;
  name: string;
  email: string;
}

const unreadable = (detail: string) =>
  new AppError('NOT_A_CSV', `That file is not a readable CSV roster: ${detail} Nothing was imported.`, 415);

/** Header cells compared without case, spaces, dashes or underscores: "E-mail", "email", "Email address" all match. */
const HEADERS: Record<string, 'name' | 'email'> = {
  name: 'name',
  fullname: 'name',
  email: 'email',
  emailaddress: 'email',
};
const normalise = (h: string) => h.toLowerCase().replace(/[\s_-]/g, '');

/**
 * A roster is UTF-8 text (a byte-order mark is allowed) with a header row naming the name and e-mail columns,
 * separated by commas or semicolons. Anything else is refused whole, so that nothing half-read is ever imported.
 */
export function parseRosterCsv(bytes: Buffer): RosterFileRow[] {
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
  } catch {
    throw unreadable('it is not UTF-8 text.');
  }
  if (text.includes('\u0000')) throw unreadable('it contains binary data.');
  // The header row decides the separator: it is the one line whose content is known.
  const firstLine = text.split(/\r?\n/).find((l) => l.trim() !== '') ?? '';
  const delimiter = (firstLine.match(/;/g)?.length ?? 0) > (firstLine.match(/,/g)?.length ?? 0) ? ';' : ',';
  const parsed = Papa.parse<string[]>(text, { delimiter, skipEmptyLines: false });
  if (parsed.errors.some((e) => e.type === 'Quotes')) throw unreadable('a quoted value is not closed.');

  const lines = parsed.data.map((cells, i) => ({ line: i + 1, cells: cells.map((c) => c.trim()) }));
  const filled = lines.filter((l) => l.cells.some((c) => c !== ''));
  const header = filled.shift();
  const columns = header?.cells.map((h) => HEADERS[normalise(h)]);
  const nameAt = columns?.indexOf('name') ?? -1;
  const emailAt = columns?.indexOf('email') ?? -1;
  if (nameAt < 0 || emailAt < 0) {
    throw AppError.badRequest(
      'The first row of the file must name the columns "name" and "e-mail" (comma- or semicolon-separated).',
    );
  }
  if (filled.length === 0) throw AppError.badRequest('The file has a header row but no people under it.');
  if (filled.length > MAX_INVITES_PER_REQUEST) {
    throw AppError.badRequest(
      `A roster file can hold at most ${MAX_INVITES_PER_REQUEST} people; split it into smaller files.`,
    );
  }
  return filled.map((l) => ({ line: l.line, name: l.cells[nameAt] ?? '', email: l.cells[emailAt] ?? '' }));
}
