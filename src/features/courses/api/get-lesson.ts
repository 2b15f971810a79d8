import { queryOptions, useQuery } from '@tanstack/react-query';
import { LessonReply } from '@shared/schemas/course';
import { api } from '@/lib/api-client';
import { courseKeys } from './course-keys';

export const getLesson = (courseSlug: string, lessonSlug: string) =>
  api(`/courses/${encodeURIComponent(courseSlug)}/lessons/${encodeURIComponent(lessonSlug)}`, {
    schema: LessonReply,
  });

export const lessonQueryOptions = (courseSlug: string, lessonSlug: string) =>
  queryOptions({
    queryKey: courseKeys.lesson(courseSlug, lessonSlug),
    queryFn: () => getLesson(courseSlug, lessonSlug),
  });

export const useLesson = (courseSlug: string, lessonSlug: string) =>
  useQuery(lessonQueryOptions(courseSlug, lessonSlug));
