import type { ComponentType } from 'react';
import type { z } from 'zod';
import type { CalcOutput, Calculator } from '@shared/calc/types';
import type { Draft } from './draft';

/** Everything the calculator shell needs to run one calculator; see the notes in calculator-shell.tsx. */
export interface CalculatorForm<S extends z.ZodType, R> {
  calculator: Calculator<S, R>;
  /** Starting values as draft text in the calculator's units; list every key the form reads. */
  initial: Draft;
  /** Draft to calculator input. Never throws: blank stays undefined and bad text becomes NaN, for the schema to report. */
  toInput(draft: Draft): z.input<S>;
  /** Saved inputs back to a draft, for reopening a saved result; without it each input becomes text as it is. */
  fromInput?(input: z.output<S>): Draft;
  /** The fields, built from NumberField, ChoiceField and friends; they read and write the shell's draft. */
  Inputs: ComponentType;
  /** The results of a valid draft: ResultRow lines, drawings, plots. `input` is the parsed input, defaults filled. */
  Results: ComponentType<{ output: CalcOutput<R>; input: z.output<S> }>;
}

export type AnyCalculatorForm = CalculatorForm<z.ZodType, unknown>;

/** Checks a form against its calculator's types, then files it under the one shape the shell and registry handle. */
export function defineForm<S extends z.ZodType, R>(form: CalculatorForm<S, R>): AnyCalculatorForm {
  return form as unknown as AnyCalculatorForm;
}
