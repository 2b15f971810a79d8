import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { AuditPage } from '@shared/schemas/audit';
import { api } from '@/lib/api-client';

export interface AuditFilters {
  actor?: string;
  action?: string;
  from?: string;
  to?: string;
  page: number;
}

export const auditKeys = {
  all: ['audit'] as const,
  page: (filters: AuditFilters) => [...auditKeys.all, filters] as const,
};

export const auditQueryOptions = (filters: AuditFilters) =>
  queryOptions({
    queryKey: auditKeys.page(filters),
    queryFn: () => {
      const params = new URLSearchParams();
      for (const [key, value] of Object.entries(filters)) if (value) params.set(key, String(value));
      return api(`/audit?${params}`, { schema: AuditPage });
    },
    placeholderData: keepPreviousData,
  });

export const useAudit = (filters: AuditFilters) => useQuery(auditQueryOptions(filters));
