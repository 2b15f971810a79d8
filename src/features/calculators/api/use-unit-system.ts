import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { toast } from 'sonner';
import { MeReply, type UnitSystem, type UserDTO } from '@shared/schemas/user';
import { authKeys } from '@/features/auth/api/auth-keys';
import { useMe } from '@/features/auth/api/get-me';
import { api } from '@/lib/api-client';

/**
 * The user's unit system, remembered on their account (PATCH /api/account). The switch shows at once; if the
 * server refuses, it goes back and says so. Without a signed-in user it is kept for the page only.
 */
export function useUnitSystem(): [UnitSystem, (next: UnitSystem) => void] {
  const qc = useQueryClient();
  const { data: user } = useMe();
  const [local, setLocal] = useState<UnitSystem>('metric');
  const mutation = useMutation({
    mutationFn: (unitSystem: UnitSystem) => api('/account', { method: 'PATCH', body: { unitSystem }, schema: MeReply }),
    onMutate: (unitSystem) => {
      const before = qc.getQueryData<UserDTO | null>(authKeys.me);
      if (before) qc.setQueryData<UserDTO>(authKeys.me, { ...before, unitSystem });
      return { before };
    },
    onError: (_err, _next, context) => {
      if (context?.before) qc.setQueryData(authKeys.me, context.before);
      toast.error('The unit choice could not be saved to your account.');
    },
    onSuccess: ({ user: saved }) => qc.setQueryData(authKeys.me, saved),
    onSettled: () => qc.invalidateQueries({ queryKey: authKeys.me }),
  });
  if (!user) return [local, setLocal];
  return [user.unitSystem, (next) => next !== user.unitSystem && mutation.mutate(next)];
}
