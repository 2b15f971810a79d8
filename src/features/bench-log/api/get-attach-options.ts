import { useQuery } from '@tanstack/react-query';
import { CalculationList } from '@shared/schemas/calculation';
import { CourseDetailReply, CourseListReply } from '@shared/schemas/course';
import { api } from '@/lib/api-client';
import { logEntryKeys } from './log-entry-keys';

export interface LessonGroup {
  course: { id: number; title: string };
  lessons: { id: number; title: string; position: number }[];
}

/** Every live course with its lessons, for the lesson picker of an entry (two or three courses: one request each). */
async function getLessonGroups(): Promise<LessonGroup[]> {
  const { courses } = await api('/courses', { schema: CourseListReply });
  const details = await Promise.all(courses.map((c) => api(`/courses/${c.slug}`, { schema: CourseDetailReply })));
  return details.map((d) => ({
    course: { id: d.course.id, title: d.course.title },
    lessons: d.lessons.map((l) => ({ id: l.id, title: l.title, position: l.position })),
  }));
}

export const useLessonGroups = () =>
  useQuery({ queryKey: logEntryKeys.lessonOptions, queryFn: getLessonGroups, staleTime: 5 * 60_000 });

/** The apprentice's saved calculator results, newest first, to attach to an entry. */
export const useSavedResults = () =>
  useQuery({
    queryKey: logEntryKeys.calculationOptions,
    queryFn: async () => (await api('/calculations', { schema: CalculationList })).calculations,
  });
