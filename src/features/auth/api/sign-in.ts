import { useMutation, useQueryClient } from '@tanstack/react-query';
import { MeReply, type LoginInput } from '@shared/schemas/user';
import { api } from '@/lib/api-client';
import { authKeys } from './auth-keys';

export function useSignIn() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: LoginInput) => api('/auth/login', { method: 'POST', body: input, schema: MeReply }),
    onSuccess: ({ user }) => {
      qc.clear();
      qc.setQueryData(authKeys.me, user);
    },
  });
}

export function useSignOut() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api('/auth/logout', { method: 'POST' }),
    onSuccess: () => {
      qc.clear();
      qc.setQueryData(authKeys.me, null);
    },
  });
}
