import * as z from 'zod/mini';
import { isCalculatorName } from '../calc/names';
import { QueryId } from './query';

export const CalculationTitle = z
  .string()
  .check(
    z.trim(),
    z.minLength(1, 'Give the result a title.'),
    z.maxLength(120, 'Keep the title under 120 characters.'),
  );

/** What the client sends to save a result: only the inputs, never the results (the server recomputes them). */
export const CalculationCreateInput = z.object({
  calculator: z.string().check(z.refine(isCalculatorName, 'There is no calculator by that name.')),
  inputs: z.record(z.string(), z.unknown()),
  title: z.optional(CalculationTitle),
});
export type CalculationCreateInput = z.infer<typeof CalculationCreateInput>;

export const CalculationListQuery = z.object({
  /** Mentors and the guild office read an apprentice's saved results; apprentices read their own. */
  apprentice: QueryId,
});
export type CalculationListQuery = z.infer<typeof CalculationListQuery>;

export const CalculationDTO = z.object({
  id: z.int(),
  userId: z.int(),
  calculator: z.string(),
  title: z.string(),
  inputs: z.record(z.string(), z.unknown()),
  results: z.unknown(),
  warnings: z.array(z.string()),
  createdAt: z.string(),
});
export type CalculationDTO = z.infer<typeof CalculationDTO>;

export const CalculationList = z.object({ calculations: z.array(CalculationDTO) });
export type CalculationList = z.infer<typeof CalculationList>;
