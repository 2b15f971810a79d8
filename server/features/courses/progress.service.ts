import { Op, UniqueConstraintError } from 'sequelize';
import type { LessonDoneReply, NextLessonReply } from '@shared/schemas/course';
import { AppError } from '../../lib/app-error';
import { Enrolment, GuildClass } from '../classes/class.model';
import { Course, Lesson } from './course.model';
import { LessonProgress } from './lesson-progress.model';

export async function doneLessonIds(userId: number): Promise<Set<number>> {
  const rows = await LessonProgress.findAll({ where: { userId }, attributes: ['lessonId'] });
  return new Set(rows.map((r) => r.lessonId));
}

/** Only a lesson that is still taught can be marked; a retired one keeps whatever marks it had. */
async function liveLesson(lessonId: number) {
  const lesson = await Lesson.findOne({ where: { id: lessonId, retiredAt: null } });
  const course = lesson && (await Course.findOne({ where: { id: lesson.courseId, retiredAt: null } }));
  if (!lesson || !course) throw AppError.notFound('The lesson');
  return lesson;
}

export async function markDone(userId: number, lessonId: number): Promise<LessonDoneReply> {
  await liveLesson(lessonId);
  let row = await LessonProgress.findOne({ where: { userId, lessonId } });
  if (!row) {
    try {
      row = await LessonProgress.create({ userId, lessonId, completedAt: new Date() });
    } catch (err) {
      // Two tabs marking the same lesson at once: the other request's row is the answer.
      if (!(err instanceof UniqueConstraintError)) throw err;
      row = await LessonProgress.findOne({ where: { userId, lessonId }, rejectOnEmpty: true });
    }
  }
  return { lessonId, done: true, completedAt: row.completedAt.toISOString() };
}

export async function markNotDone(userId: number, lessonId: number): Promise<LessonDoneReply> {
  await liveLesson(lessonId);
  await LessonProgress.destroy({ where: { userId, lessonId } });
  return { lessonId, done: false, completedAt: null };
}

/** The first lesson not yet done in the course of the apprentice's current class (the latest active enrolment). */
export async function nextLesson(userId: number): Promise<NextLessonReply> {
  const enrolments = await Enrolment.findAll({ where: { userId, status: 'active' }, attributes: ['classId'] });
  const cls = await GuildClass.findOne({
    where: { id: { [Op.in]: enrolments.map((e) => e.classId) }, archivedAt: null },
    order: [['startsOn', 'DESC']],
  });
  const course = cls && (await Course.findOne({ where: { id: cls.courseId, retiredAt: null } }));
  if (!course) return { course: null, lesson: null };
  const lessons = await Lesson.findAll({
    where: { courseId: course.id, retiredAt: null },
    order: [['position', 'ASC']],
  });
  const done = await doneLessonIds(userId);
  const next = lessons.find((l) => !done.has(l.id));
  return {
    course: {
      id: course.id,
      slug: course.slug,
      title: course.title,
      lessonCount: lessons.length,
      lessonsDone: lessons.filter((l) => done.has(l.id)).length,
    },
    lesson: next ? { slug: next.slug, title: next.title, minutes: next.minutes, position: next.position } : null,
  };
}
