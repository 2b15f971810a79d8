import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { calculationKeys } from './calculation-keys';

export function useDeleteCalculation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api(`/calculations/${id}`, { method: 'DELETE' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: calculationKeys.all }),
  });
}
