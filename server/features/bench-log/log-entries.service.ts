import { Op, literal, type Sequelize, type Transaction, type WhereOptions } from 'sequelize';
import {
  formatMinutes,
  LOG_PAGE_SIZE,
  MAX_DAY_MINUTES,
  type LogEntryCreateInput,
  type LogEntryDTO,
  type LogEntryFilters,
  type LogEntryList,
  type LogEntryListQuery,
  type LogEntryPatch,
} from '@shared/schemas/log-entry';
import type { UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { User } from '../auth/user.model';
import { assertOwnCalculations } from '../calculations/calculations.service';
import { assertCanSeeApprentice, canSeeLogEntry, logEntryReachSql } from '../classes/access';
import { Lesson } from '../courses/course.model';
import { assertOwnUploads } from '../uploads/uploads.service';
import { toEntryDTOs } from './log-entry.mapper';
import { LogComment, LogEntry, LogEntryCalculation, LogEntryUpload, LogGrade, LogMeasurement } from './log-entry.model';

const WHAT = 'That log entry';

/**
 * The entry when the viewer may read it (access.ts decides), else null. Access is asked outside any transaction:
 * access.ts does not take one, and the pool's single connection would wait on itself.
 */
export async function readableEntry(viewer: UserDTO, id: number): Promise<LogEntry | null> {
  const row = id > 0 ? await LogEntry.findByPk(id) : null;
  if (!row) return null;
  if (row.apprenticeId === viewer.id || (await canSeeLogEntry(viewer, row))) return row;
  return null;
}

/** Readers who are not the owner learn that they may not change it; anyone else that it does not exist. */
async function ownEntry(viewer: UserDTO, id: number): Promise<LogEntry> {
  const row = await readableEntry(viewer, id);
  if (!row) throw AppError.notFound(WHAT);
  if (row.apprenticeId !== viewer.id) throw AppError.forbidden('Only the apprentice who keeps this log can change it.');
  return row;
}

async function assertDayTotal(
  apprenticeId: number,
  date: string,
  minutes: number,
  exceptId: number | null,
  transaction: Transaction,
) {
  const where: WhereOptions<LogEntry> = { apprenticeId, date, ...(exceptId ? { id: { [Op.ne]: exceptId } } : {}) };
  const already = Number(await LogEntry.sum('minutes', { where, transaction })) || 0;
  if (already + minutes > MAX_DAY_MINUTES) {
    throw AppError.badRequest('Some fields need attention.', {
      minutes: [
        `${date} already holds ${formatMinutes(already)}; with this entry it would be ${formatMinutes(already + minutes)}, ` +
          'and one date holds at most 24 h.',
      ],
    });
  }
}

async function assertLessonOpen(lessonId: number, transaction: Transaction) {
  const lesson = await Lesson.findByPk(lessonId, { attributes: ['id', 'retiredAt'], transaction });
  if (!lesson || lesson.retiredAt) {
    throw AppError.badRequest('Some fields need attention.', { lessonId: ['There is no such lesson.'] });
  }
}

/** Replaces each list that the input carries; photos and results must be the apprentice's own. */
async function writeLists(entryId: number, apprenticeId: number, input: LogEntryPatch, transaction: Transaction) {
  const where = { entryId };
  if (input.measurements) {
    await LogMeasurement.destroy({ where, transaction });
    await LogMeasurement.bulkCreate(
      input.measurements.map((m, i) => ({ entryId, position: i + 1, ...m })),
      { transaction },
    );
  }
  if (input.uploadIds) {
    await assertOwnUploads(apprenticeId, input.uploadIds, { transaction });
    await LogEntryUpload.destroy({ where, transaction });
    await LogEntryUpload.bulkCreate(
      input.uploadIds.map((uploadId, i) => ({ entryId, uploadId, position: i + 1 })),
      { transaction },
    );
  }
  if (input.calculationIds) {
    await assertOwnCalculations(apprenticeId, input.calculationIds, { transaction, field: 'calculationIds' });
    await LogEntryCalculation.destroy({ where, transaction });
    await LogEntryCalculation.bulkCreate(
      input.calculationIds.map((calculationId) => ({ entryId, calculationId })),
      { transaction },
    );
  }
}

export async function entryDTO(row: LogEntry): Promise<LogEntryDTO> {
  const [dto] = await toEntryDTOs([row]);
  return dto;
}

/** One transaction for the entry and everything attached: a bad photo or result leaves nothing behind. */
export async function createEntry(
  sequelize: Sequelize,
  user: UserDTO,
  input: LogEntryCreateInput,
): Promise<LogEntryDTO> {
  const row = await sequelize.transaction(async (transaction) => {
    await assertDayTotal(user.id, input.date, input.minutes, null, transaction);
    if (input.lessonId) await assertLessonOpen(input.lessonId, transaction);
    const entry = await LogEntry.create(
      {
        apprenticeId: user.id,
        date: input.date,
        minutes: input.minutes,
        title: input.title,
        notes: input.notes,
        lessonId: input.lessonId ?? null,
      },
      { transaction },
    );
    await writeLists(entry.id, user.id, input, transaction);
    return entry;
  });
  return entryDTO(row);
}

/** Every edit raises the version and stamps editedAt, so a grade given before it shows as given to an older version. */
export async function updateEntry(sequelize: Sequelize, user: UserDTO, id: number, patch: LogEntryPatch) {
  await ownEntry(user, id);
  const row = await sequelize.transaction(async (transaction) => {
    const entry = await LogEntry.findByPk(id, { transaction });
    if (!entry) throw AppError.notFound(WHAT);
    if (Object.keys(patch).length === 0) return entry;
    const date = patch.date ?? entry.date;
    const minutes = patch.minutes ?? entry.minutes;
    await assertDayTotal(user.id, date, minutes, entry.id, transaction);
    if (patch.lessonId && patch.lessonId !== entry.lessonId) await assertLessonOpen(patch.lessonId, transaction);
    await entry.update(
      {
        date,
        minutes,
        title: patch.title ?? entry.title,
        notes: patch.notes ?? entry.notes,
        lessonId: patch.lessonId === undefined ? entry.lessonId : patch.lessonId,
        version: entry.version + 1,
        editedAt: new Date(),
      },
      { transaction },
    );
    await writeLists(entry.id, user.id, patch, transaction);
    return entry;
  });
  return entryDTO(row);
}

/** The photos stay in the uploads store: another record (a submission) may show the same ones. */
export async function deleteEntry(sequelize: Sequelize, user: UserDTO, id: number): Promise<void> {
  await ownEntry(user, id);
  await sequelize.transaction(async (transaction) => {
    const where = { entryId: id };
    await LogMeasurement.destroy({ where, transaction });
    await LogEntryUpload.destroy({ where, transaction });
    await LogEntryCalculation.destroy({ where, transaction });
    await LogComment.destroy({ where, transaction });
    await LogGrade.destroy({ where, transaction });
    await LogEntry.destroy({ where: { id }, transaction });
  });
}

export async function getEntry(viewer: UserDTO, id: number): Promise<LogEntryDTO> {
  const row = await readableEntry(viewer, id);
  if (!row) throw AppError.notFound(WHAT);
  return entryDTO(row);
}

/** Whose log a request is about: the viewer's own, or an apprentice the viewer may read (else 404). */
export async function logOwner(viewer: UserDTO, apprentice: number | undefined): Promise<number> {
  const ownerId = apprentice ?? viewer.id;
  if (ownerId !== viewer.id) await assertCanSeeApprentice(viewer, ownerId, 'That apprentice');
  return ownerId;
}

/** The filters, narrowed to the entries in the viewer's reach (a mentor reads only their class's course's work). */
function filterWhere(viewer: UserDTO, apprenticeId: number, f: LogEntryFilters): WhereOptions<LogEntry> {
  const date = { ...(f.from ? { [Op.gte]: f.from } : {}), ...(f.to ? { [Op.lte]: f.to } : {}) };
  return {
    apprenticeId,
    [Op.and]: [literal(logEntryReachSql(viewer, 'LogEntry'))],
    ...(f.from || f.to ? { date } : {}),
    ...(f.lessonId ? { lessonId: f.lessonId } : {}),
  };
}

const NEWEST_FIRST: [string, string][] = [
  ['date', 'DESC'],
  ['createdAt', 'DESC'],
  ['id', 'DESC'],
];

export async function listEntries(viewer: UserDTO, query: LogEntryListQuery): Promise<LogEntryList> {
  const apprenticeId = await logOwner(viewer, query.apprentice);
  const { rows, count } = await LogEntry.findAndCountAll({
    where: filterWhere(viewer, apprenticeId, query),
    order: NEWEST_FIRST,
    limit: LOG_PAGE_SIZE,
    offset: (query.page - 1) * LOG_PAGE_SIZE,
  });
  return { entries: await toEntryDTOs(rows), total: count, page: query.page, pageSize: LOG_PAGE_SIZE };
}

/** Every entry matching the filters, for the CSV export; no paging. */
export async function allEntries(viewer: UserDTO, filters: LogEntryFilters) {
  const apprenticeId = await logOwner(viewer, filters.apprentice);
  const owner = await User.findByPk(apprenticeId, { attributes: ['name'] });
  const rows = await LogEntry.findAll({ where: filterWhere(viewer, apprenticeId, filters), order: NEWEST_FIRST });
  return { apprenticeName: owner?.name ?? 'apprentice', entries: await toEntryDTOs(rows) };
}
