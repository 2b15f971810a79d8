import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import * as z from 'zod/mini';
import { UserListItem, UserListReply, type UserListQuery, type UserUpdateInput } from '@shared/schemas/user';
import { api } from '@/lib/api-client';

export const userKeys = {
  all: ['users'] as const,
  list: (query: UserListQuery) => [...userKeys.all, 'list', query] as const,
};

export const useUsers = (query: UserListQuery) =>
  useQuery({
    queryKey: userKeys.list(query),
    queryFn: () => {
      const params = new URLSearchParams({ page: String(query.page) });
      if (query.q) params.set('q', query.q);
      if (query.role) params.set('role', query.role);
      return api(`/users?${params}`, { schema: UserListReply });
    },
    placeholderData: keepPreviousData,
  });

export function useUpdateUser() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...input }: UserUpdateInput & { id: number }) =>
      api(`/users/${id}`, { method: 'PATCH', body: input, schema: z.object({ user: UserListItem }) }),
    onSuccess: () => qc.invalidateQueries({ queryKey: userKeys.all }),
  });
}
