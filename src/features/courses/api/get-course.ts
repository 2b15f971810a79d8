import { queryOptions, useQuery } from '@tanstack/react-query';
import { CourseDetailReply } from '@shared/schemas/course';
import { api } from '@/lib/api-client';
import { courseKeys } from './course-keys';

export const getCourse = (slug: string) => api(`/courses/${encodeURIComponent(slug)}`, { schema: CourseDetailReply });

export const courseQueryOptions = (slug: string) =>
  queryOptions({ queryKey: courseKeys.detail(slug), queryFn: () => getCourse(slug) });

export const useCourse = (slug: string) => useQuery(courseQueryOptions(slug));
