import { createContext, useContext } from 'react';
import type { UnitSystem } from '@shared/schemas/user';
import type { Draft, FieldIssues } from '../lib/draft';

export interface CalcFormState {
  /** The form's fields as text, in the calculator's units (mm, °C, g). */
  draft: Draft;
  setField(name: string, value: string): void;
  setFields(values: Draft): void;
  /** Schema issues for the current draft, keyed by input name (and by path for lists: "readings.2.massG"). */
  issues: FieldIssues;
  unitSystem: UnitSystem;
}

export const CalcFormContext = createContext<CalcFormState | null>(null);

/** The form state of the calculator shell around this component. */
export function useCalcForm(): CalcFormState {
  const state = useContext(CalcFormContext);
  if (!state) throw new Error('useCalcForm outside a CalculatorShell');
  return state;
}
