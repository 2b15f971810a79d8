import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { LogEntryDTO, LogEntryList, type LogEntryFilters } from '@shared/schemas/log-entry';
import { api } from '@/lib/api-client';
import { filterQuery } from '../lib/query-string';
import { logEntryKeys } from './log-entry-keys';

type ListFilters = LogEntryFilters & { page: number };

export const logEntriesQueryOptions = (filters: ListFilters) =>
  queryOptions({
    queryKey: logEntryKeys.list(filters),
    queryFn: () => api(`/log-entries${filterQuery(filters)}`, { schema: LogEntryList }),
    placeholderData: keepPreviousData,
  });

/** One page of a log, newest first: the signed-in apprentice's own, or the named apprentice's for their mentor. */
export const useLogEntries = (filters: ListFilters) => useQuery(logEntriesQueryOptions(filters));

export const logEntryQueryOptions = (id: number) =>
  queryOptions({
    queryKey: logEntryKeys.detail(id),
    queryFn: () => api(`/log-entries/${id}`, { schema: LogEntryDTO }),
  });

export const useLogEntry = (id: number) => useQuery(logEntryQueryOptions(id));
