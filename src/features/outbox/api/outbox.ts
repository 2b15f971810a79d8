import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { OutboxMessageDTO, OutboxReply, type OutboxState } from '@shared/schemas/outbox';
import { api } from '@/lib/api-client';

export interface OutboxFilters {
  state?: OutboxState;
  page: number;
}

const outboxKeys = {
  all: ['outbox'] as const,
  page: (filters: OutboxFilters) => [...outboxKeys.all, filters] as const,
};

export const useOutbox = (filters: OutboxFilters) =>
  useQuery({
    queryKey: outboxKeys.page(filters),
    queryFn: () => {
      const params = new URLSearchParams({ page: String(filters.page) });
      if (filters.state) params.set('state', filters.state);
      return api(`/outbox?${params}`, { schema: OutboxReply });
    },
    placeholderData: keepPreviousData,
    // Mail still waiting changes state on its own: look again while any is queued.
    refetchInterval: (query) => ((query.state.data?.counts.queued ?? 0) > 0 ? 5000 : false),
  });

export function useResendMail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api(`/outbox/${id}/resend`, { method: 'POST', schema: OutboxMessageDTO }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: outboxKeys.all }),
  });
}
