import { useMutation, useQueryClient } from '@tanstack/react-query';
import type * as z from 'zod/mini';
import { LogEntryDTO, type LogEntryCreateInput, type LogEntryPatch } from '@shared/schemas/log-entry';
import { api } from '@/lib/api-client';
import { logEntryKeys } from './log-entry-keys';

/** After any change the lists, the summary and the panels may all show it, so the whole family is refreshed. */
function useRefresh() {
  const qc = useQueryClient();
  return (entry?: LogEntryDTO) => {
    if (entry) qc.setQueryData(logEntryKeys.detail(entry.id), entry);
    return qc.invalidateQueries({ queryKey: logEntryKeys.all });
  };
}

export function useCreateLogEntry() {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: (input: z.input<typeof LogEntryCreateInput>) =>
      api('/log-entries', { method: 'POST', body: input, schema: LogEntryDTO }),
    onSuccess: (entry) => refresh(entry),
  });
}

export function useUpdateLogEntry(id: number) {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: (patch: LogEntryPatch) =>
      api(`/log-entries/${id}`, { method: 'PATCH', body: patch, schema: LogEntryDTO }),
    onSuccess: (entry) => refresh(entry),
  });
}

export function useDeleteLogEntry() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api(`/log-entries/${id}`, { method: 'DELETE' }),
    onSuccess: (_data, id) => {
      qc.removeQueries({ queryKey: logEntryKeys.detail(id) });
      return qc.invalidateQueries({ queryKey: logEntryKeys.all });
    },
  });
}
