import { QueryTypes, type Sequelize } from 'sequelize';
import {
  QUEUE_PAGE_SIZE,
  type ReviewQueueFilters,
  type ReviewQueuePage,
  type ReviewQueueQuery,
} from '@shared/schemas/review';
import type { UserDTO } from '@shared/schemas/user';
import { mentoredClassIds, reachSql } from '../classes/access';
import { uploadDTO } from '../uploads/uploads.service';

/** Whitelisted ORDER BY columns; the request only ever picks a key of this map. */
const SORT_COLUMN = { waiting: 's.sentAt', apprentice: 'LOWER(u.name)', project: 'LOWER(p.title)' } as const;

interface Scope {
  where: string[];
  replacements: Record<string, unknown>;
  classIds: number[] | 'all';
  /** The mentor's reach depends on each piece's course, so their queue always joins the lessons. */
  byCourse: boolean;
}

/** The waiting submissions a viewer may review, narrowed by the filters; null when the viewer may see none. */
async function scope(
  viewer: UserDTO,
  q: Pick<ReviewQueueQuery, 'classId' | 'courseId' | 'projectId'>,
): Promise<Scope | null> {
  const where = ["s.status = 'waiting'"];
  const replacements: Record<string, unknown> = {};
  const classIds = viewer.role === 'admin' ? 'all' : await mentoredClassIds(viewer.id);
  if (viewer.role === 'apprentice') return null;
  if (classIds !== 'all') {
    if (classIds.length === 0) return null;
    // The rule of access.ts as a condition: a mentor of a class of two thousand would otherwise send as many ids.
    where.push(reachSql(viewer, 's.apprenticeId', 'l.courseId'));
  }
  if (q.classId) {
    if (classIds !== 'all' && !classIds.includes(q.classId)) return null;
    where.push('s.apprenticeId IN (SELECT userId FROM enrolments WHERE classId = :classId)');
    where.push('l.courseId = (SELECT courseId FROM classes WHERE id = :classId)');
    replacements.classId = q.classId;
  }
  if (q.courseId) {
    where.push('l.courseId = :courseId');
    replacements.courseId = q.courseId;
  }
  if (q.projectId) {
    where.push('s.projectId = :projectId');
    replacements.projectId = q.projectId;
  }
  return { where, replacements, classIds, byCourse: classIds !== 'all' };
}

/** Only the tables a filter or the sort needs are joined: a plain count reads the submissions indexes alone. */
function fromFor(q: Partial<Pick<ReviewQueueQuery, 'classId' | 'courseId' | 'sort'>>, byCourse: boolean) {
  const joins = ['FROM submissions s'];
  if (byCourse || q.classId || q.courseId || q.sort === 'project') {
    joins.push('JOIN projects p ON p.id = s.projectId JOIN lessons l ON l.id = p.lessonId');
  }
  if (q.sort === 'apprentice') joins.push('JOIN users u ON u.id = s.apprenticeId');
  return joins.join(' ');
}

export async function reviewQueue(
  sequelize: Sequelize,
  viewer: UserDTO,
  q: ReviewQueueQuery,
): Promise<ReviewQueuePage> {
  const empty = { rows: [], total: 0, page: q.page, pageSize: QUEUE_PAGE_SIZE };
  const s = await scope(viewer, q);
  if (!s) return empty;
  const where = s.where.join(' AND ');
  const dir = q.dir === 'desc' ? 'DESC' : 'ASC';
  const [{ total }] = await sequelize.query<{ total: number }>(
    `SELECT COUNT(*) AS total ${fromFor({ ...q, sort: undefined }, s.byCourse)} WHERE ${where}`,
    {
      replacements: s.replacements,
      type: QueryTypes.SELECT,
    },
  );
  // The page is chosen first on the narrow join; names, counts and the class are looked up for its rows only.
  const classFilter = s.classIds === 'all' ? '' : 'AND g.id IN (:classIds)';
  const rows = await sequelize.query<Record<string, string | number | null>>(
    `SELECT pg.id AS submissionId, pg.apprenticeId, u.name AS apprenticeName, p.id AS projectId, p.title AS projectTitle,
            c.id AS courseId, c.title AS courseTitle, pg.currentVersion AS version, pg.sentAt,
            (SELECT COUNT(*) FROM submission_photos sp WHERE sp.versionId = v.id) AS photoCount,
            (SELECT sp.uploadId FROM submission_photos sp WHERE sp.versionId = v.id ORDER BY sp.position LIMIT 1) AS firstUploadId,
            (SELECT g.name FROM enrolments e JOIN classes g ON g.id = e.classId
              WHERE e.userId = pg.apprenticeId AND g.courseId = c.id ${classFilter}
              ORDER BY e.status = 'active' DESC, g.startsOn DESC LIMIT 1) AS className
     FROM (SELECT s.id, s.apprenticeId, s.projectId, s.currentVersion, s.sentAt, ${SORT_COLUMN[q.sort]} AS sortKey
           ${fromFor(q, s.byCourse)} WHERE ${where}
           ORDER BY ${SORT_COLUMN[q.sort]} ${dir}, s.sentAt ASC, s.id ${dir}
           LIMIT :limit OFFSET :offset) pg
     JOIN users u ON u.id = pg.apprenticeId
     JOIN projects p ON p.id = pg.projectId
     JOIN lessons l ON l.id = p.lessonId
     JOIN courses c ON c.id = l.courseId
     JOIN submission_versions v ON v.submissionId = pg.id AND v.number = pg.currentVersion
     ORDER BY pg.sortKey ${dir}, pg.sentAt ASC, pg.id ${dir}`,
    {
      replacements: {
        ...s.replacements,
        classIds: s.classIds === 'all' ? [] : s.classIds,
        limit: QUEUE_PAGE_SIZE,
        offset: (q.page - 1) * QUEUE_PAGE_SIZE,
      },
      type: QueryTypes.SELECT,
    },
  );
  return {
    rows: rows.map((r) => ({
      submissionId: Number(r.submissionId),
      apprentice: { id: Number(r.apprenticeId), name: String(r.apprenticeName) },
      project: { id: Number(r.projectId), title: String(r.projectTitle) },
      course: { id: Number(r.courseId), title: String(r.courseTitle) },
      className: r.className === null ? null : String(r.className),
      version: Number(r.version),
      sentAt: new Date(String(r.sentAt)).toISOString(),
      photoCount: Number(r.photoCount),
      thumbUrl:
        r.firstUploadId === null ? null : uploadDTO({ id: Number(r.firstUploadId), width: 0, height: 0 }).thumbUrl,
    })),
    total: Number(total),
    page: q.page,
    pageSize: QUEUE_PAGE_SIZE,
  };
}

export async function queueCount(sequelize: Sequelize, viewer: UserDTO): Promise<number> {
  const s = await scope(viewer, {});
  if (!s) return 0;
  const [{ total }] = await sequelize.query<{ total: number }>(
    `SELECT COUNT(*) AS total ${fromFor({}, s.byCourse)} WHERE ${s.where.join(' AND ')}`,
    {
      replacements: s.replacements,
      type: QueryTypes.SELECT,
    },
  );
  return Number(total);
}

/** What the filters offer: the viewer's classes, their courses, and those courses' projects. */
export async function queueFilters(sequelize: Sequelize, viewer: UserDTO): Promise<ReviewQueueFilters> {
  const classIds = viewer.role === 'admin' ? 'all' : await mentoredClassIds(viewer.id);
  if (classIds !== 'all' && classIds.length === 0) return { classes: [], courses: [], projects: [] };
  const inClasses = classIds === 'all' ? '' : 'WHERE g.id IN (:classIds)';
  const classes = await sequelize.query<{ id: number; label: string; courseId: number }>(
    `SELECT g.id, g.name AS label, g.courseId FROM classes g ${inClasses} ORDER BY g.startsOn DESC, g.name`,
    { replacements: { classIds }, type: QueryTypes.SELECT },
  );
  const courseIds = [...new Set(classes.map((c) => Number(c.courseId)))];
  if (courseIds.length === 0) return { classes: [], courses: [], projects: [] };
  const courses = await sequelize.query<{ id: number; label: string }>(
    'SELECT id, title AS label FROM courses WHERE id IN (:courseIds) ORDER BY position, title',
    { replacements: { courseIds }, type: QueryTypes.SELECT },
  );
  const projects = await sequelize.query<{ id: number; label: string; courseId: number }>(
    `SELECT p.id, p.title AS label, l.courseId FROM projects p JOIN lessons l ON l.id = p.lessonId
     WHERE l.courseId IN (:courseIds) ORDER BY l.courseId, l.position`,
    { replacements: { courseIds }, type: QueryTypes.SELECT },
  );
  return {
    classes: classes.map((c) => ({ id: Number(c.id), label: c.label })),
    courses: courses.map((c) => ({ id: Number(c.id), label: c.label })),
    projects: projects.map((p) => ({ id: Number(p.id), label: p.label, courseId: Number(p.courseId) })),
  };
}
