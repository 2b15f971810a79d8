import { Op, type Sequelize } from 'sequelize';
import type { Logger } from '../../lib/logger';
import { Course, Lesson, Project } from './course.model';
import { loadContent } from './content-loader';
import { prepareCatalogue } from './catalogue';

/**
 * Brings the database in line with content/: rows are matched by slug so ids stay stable across restarts,
 * and anything no longer in content/ is retired (never deleted), so progress and submissions keep their target.
 * Ends by preparing the in-memory catalogue that course, lesson and search reads are answered from.
 */
export async function syncContent(sequelize: Sequelize, root: string, logger?: Logger): Promise<void> {
  const { courses, problems } = loadContent(root);
  for (const p of problems) logger?.warn(`${p.file}:${p.line} ${p.message}`);
  const now = new Date();
  await sequelize.transaction(async (transaction) => {
    const keptCourseIds: number[] = [];
    for (const c of courses) {
      const fields = {
        title: c.meta.title,
        summary: c.meta.summary,
        level: c.meta.level,
        position: c.meta.order,
        skills: c.meta.skills,
        intro: c.intro,
        retiredAt: null,
      };
      const [course] = await Course.findOrCreate({
        where: { slug: c.meta.slug },
        defaults: { slug: c.meta.slug, ...fields },
        transaction,
      });
      await course.update(fields, { transaction });
      keptCourseIds.push(course.id);
      const keptLessonIds: number[] = [];
      for (const l of c.lessons) {
        const lessonFields = {
          position: l.position,
          title: l.meta.title,
          minutes: l.meta.minutes,
          skills: l.meta.skills,
          body: l.body,
          retiredAt: null,
        };
        const [lesson] = await Lesson.findOrCreate({
          where: { courseId: course.id, slug: l.slug },
          defaults: { courseId: course.id, slug: l.slug, ...lessonFields },
          transaction,
        });
        await lesson.update(lessonFields, { transaction });
        keptLessonIds.push(lesson.id);
        const project = await Project.findOne({ where: { lessonId: lesson.id }, transaction });
        if (l.meta.project) {
          const p = { ...l.meta.project, retiredAt: null };
          if (project) await project.update(p, { transaction });
          else await Project.create({ lessonId: lesson.id, ...p }, { transaction });
        } else if (project && !project.retiredAt) {
          await project.update({ retiredAt: now }, { transaction });
        }
      }
      await Lesson.update(
        { retiredAt: now },
        { where: { courseId: course.id, id: { [Op.notIn]: keptLessonIds }, retiredAt: null }, transaction },
      );
    }
    await Course.update(
      { retiredAt: now },
      { where: { id: { [Op.notIn]: keptCourseIds }, retiredAt: null }, transaction },
    );
  });
  await prepareCatalogue(sequelize);
}
