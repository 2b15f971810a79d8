import { queryOptions, useQuery } from '@tanstack/react-query';
import { LogApprentices, LogEntriesToRead, LogSummary } from '@shared/schemas/log-entry';
import { api } from '@/lib/api-client';
import { logEntryKeys } from './log-entry-keys';

export const logSummaryQueryOptions = (apprentice?: number) =>
  queryOptions({
    queryKey: logEntryKeys.summary(apprentice),
    queryFn: () => api(`/log-entries/summary${apprentice ? `?apprentice=${apprentice}` : ''}`, { schema: LogSummary }),
  });

/** Eight weeks of hours, this week's total and the totals per course. */
export const useLogSummary = (apprentice?: number) => useQuery(logSummaryQueryOptions(apprentice));

/** For a mentor: their apprentices' entries that nobody has graded yet. */
export const useEntriesToRead = () =>
  useQuery({
    queryKey: logEntryKeys.toRead(),
    queryFn: () => api('/log-entries/to-read', { schema: LogEntriesToRead }),
  });

/** For a mentor or the guild office: whose logs they may read. */
export const useLogApprentices = () =>
  useQuery({
    queryKey: logEntryKeys.apprentices(),
    queryFn: () => api('/log-entries/apprentices', { schema: LogApprentices }),
  });
