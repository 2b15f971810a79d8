import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { LinkedRecord, LinkOptions } from '@shared/schemas/submission';
import { AppError } from '../../lib/app-error';

/**
 * Bench-log entries and saved calculations belong to other features. A submission stores only their ids; their
 * tables are read here by name, and only when the table and the columns used exist, so submissions work with or
 * without those features installed.
 */
interface Source {
  table: string;
  ownerColumns: string[];
  labelColumns: string[];
  dateColumn?: string;
}
const SOURCES = {
  logEntries: {
    table: 'log_entries',
    ownerColumns: ['apprenticeId', 'userId'],
    labelColumns: ['title', 'name'],
    dateColumn: 'date',
  },
  calculations: {
    table: 'calculations',
    ownerColumns: ['userId', 'apprenticeId'],
    labelColumns: ['title', 'calculator'],
  },
} satisfies Record<string, Source>;
type Kind = keyof typeof SOURCES;

interface Shape {
  owner: string;
  label: string;
  date: string | null;
}

async function shapeOf(sequelize: Sequelize, source: Source, transaction?: Transaction): Promise<Shape | null> {
  const cols = await sequelize.query<{ name: string }>('SELECT name FROM pragma_table_info(:table)', {
    replacements: { table: source.table },
    type: QueryTypes.SELECT,
    transaction,
  });
  const names = new Set(cols.map((c) => c.name));
  const owner = source.ownerColumns.find((c) => names.has(c));
  const label = source.labelColumns.find((c) => names.has(c));
  if (!names.has('id') || !owner || !label) return null;
  return { owner, label, date: source.dateColumn && names.has(source.dateColumn) ? source.dateColumn : null };
}

const labelSql = (s: Shape) => (s.date ? `"${s.date}" || ' · ' || "${s.label}"` : `"${s.label}"`);

/** Throws 400 naming the field unless every id is a record of this apprentice. */
export async function assertOwnLinks(
  sequelize: Sequelize,
  ownerId: number,
  links: { logEntryIds: number[]; calculationIds: number[] },
  transaction?: Transaction,
) {
  const checks: [Kind, number[], string][] = [
    ['logEntries', links.logEntryIds, 'logEntryIds'],
    ['calculations', links.calculationIds, 'calculationIds'],
  ];
  for (const [kind, ids, field] of checks) {
    if (ids.length === 0) continue;
    const source = SOURCES[kind];
    const shape = await shapeOf(sequelize, source, transaction);
    const found = shape
      ? await sequelize.query<{ id: number }>(
          `SELECT id FROM "${source.table}" WHERE id IN (:ids) AND "${shape.owner}" = :ownerId`,
          {
            replacements: { ids, ownerId },
            type: QueryTypes.SELECT,
            transaction,
          },
        )
      : [];
    if (found.length !== new Set(ids).size) {
      throw AppError.badRequest('Some linked records could not be found among yours.', {
        [field]: ['Link only your own records.'],
      });
    }
  }
}

/** Labels for stored ids, in the stored order; a record since deleted keeps its id with a null label. */
export async function resolveLinks(sequelize: Sequelize, kind: Kind, ids: number[]): Promise<LinkedRecord[]> {
  if (ids.length === 0) return [];
  const source = SOURCES[kind];
  const shape = await shapeOf(sequelize, source);
  if (!shape) return ids.map((id) => ({ id, label: null }));
  const rows = await sequelize.query<{ id: number; label: string }>(
    `SELECT id, ${labelSql(shape)} AS label FROM "${source.table}" WHERE id IN (:ids)`,
    { replacements: { ids }, type: QueryTypes.SELECT },
  );
  const byId = new Map(rows.map((r) => [Number(r.id), String(r.label)]));
  return ids.map((id) => ({ id, label: byId.get(id) ?? null }));
}

/** The apprentice's most recent records of each kind, for the picker on the submission form. */
export async function linkOptions(sequelize: Sequelize, ownerId: number): Promise<LinkOptions> {
  const recent = async (kind: Kind): Promise<LinkedRecord[]> => {
    const source = SOURCES[kind];
    const shape = await shapeOf(sequelize, source);
    if (!shape) return [];
    const order = shape.date ? `"${shape.date}" DESC, id DESC` : 'id DESC';
    const rows = await sequelize.query<{ id: number; label: string }>(
      `SELECT id, ${labelSql(shape)} AS label FROM "${source.table}" WHERE "${shape.owner}" = :ownerId ORDER BY ${order} LIMIT 60`,
      { replacements: { ownerId }, type: QueryTypes.SELECT },
    );
    return rows.map((r) => ({ id: Number(r.id), label: String(r.label) }));
  };
  return { logEntries: await recent('logEntries'), calculations: await recent('calculations') };
}
