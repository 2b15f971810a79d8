import type { z } from 'zod';

/** The physical quantities a calculator input or result can carry; the UI converts the convertible ones. */
export type Quantity =
  | 'length' // mm inside compute; the UI also offers inches
  | 'temperature' // °C inside compute; the UI also offers °F
  | 'angle' // degrees
  | 'force' // N
  | 'torque' // N·mm
  | 'stress' // MPa
  | 'modulus' // GPa
  | 'mass' // g inside compute; the UI also offers ounces
  | 'ratio' // dimensionless (mm per mm, percent is its own unit)
  | 'count'
  | 'speed' // m/min
  | 'rpm'
  | 'acceleration' // m/s²
  | 'time'; // s

/** One line of working shown to the user: what was computed, by which formula, and what came out. */
export interface CalcStep {
  label: string;
  formula: string;
  result: string;
}

export interface CalcOutput<R> {
  results: R;
  /** Plain sentences: an input outside the trade's usual range, or a result that should make the user stop and check. */
  warnings: string[];
  steps: CalcStep[];
}

/**
 * A bench calculator: pure, no I/O, the same function in the browser (live) and on the server (which recomputes
 * whatever it stores). `compute` parses its input with `inputSchema`, so defaults apply and bad input throws a ZodError.
 */
export interface Calculator<S extends z.ZodType = z.ZodType, R = Record<string, unknown>> {
  name: string;
  title: string;
  summary: string;
  inputSchema: S;
  compute(input: z.input<S>): CalcOutput<R>;
  /** What the formulas take for granted, in plain words. */
  assumptions: string[];
  /** Where the formulas and tables come from, named as in the trade reference. */
  sources: string[];
  /** Safety notes shown with the calculator; empty when the work it supports cannot hurt anyone. */
  cautions: string[];
}
