import { Op } from 'sequelize';
import type { CourseCard, CourseDetailReply, LessonBasicsReply, LessonReply } from '@shared/schemas/course';
import type { UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { Course, Lesson, Project } from './course.model';
import { toCourseCard, toLessonListItem, toProjectDTO } from './course.mapper';
import { lessonOutline, parseLessonMarkdown } from './lesson-markdown';
import { doneLessonIds } from './progress.service';

/** Every signed-in role reads every live course; retired courses and lessons keep their rows but leave the lists. */
const live = { retiredAt: null };

async function liveLessons(courseIds: number[]) {
  return Lesson.findAll({ where: { ...live, courseId: { [Op.in]: courseIds } }, order: [['position', 'ASC']] });
}

async function doneFor(viewer: UserDTO) {
  return viewer.role === 'apprentice' ? doneLessonIds(viewer.id) : null;
}

export async function listCourses(viewer: UserDTO): Promise<CourseCard[]> {
  const courses = await Course.findAll({
    where: live,
    order: [
      ['position', 'ASC'],
      ['title', 'ASC'],
    ],
  });
  const lessons = await liveLessons(courses.map((c) => c.id));
  const done = await doneFor(viewer);
  return courses.map((c) =>
    toCourseCard(
      c,
      lessons.filter((l) => l.courseId === c.id),
      done,
    ),
  );
}

async function findCourse(slug: string) {
  const course = await Course.findOne({ where: { slug, ...live } });
  if (!course) throw AppError.notFound('The course');
  return course;
}

async function liveProjects(lessonIds: number[]) {
  const projects = await Project.findAll({ where: { ...live, lessonId: { [Op.in]: lessonIds } } });
  return new Map(projects.map((p) => [p.lessonId, p]));
}

export async function getCourse(viewer: UserDTO, slug: string): Promise<CourseDetailReply> {
  const course = await findCourse(slug);
  const lessons = await liveLessons([course.id]);
  const done = await doneFor(viewer);
  const projects = await liveProjects(lessons.map((l) => l.id));
  return {
    course: { ...toCourseCard(course, lessons, done), intro: course.intro, skills: course.skills },
    lessons: lessons.map((l) => toLessonListItem(l, course.skills, done, projects.get(l.id) ?? null)),
  };
}

export async function getLesson(viewer: UserDTO, courseSlug: string, lessonSlug: string): Promise<LessonReply> {
  const course = await findCourse(courseSlug);
  const lessons = await liveLessons([course.id]);
  const index = lessons.findIndex((l) => l.slug === lessonSlug);
  if (index < 0) throw AppError.notFound('The lesson');
  const lesson = lessons[index];
  const done = await doneFor(viewer);
  const project = (await liveProjects([lesson.id])).get(lesson.id) ?? null;
  const link = (l: Lesson | undefined) => (l ? { slug: l.slug, title: l.title } : null);
  const { project: _badge, ...item } = toLessonListItem(lesson, course.skills, done, project);
  return {
    course: { id: course.id, slug: course.slug, title: course.title },
    lesson: { ...item, body: lesson.body, outline: lessonOutline(parseLessonMarkdown(lesson.body)) },
    previous: link(lessons[index - 1]),
    next: link(lessons[index + 1]),
    project: project ? toProjectDTO(project) : null,
  };
}

export async function getLessonBasics(id: number): Promise<LessonBasicsReply> {
  const lesson = await Lesson.findByPk(id);
  const course = lesson && (await Course.findByPk(lesson.courseId));
  if (!lesson || !course) throw AppError.notFound('The lesson');
  return {
    lesson: {
      id: lesson.id,
      slug: lesson.slug,
      title: lesson.title,
      position: lesson.position,
      retired: lesson.retiredAt !== null || course.retiredAt !== null,
    },
    course: { id: course.id, slug: course.slug, title: course.title },
  };
}
