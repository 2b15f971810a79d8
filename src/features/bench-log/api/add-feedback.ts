import { useMutation, useQueryClient } from '@tanstack/react-query';
import type * as z from 'zod/mini';
import { LogEntryDTO, type LogCommentInput, type LogGradeInput } from '@shared/schemas/log-entry';
import { api } from '@/lib/api-client';
import { logEntryKeys } from './log-entry-keys';

/** A mentor's comment or grade; the reply is the whole entry with its feedback, which replaces the cached one. */
export function useAddFeedback(entryId: number) {
  const qc = useQueryClient();
  const onSuccess = (entry: LogEntryDTO) => {
    qc.setQueryData(logEntryKeys.detail(entryId), entry);
    return qc.invalidateQueries({ queryKey: logEntryKeys.all });
  };
  const comment = useMutation({
    mutationFn: (input: LogCommentInput) =>
      api(`/log-entries/${entryId}/comments`, { method: 'POST', body: input, schema: LogEntryDTO }),
    onSuccess,
  });
  const grade = useMutation({
    mutationFn: (input: z.input<typeof LogGradeInput>) =>
      api(`/log-entries/${entryId}/grades`, { method: 'POST', body: input, schema: LogEntryDTO }),
    onSuccess,
  });
  return { comment, grade };
}
