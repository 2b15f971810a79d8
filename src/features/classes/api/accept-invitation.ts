import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { InvitationPreview, type AcceptInvitationInput } from '@shared/schemas/invitation';
import { MeReply } from '@shared/schemas/user';
import { api } from '@/lib/api-client';
import { authKeys } from '@/features/auth/api/auth-keys';
import { classKeys } from './class-keys';

/** What the link is for; a 410 here means the link is spent, withdrawn or out of date. */
export const useInvitationPreview = (token: string) =>
  useQuery({
    queryKey: classKeys.invitation(token),
    queryFn: () => api(`/invitations/${encodeURIComponent(token)}`, { schema: InvitationPreview }),
  });

export function useAcceptInvitation(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: AcceptInvitationInput) =>
      api(`/invitations/${encodeURIComponent(token)}/accept`, { method: 'POST', body: input, schema: MeReply }),
    onSuccess: ({ user }) => {
      // A new person is signed in: nothing cached for whoever used this browser before may remain.
      qc.clear();
      qc.setQueryData(authKeys.me, user);
    },
  });
}
