import { queryOptions, useQuery } from '@tanstack/react-query';
import { ClassDTO, ClassFormOptions, ClassListReply, RosterReply, type ClassListQuery } from '@shared/schemas/class';
import { api } from '@/lib/api-client';
import { classKeys } from './class-keys';

export const classesQueryOptions = (filters: ClassListQuery = {}) =>
  queryOptions({
    queryKey: classKeys.list(filters),
    queryFn: async () =>
      (await api(filters.archived ? `/classes?archived=${filters.archived}` : '/classes', { schema: ClassListReply }))
        .classes,
  });

/** The classes the signed-in user may see: all for the guild office, their own for mentors and apprentices. */
export const useClasses = (filters: ClassListQuery = {}) => useQuery(classesQueryOptions(filters));

export const classQueryOptions = (id: number) =>
  queryOptions({ queryKey: classKeys.detail(id), queryFn: () => api(`/classes/${id}`, { schema: ClassDTO }) });

export const useClass = (id: number) => useQuery(classQueryOptions(id));

export const useRoster = (id: number) =>
  useQuery({ queryKey: classKeys.roster(id), queryFn: () => api(`/classes/${id}/roster`, { schema: RosterReply }) });

export const useClassFormOptions = () =>
  useQuery({
    queryKey: classKeys.formOptions(),
    queryFn: () => api('/classes/form-options', { schema: ClassFormOptions }),
    staleTime: 60_000,
  });
