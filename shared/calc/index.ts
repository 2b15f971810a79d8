import type { z } from 'zod';
import { broachTaper } from './broach-taper';
import { dividing } from './dividing';
import { fusee } from './fusee';
import { pivotBurnish } from './pivot-burnish';
import { planting } from './planting';
import { springTemper } from './spring-temper';
import { trainPendulum } from './train-pendulum';
import type { Calculator } from './types';
import { wheelPinion } from './wheel-pinion';

/**
 * Every bench calculator, keyed by the name used in URLs, lesson directives and saved results. The key order is the
 * order of the calculators index: the bench sequence of PRODUCT.md.
 */
export const calculators = {
  'broach-taper': broachTaper,
  'pivot-burnish': pivotBurnish,
  'spring-temper': springTemper,
  'wheel-pinion': wheelPinion,
  'train-pendulum': trainPendulum,
  fusee,
  dividing,
  planting,
} as const;

export type CalculatorName = keyof typeof calculators;

/** A calculator seen without its own input and result types, for code that handles any of them by name. */
export type AnyCalculator = Calculator<z.ZodType, unknown>;

export const CALCULATOR_NAMES = Object.keys(calculators) as CalculatorName[];

export function isCalculatorName(name: string): name is CalculatorName {
  return Object.hasOwn(calculators, name);
}

export function calculatorByName(name: CalculatorName): AnyCalculator {
  return calculators[name] as AnyCalculator;
}
