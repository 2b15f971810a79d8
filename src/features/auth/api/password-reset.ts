import { useMutation, useQueryClient } from '@tanstack/react-query';
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
