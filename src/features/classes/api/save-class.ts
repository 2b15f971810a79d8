import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ClassDTO, RosterReply, type ClassCreateInput, type ClassUpdateInput } from '@shared/schemas/class';
import { api } from '@/lib/api-client';
import { classKeys } from './class-keys';

export function useCreateClass() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: ClassCreateInput) => api('/classes', { method: 'POST', body: input, schema: ClassDTO }),
    onSuccess: () => qc.invalidateQueries({ queryKey: classKeys.all }),
  });
}

export function useUpdateClass(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: ClassUpdateInput) => api(`/classes/${id}`, { method: 'PATCH', body: input, schema: ClassDTO }),
    onSuccess: (cls) => {
      qc.setQueryData(classKeys.detail(id), cls);
      return qc.invalidateQueries({ queryKey: classKeys.all });
    },
  });
}

/** Withdraw keeps every piece of the apprentice's work; re-enrol brings them back into the class. */
export function useSetEnrolment(classId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, action }: { userId: number; action: 'withdraw' | 'reenrol' }) =>
      api(`/classes/${classId}/enrolments/${userId}/${action}`, { method: 'POST', schema: RosterReply }),
    onSuccess: (roster) => {
      qc.setQueryData(classKeys.roster(classId), roster);
      return qc.invalidateQueries({ queryKey: classKeys.all });
    },
  });
}
