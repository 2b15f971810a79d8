import { queryOptions, useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
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

/** Fetches the next lesson once this one is on screen, so that "Next lesson" opens without waiting at the bench. */
export function usePrefetchLesson(courseSlug: string, lessonSlug: string | undefined) {
  const queryClient = useQueryClient();
  useEffect(() => {
    if (lessonSlug) void queryClient.prefetchQuery(lessonQueryOptions(courseSlug, lessonSlug));
  }, [queryClient, courseSlug, lessonSlug]);
}
