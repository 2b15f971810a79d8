import { Op, QueryTypes, type Sequelize } from 'sequelize';
import type { UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { ClassMentor, Enrolment } from './class.model';

/**
 * Who may see an apprentice's work, decided here and nowhere else:
 * - the apprentice their own, and the guild office everything;
 * - a mentor only while the apprentice is actively enrolled in a class the mentor teaches, and only work for that
 *   class's course. A withdrawn apprentice, or a piece for another course, is out of the mentor's reach.
 * Work tied to no course (saved results, a log entry without a lesson) is in reach of any current mentor of the
 * apprentice. Out of reach answers 404, so that nobody learns whether a record exists.
 *
 * `reachSql` and `logEntryReachSql` state the same rule as SQL conditions, for lists and counts that must not fetch
 * every id first. The viewer's id is written into the SQL as a number (it comes from the session, never the request).
 */

const sequelizeOf = () => Enrolment.sequelize as Sequelize;

function idOf(viewer: UserDTO): number {
  if (!Number.isSafeInteger(viewer.id)) throw new Error('A viewer id must be an integer.');
  return viewer.id;
}

/** SQL: the viewer reaches the apprentice in `apprenticeCol`, for the course in `courseCol` when one is given. */
export function reachSql(viewer: UserDTO, apprenticeCol: string, courseCol?: string): string {
  if (viewer.role === 'admin') return '1 = 1';
  if (viewer.role === 'apprentice') return `${apprenticeCol} = ${idOf(viewer)}`;
  return `EXISTS (SELECT 1 FROM class_mentors rcm
    JOIN classes rg ON rg.id = rcm.classId
    JOIN enrolments ren ON ren.classId = rg.id AND ren.status = 'active'
    WHERE rcm.userId = ${idOf(viewer)} AND ren.userId = ${apprenticeCol}${courseCol ? ` AND rg.courseId = ${courseCol}` : ''})`;
}

/** SQL: the viewer reaches the log entry aliased `alias` (its lesson's course, or any course when it has no lesson). */
export function logEntryReachSql(viewer: UserDTO, alias: string): string {
  const course = `(SELECT rl.courseId FROM lessons rl WHERE rl.id = ${alias}.lessonId)`;
  return `((${alias}.lessonId IS NULL AND ${reachSql(viewer, `${alias}.apprenticeId`)}) OR (${alias}.lessonId IS NOT NULL AND ${reachSql(viewer, `${alias}.apprenticeId`, course)}))`;
}

async function exists(sql: string, replacements: Record<string, unknown>): Promise<boolean> {
  const rows = await sequelizeOf().query(`SELECT (${sql}) AS hit`, { replacements, type: QueryTypes.SELECT });
  return Number((rows[0] as { hit: number }).hit) === 1;
}

/** May the viewer see this apprentice at all (their name in a list, their saved results, work tied to no course)? */
export async function canSeeApprentice(viewer: UserDTO, apprenticeId: number): Promise<boolean> {
  if (viewer.role === 'admin') return true;
  if (viewer.role === 'apprentice') return viewer.id === apprenticeId;
  return exists(reachSql(viewer, ':apprenticeId'), { apprenticeId });
}

/** May the viewer see this apprentice's work for this course (null: work tied to no course)? */
export async function canSeeCourseWork(
  viewer: UserDTO,
  apprenticeId: number,
  courseId: number | null,
): Promise<boolean> {
  if (courseId === null || viewer.role !== 'mentor') return canSeeApprentice(viewer, apprenticeId);
  return exists(reachSql(viewer, ':apprenticeId', ':courseId'), { apprenticeId, courseId });
}

/** A submission's course is its project's lesson's course. */
export async function canSeeSubmission(viewer: UserDTO, submission: { apprenticeId: number; projectId: number }) {
  if (viewer.role !== 'mentor') return canSeeApprentice(viewer, submission.apprenticeId);
  const course = `(SELECT l.courseId FROM projects p JOIN lessons l ON l.id = p.lessonId WHERE p.id = :projectId)`;
  return exists(reachSql(viewer, ':apprenticeId', course), {
    apprenticeId: submission.apprenticeId,
    projectId: submission.projectId,
  });
}

export async function canSeeLogEntry(viewer: UserDTO, entry: { id: number; apprenticeId: number }) {
  if (viewer.role !== 'mentor') return canSeeApprentice(viewer, entry.apprenticeId);
  return exists(`EXISTS (SELECT 1 FROM log_entries e WHERE e.id = :entryId AND ${logEntryReachSql(viewer, 'e')})`, {
    entryId: entry.id,
  });
}

/**
 * A photo is its owner's. A mentor sees it only through work in reach: a sent version of a submission, or a bench-log
 * entry. A photo still sitting in a draft, or attached to nothing, is the apprentice's alone.
 */
export async function canSeeUpload(viewer: UserDTO, upload: { id: number; ownerId: number }): Promise<boolean> {
  if (viewer.id === upload.ownerId) return true;
  if (viewer.role !== 'mentor') return canSeeApprentice(viewer, upload.ownerId);
  const inPiece = `EXISTS (SELECT 1 FROM submission_photos sp
      JOIN submission_versions v ON v.id = sp.versionId AND v.sentAt IS NOT NULL
      JOIN submissions s ON s.id = v.submissionId
      JOIN projects p ON p.id = s.projectId JOIN lessons l ON l.id = p.lessonId
      WHERE sp.uploadId = :uploadId AND ${reachSql(viewer, 's.apprenticeId', 'l.courseId')})`;
  const inLog = `EXISTS (SELECT 1 FROM log_entry_uploads lu JOIN log_entries e ON e.id = lu.entryId
      WHERE lu.uploadId = :uploadId AND ${logEntryReachSql(viewer, 'e')})`;
  return exists(`${inPiece} OR ${inLog}`, { uploadId: upload.id });
}

/** Throws 404 (not 403) so that a stranger cannot learn whether a record exists. */
export async function assertCanSeeApprentice(viewer: UserDTO, apprenticeId: number, what = 'That record') {
  if (!(await canSeeApprentice(viewer, apprenticeId))) throw AppError.notFound(what);
}

/** The courses whose work of this apprentice the viewer may list, or 'all' (the apprentice, the admin). */
export async function reachableCourseIds(viewer: UserDTO, apprenticeId: number): Promise<number[] | 'all'> {
  if (viewer.role !== 'mentor') return (await canSeeApprentice(viewer, apprenticeId)) ? 'all' : [];
  const rows = await sequelizeOf().query<{ courseId: number }>(
    `SELECT DISTINCT g.courseId FROM class_mentors cm JOIN classes g ON g.id = cm.classId
     JOIN enrolments en ON en.classId = g.id AND en.status = 'active'
     WHERE cm.userId = :mentorId AND en.userId = :apprenticeId`,
    { replacements: { mentorId: viewer.id, apprenticeId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => Number(r.courseId));
}

export async function mentoredClassIds(mentorId: number): Promise<number[]> {
  const links = await ClassMentor.findAll({ where: { userId: mentorId }, attributes: ['classId'] });
  return links.map((l) => l.classId);
}

/** The apprentices a viewer may see, or 'all' for the admin: a mentor's are those actively enrolled in their classes. */
export async function visibleApprenticeIds(viewer: UserDTO): Promise<number[] | 'all'> {
  if (viewer.role === 'admin') return 'all';
  if (viewer.role === 'apprentice') return [viewer.id];
  const classIds = await mentoredClassIds(viewer.id);
  const rows = await Enrolment.findAll({
    where: { classId: { [Op.in]: classIds }, status: 'active' },
    attributes: ['userId'],
  });
  return [...new Set(rows.map((r) => r.userId))];
}

/** Who is told when a piece for this course is sent: mentors of the course's classes the apprentice is active in. */
export async function mentorsOfApprentice(apprenticeId: number, courseId: number): Promise<number[]> {
  const rows = await sequelizeOf().query<{ userId: number }>(
    `SELECT DISTINCT cm.userId FROM enrolments en JOIN classes g ON g.id = en.classId
     JOIN class_mentors cm ON cm.classId = g.id
     WHERE en.userId = :apprenticeId AND en.status = 'active' AND g.courseId = :courseId`,
    { replacements: { apprenticeId, courseId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => Number(r.userId));
}
