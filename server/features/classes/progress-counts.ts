import { QueryTypes, type Sequelize } from 'sequelize';

export interface CourseProgress {
  lessonsTotal: number;
  projectsTotal: number;
  lessonsDone: Map<number, number>;
  projectsPassed: Map<number, number>;
}

/**
 * Lessons done and projects passed per apprentice within one course. Progress and submissions are other features'
 * tables; they are read here by name, and only when they (and the columns used) exist, so the roster works whether
 * or not those features are installed.
 */
export async function courseProgress(
  sequelize: Sequelize,
  courseId: number,
  userIds: number[],
): Promise<CourseProgress> {
  const [lessons] = await sequelize.query<{ n: number }>(
    'SELECT COUNT(*) AS n FROM lessons WHERE courseId = :courseId AND retiredAt IS NULL',
    { replacements: { courseId }, type: QueryTypes.SELECT },
  );
  const [projects] = await sequelize.query<{ n: number }>(
    `SELECT COUNT(*) AS n FROM projects p JOIN lessons l ON l.id = p.lessonId
     WHERE l.courseId = :courseId AND p.retiredAt IS NULL AND l.retiredAt IS NULL`,
    { replacements: { courseId }, type: QueryTypes.SELECT },
  );
  const result: CourseProgress = {
    lessonsTotal: Number(lessons.n),
    projectsTotal: Number(projects.n),
    lessonsDone: new Map(),
    projectsPassed: new Map(),
  };
  if (userIds.length === 0) return result;

  if (await hasColumns(sequelize, 'lesson_progress', ['userId', 'lessonId', 'completedAt'])) {
    const rows = await sequelize.query<{ userId: number; n: number }>(
      `SELECT lp.userId AS userId, COUNT(DISTINCT lp.lessonId) AS n FROM lesson_progress lp
       JOIN lessons l ON l.id = lp.lessonId
       WHERE l.courseId = :courseId AND l.retiredAt IS NULL AND lp.completedAt IS NOT NULL AND lp.userId IN (:userIds)
       GROUP BY lp.userId`,
      { replacements: { courseId, userIds }, type: QueryTypes.SELECT },
    );
    for (const r of rows) result.lessonsDone.set(Number(r.userId), Number(r.n));
  }
  if (await hasColumns(sequelize, 'submissions', ['apprenticeId', 'projectId', 'status'])) {
    const rows = await sequelize.query<{ userId: number; n: number }>(
      `SELECT s.apprenticeId AS userId, COUNT(DISTINCT s.projectId) AS n FROM submissions s
       JOIN projects p ON p.id = s.projectId JOIN lessons l ON l.id = p.lessonId
       WHERE l.courseId = :courseId AND s.status = 'passed' AND s.apprenticeId IN (:userIds)
       GROUP BY s.apprenticeId`,
      { replacements: { courseId, userIds }, type: QueryTypes.SELECT },
    );
    for (const r of rows) result.projectsPassed.set(Number(r.userId), Number(r.n));
  }
  return result;
}

async function hasColumns(sequelize: Sequelize, table: string, columns: string[]): Promise<boolean> {
  const found = await sequelize.query<{ name: string }>('SELECT name FROM pragma_table_info(:table)', {
    replacements: { table },
    type: QueryTypes.SELECT,
  });
  const names = new Set(found.map((c) => c.name));
  return columns.every((c) => names.has(c));
}
