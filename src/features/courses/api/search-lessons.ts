import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { SearchReply } from '@shared/schemas/course';
import { api } from '@/lib/api-client';
import { courseKeys } from './course-keys';

export const searchLessons = (q: string) => api(`/search?q=${encodeURIComponent(q)}`, { schema: SearchReply });

export const lessonSearchQueryOptions = (q: string) =>
  queryOptions({
    queryKey: courseKeys.search(q),
    queryFn: () => searchLessons(q),
    enabled: q.trim().length >= 2,
    placeholderData: keepPreviousData,
  });

export const useLessonSearch = (q: string) => useQuery(lessonSearchQueryOptions(q));
