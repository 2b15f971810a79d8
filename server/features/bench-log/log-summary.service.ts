import { Op, QueryTypes, type Sequelize } from 'sequelize';
import {
  addDays,
  localToday,
  mondayOf,
  type LogApprentices,
  type LogEntriesToRead,
  type LogSummary,
  type LogSummaryQuery,
} from '@shared/schemas/log-entry';
import type { UserDTO } from '@shared/schemas/user';
import { User } from '../auth/user.model';
import { logEntryReachSql, visibleApprenticeIds } from '../classes/access';
import { logOwner } from './log-entries.service';

export async function logSummary(sequelize: Sequelize, viewer: UserDTO, query: LogSummaryQuery): Promise<LogSummary> {
  const apprenticeId = await logOwner(viewer, query.apprentice);
  const owner = await User.findByPk(apprenticeId, { attributes: ['id', 'name'] });
  const thisMonday = mondayOf(localToday());
  const weekStarts = Array.from({ length: query.weeks }, (_, i) => addDays(thisMonday, -7 * (query.weeks - 1 - i)));
  const byWeek = new Map(weekStarts.map((w) => [w, 0]));
  const recent = await sequelize.query<{ date: string; minutes: number }>(
    `SELECT e.date, e.minutes FROM log_entries e
     WHERE e.apprenticeId = :apprenticeId AND e.date >= :from AND ${logEntryReachSql(viewer, 'e')}`,
    { replacements: { apprenticeId, from: weekStarts[0] }, type: QueryTypes.SELECT },
  );
  for (const r of recent) {
    const week = mondayOf(r.date);
    if (byWeek.has(week)) byWeek.set(week, byWeek.get(week)! + Number(r.minutes));
  }
  const courses = await sequelize.query<{ id: number | null; title: string | null; minutes: number; entries: number }>(
    `SELECT c.id AS id, c.title AS title, SUM(e.minutes) AS minutes, COUNT(*) AS entries
     FROM log_entries e
     LEFT JOIN lessons l ON l.id = e.lessonId
     LEFT JOIN courses c ON c.id = l.courseId
     WHERE e.apprenticeId = :apprenticeId AND ${logEntryReachSql(viewer, 'e')}
     GROUP BY c.id
     ORDER BY minutes DESC`,
    { replacements: { apprenticeId }, type: QueryTypes.SELECT },
  );
  return {
    apprentice: { id: apprenticeId, name: owner?.name ?? 'Former member' },
    weeks: weekStarts.map((weekStart) => ({ weekStart, minutes: byWeek.get(weekStart)! })),
    thisWeekMinutes: byWeek.get(thisMonday)!,
    totalMinutes: courses.reduce((sum, c) => sum + Number(c.minutes), 0),
    entryCount: courses.reduce((sum, c) => sum + Number(c.entries), 0),
    courses: courses.map((c) => ({
      course: c.id === null ? null : { id: Number(c.id), title: String(c.title) },
      minutes: Number(c.minutes),
      entries: Number(c.entries),
    })),
  };
}

const TO_READ_LIMIT = 8;

/** Entries that no mentor has graded yet, newest first: what a mentor's Today page asks them to read. */
export async function entriesToRead(sequelize: Sequelize, viewer: UserDTO): Promise<LogEntriesToRead> {
  const from = `FROM log_entries e JOIN users u ON u.id = e.apprenticeId
     WHERE ${logEntryReachSql(viewer, 'e')} AND NOT EXISTS (SELECT 1 FROM log_grades g WHERE g.entryId = e.id)`;
  const replacements = { limit: TO_READ_LIMIT };
  const rows = await sequelize.query<{
    id: number;
    apprenticeId: number;
    name: string;
    date: string;
    title: string;
    minutes: number;
  }>(
    `SELECT e.id, e.apprenticeId, u.name, e.date, e.title, e.minutes ${from}
     ORDER BY e.date DESC, e.id DESC LIMIT :limit`,
    { replacements, type: QueryTypes.SELECT },
  );
  const [{ total }] = await sequelize.query<{ total: number }>(`SELECT COUNT(*) AS total ${from}`, {
    replacements,
    type: QueryTypes.SELECT,
  });
  return {
    entries: rows.map((r) => ({
      id: Number(r.id),
      apprentice: { id: Number(r.apprenticeId), name: r.name },
      date: r.date,
      title: r.title,
      minutes: Number(r.minutes),
    })),
    total: Number(total),
  };
}

/** The apprentices whose logs a mentor (or the admin) may read, with how much each has logged and left ungraded. */
export async function logApprentices(sequelize: Sequelize, viewer: UserDTO): Promise<LogApprentices> {
  const visible = await visibleApprenticeIds(viewer);
  if (visible !== 'all' && visible.length === 0) return { apprentices: [] };
  const people = await User.findAll({
    where: { role: 'apprentice', ...(visible === 'all' ? {} : { id: { [Op.in]: visible } }) },
    attributes: ['id', 'name'],
    order: [['name', 'ASC']],
  });
  const counts = await sequelize.query<{ apprenticeId: number; entries: number; lastDate: string; ungraded: number }>(
    `SELECT e.apprenticeId, COUNT(*) AS entries, MAX(e.date) AS lastDate,
       SUM(CASE WHEN EXISTS (SELECT 1 FROM log_grades g WHERE g.entryId = e.id) THEN 0 ELSE 1 END) AS ungraded
     FROM log_entries e WHERE e.apprenticeId IN (:ids) AND ${logEntryReachSql(viewer, 'e')} GROUP BY e.apprenticeId`,
    { replacements: { ids: people.map((p) => p.id).concat(0) }, type: QueryTypes.SELECT },
  );
  const byId = new Map(counts.map((c) => [Number(c.apprenticeId), c]));
  return {
    apprentices: people.map((p) => {
      const c = byId.get(p.id);
      return {
        id: p.id,
        name: p.name,
        entries: Number(c?.entries ?? 0),
        lastDate: c?.lastDate ?? null,
        ungraded: Number(c?.ungraded ?? 0),
      };
    }),
  };
}
