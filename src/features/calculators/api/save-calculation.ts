import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { CalculationDTO, type CalculationCreateInput } from '@shared/schemas/calculation';
import { api } from '@/lib/api-client';
import { calculationKeys } from './calculation-keys';

/** Sends the inputs only; the server computes the results it stores. */
export function useSaveCalculation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: z.input<typeof CalculationCreateInput>) =>
      api('/calculations', { method: 'POST', body: input, schema: CalculationDTO }),
    onSuccess: () => qc.invalidateQueries({ queryKey: calculationKeys.all }),
  });
}
