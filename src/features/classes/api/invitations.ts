import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import * as z from 'zod/mini';
import { InvitationListReply, InviteReply, RosterPreviewReply, type RosterRow } from '@shared/schemas/invitation';
import { api } from '@/lib/api-client';
import { classKeys } from './class-keys';

/** Open invitations of one class, or of every class when no id is given. */
export const usePendingInvitations = (classId?: number) =>
  useQuery({
    queryKey: classKeys.invitations(classId),
    queryFn: async () =>
      (await api(classId ? `/invitations?classId=${classId}` : '/invitations', { schema: InvitationListReply }))
        .invitations,
  });

/** Anything that invites or changes an invitation moves seats, counts and the roster: refresh them all. */
function useInvalidateClasses() {
  const qc = useQueryClient();
  return () => qc.invalidateQueries({ queryKey: classKeys.all });
}

export function useSendInvitations(classId: number) {
  const invalidate = useInvalidateClasses();
  return useMutation({
    mutationFn: (emails: string[]) =>
      api(`/classes/${classId}/invitations`, { method: 'POST', body: { emails }, schema: InviteReply }),
    onSuccess: invalidate,
  });
}

export function usePreviewRoster(classId: number) {
  return useMutation({
    mutationFn: (file: File) => {
      const form = new FormData();
      form.append('file', file);
      return api(`/classes/${classId}/roster/preview`, { method: 'POST', body: form, schema: RosterPreviewReply });
    },
  });
}

export function useImportRoster(classId: number) {
  const invalidate = useInvalidateClasses();
  return useMutation({
    mutationFn: (rows: RosterRow[]) =>
      api(`/classes/${classId}/roster/import`, { method: 'POST', body: { rows }, schema: InviteReply }),
    onSuccess: invalidate,
  });
}

export function useResendInvitation() {
  const invalidate = useInvalidateClasses();
  return useMutation({
    mutationFn: (id: number) =>
      api(`/invitations/${id}/resend`, { method: 'POST', schema: z.object({ mailed: z.boolean() }) }),
    onSuccess: invalidate,
  });
}

export function useRevokeInvitation() {
  const invalidate = useInvalidateClasses();
  return useMutation({
    mutationFn: (id: number) => api(`/invitations/${id}/revoke`, { method: 'POST' }),
    onSuccess: invalidate,
  });
}
