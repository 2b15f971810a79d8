import { useMutation, useQueryClient } from '@tanstack/react-query';
import { LessonDoneReply } from '@shared/schemas/course';
import { api } from '@/lib/api-client';
import { courseKeys } from './course-keys';

export const markLessonDone = ({ lessonId, done }: { lessonId: number; done: boolean }) =>
  api(`/lessons/${lessonId}/done`, { method: done ? 'PUT' : 'DELETE', schema: LessonDoneReply });

/** The lesson, its course page, the course cards and Today all show the mark, so all of them are refreshed. */
export function useMarkLessonDone() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markLessonDone,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: courseKeys.all }),
  });
}
