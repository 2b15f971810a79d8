import type { CourseCard, CourseDetailReply, LessonBasicsReply, LessonReply } from '@shared/schemas/course';
import type { UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import type { Catalogue, CatalogueLesson } from './catalogue';
import { Course, Lesson } from './course.model';
import { toCourseCard, toLessonListItem, toProjectDTO } from './course.mapper';
import { doneLessonIds } from './progress.service';

/** Every signed-in role reads every live course, from the catalogue prepared at sync; retired ones are not in it. */
async function doneFor(viewer: UserDTO) {
  return viewer.role === 'apprentice' ? doneLessonIds(viewer.id) : null;
}

const lessonRows = (lessons: CatalogueLesson[]) => lessons.map((l) => l.lesson);

export async function listCourses(catalogue: Catalogue, viewer: UserDTO): Promise<CourseCard[]> {
  const done = await doneFor(viewer);
  return catalogue.courses.map(({ course, lessons }) => toCourseCard(course, lessonRows(lessons), done));
}

function findCourse(catalogue: Catalogue, slug: string) {
  const entry = catalogue.bySlug.get(slug);
  if (!entry) throw AppError.notFound('The course');
  return entry;
}

export async function getCourse(catalogue: Catalogue, viewer: UserDTO, slug: string): Promise<CourseDetailReply> {
  const { course, lessons } = findCourse(catalogue, slug);
  const done = await doneFor(viewer);
  return {
    course: { ...toCourseCard(course, lessonRows(lessons), done), intro: course.intro, skills: course.skills },
    lessons: lessons.map((l) => toLessonListItem(l.lesson, course.skills, done, l.project)),
  };
}

export async function getLesson(
  catalogue: Catalogue,
  viewer: UserDTO,
  courseSlug: string,
  lessonSlug: string,
): Promise<LessonReply> {
  const { course, lessons } = findCourse(catalogue, courseSlug);
  const index = lessons.findIndex((l) => l.lesson.slug === lessonSlug);
  if (index < 0) throw AppError.notFound('The lesson');
  const { lesson, outline, project } = lessons[index];
  const done = await doneFor(viewer);
  const link = (l: CatalogueLesson | undefined) => (l ? { slug: l.lesson.slug, title: l.lesson.title } : null);
  const { project: _badge, ...item } = toLessonListItem(lesson, course.skills, done, project);
  return {
    course: { id: course.id, slug: course.slug, title: course.title },
    lesson: { ...item, body: lesson.body, outline },
    previous: link(lessons[index - 1]),
    next: link(lessons[index + 1]),
    project: project ? toProjectDTO(project) : null,
  };
}

/** Any lesson by id, retired or not (old submissions and log entries still point at retired ones). */
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
