import { queryOptions, useQuery } from '@tanstack/react-query';
import { CourseListReply } from '@shared/schemas/course';
import { api } from '@/lib/api-client';
import { courseKeys } from './course-keys';

export const getCourses = () => api('/courses', { schema: CourseListReply });

export const coursesQueryOptions = () => queryOptions({ queryKey: courseKeys.list(), queryFn: getCourses });

export const useCourses = () => useQuery(coursesQueryOptions());
