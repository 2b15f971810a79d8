import { useMutation, useQueryClient } from '@tanstack/react-query';
import { MeReply, type AccountUpdateInput, type PasswordChangeInput } from '@shared/schemas/user';
import { api } from '@/lib/api-client';
import { authKeys } from './auth-keys';

export function useUpdateAccount() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: AccountUpdateInput) => api('/account', { method: 'PATCH', body: input, schema: MeReply }),
    // The whole app reads the name and unit preference from the signed-in user, so replacing it updates every page.
    onSuccess: ({ user }) => qc.setQueryData(authKeys.me, user),
  });
}

export function useChangePassword() {
  return useMutation({
    mutationFn: (input: PasswordChangeInput) => api('/account/password', { method: 'POST', body: input }),
  });
}
