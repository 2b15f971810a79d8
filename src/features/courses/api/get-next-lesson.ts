import { queryOptions, useQuery } from '@tanstack/react-query';
import { NextLessonReply } from '@shared/schemas/course';
import { api } from '@/lib/api-client';
import { courseKeys } from './course-keys';

export const getNextLesson = () => api('/lessons/next', { schema: NextLessonReply });

export const nextLessonQueryOptions = () => queryOptions({ queryKey: courseKeys.next(), queryFn: getNextLesson });

export const useNextLesson = () => useQuery(nextLessonQueryOptions());
