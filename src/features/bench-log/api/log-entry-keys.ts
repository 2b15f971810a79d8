import type { LogEntryFilters } from '@shared/schemas/log-entry';

/** Every bench-log query lives under `all`, so one invalidation refreshes lists, entries, summaries and panels. */
export const logEntryKeys = {
  all: ['log-entries'] as const,
  lists: () => [...logEntryKeys.all, 'list'] as const,
  list: (filters: LogEntryFilters & { page: number }) => [...logEntryKeys.lists(), filters] as const,
  detail: (id: number) => [...logEntryKeys.all, 'detail', id] as const,
  summary: (apprentice?: number) => [...logEntryKeys.all, 'summary', apprentice ?? 'mine'] as const,
  toRead: () => [...logEntryKeys.all, 'to-read'] as const,
  apprentices: () => [...logEntryKeys.all, 'apprentices'] as const,
  lessonOptions: ['log-entries-options', 'lessons'] as const,
  calculationOptions: ['log-entries-options', 'calculations'] as const,
};
