import { queryOptions, useQuery } from '@tanstack/react-query';
import { CalculationList } from '@shared/schemas/calculation';
import { api } from '@/lib/api-client';
import { calculationKeys } from './calculation-keys';

export const getCalculations = async (apprenticeId?: number) =>
  (await api(apprenticeId ? `/calculations?apprentice=${apprenticeId}` : '/calculations', { schema: CalculationList }))
    .calculations;

export const calculationsQueryOptions = (apprenticeId?: number) =>
  queryOptions({ queryKey: calculationKeys.list(apprenticeId), queryFn: () => getCalculations(apprenticeId) });

/** Saved results: the signed-in user's own, or an apprentice's for their mentor or the guild office. */
export const useCalculations = (apprenticeId?: number) => useQuery(calculationsQueryOptions(apprenticeId));
