import type { CalculationDTO } from '@shared/schemas/calculation';
import type { Calculation } from './calculation.model';

export const toCalculationDTO = (c: Calculation): CalculationDTO => ({
  id: c.id,
  userId: c.userId,
  calculator: c.calculator,
  title: c.title,
  inputs: c.inputs,
  results: c.results,
  warnings: c.warnings,
  createdAt: c.createdAt.toISOString(),
});
