import type { Skill } from '@shared/schemas/content';
import type { CourseCard, CourseLevel, LessonListItem, ProjectDTO } from '@shared/schemas/course';
import type { Course, Lesson, Project } from './course.model';

/** Progress is only counted for apprentices; for everyone else it is null, not zero. */
export function toCourseCard(course: Course, lessons: Lesson[], done: Set<number> | null): CourseCard {
  const lessonsDone = done ? lessons.filter((l) => done.has(l.id)).length : null;
  return {
    id: course.id,
    slug: course.slug,
    title: course.title,
    summary: course.summary,
    level: course.level as CourseLevel,
    lessonCount: lessons.length,
    minutes: lessons.reduce((sum, l) => sum + l.minutes, 0),
    lessonsDone,
    progress: lessonsDone === null ? null : lessons.length === 0 ? 0 : lessonsDone / lessons.length,
  };
}

export function toLessonListItem(
  lesson: Lesson,
  courseSkills: Skill[],
  done: Set<number> | null,
  project: Project | null,
): LessonListItem {
  return {
    id: lesson.id,
    slug: lesson.slug,
    position: lesson.position,
    title: lesson.title,
    minutes: lesson.minutes,
    skills: lesson.skills.map((key) => courseSkills.find((s) => s.key === key) ?? { key, label: key }),
    done: done ? done.has(lesson.id) : null,
    project: project ? { id: project.id, title: project.title } : null,
  };
}

export const toProjectDTO = (p: Project): ProjectDTO => ({
  id: p.id,
  title: p.title,
  brief: p.brief,
  passMark: p.passMark,
  criteria: p.criteria,
});
