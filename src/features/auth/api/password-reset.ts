import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { PasswordResetRequested, type PasswordResetInput, type PasswordResetRequest } from '@shared/schemas/user';
import { api } from '@/lib/api-client';
import { authKeys } from './auth-keys';

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (input: PasswordResetRequest) =>
      api('/auth/password-reset', { method: 'POST', body: input, schema: PasswordResetRequested }),
  });
}

export function useResetPassword(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: PasswordResetInput) =>
      api(`/auth/password-reset/${encodeURIComponent(token)}`, { method: 'POST', body: input }),
    // Every session of the account has just ended, this browser's included.
    onSuccess: () => {
      qc.clear();
      qc.setQueryData(authKeys.me, null);
    },
  });
}

/** Whether a reset link is still open: the page asks before showing the form (a spent link answers 410). */
export const useResetLinkCheck = (token: string) =>
  useQuery({
    queryKey: ['auth', 'password-reset', token],
    queryFn: () => api(`/auth/password-reset/${encodeURIComponent(token)}`).then(() => true),
    staleTime: Infinity,
  });
