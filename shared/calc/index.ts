import type { z } from 'zod';
import { broachTaper } from './broach-taper';
import { dividing } from './dividing';
import { fusee } from './fusee';
import { pivotBurnish } from './pivot-burnish';
import { planting } from './planting';
import { springTemper } from './spring-temper';
import { trainPendulum } from './train-pendulum';
import type { CalculatorName } from './names';
import type { Calculator } from './types';
import { wheelPinion } from './wheel-pinion';

/** Every bench calculator, keyed by its name (names.ts holds the names and their order). */
export const calculators = {
  'broach-taper': broachTaper,
  'pivot-burnish': pivotBurnish,
  'spring-temper': springTemper,
  'wheel-pinion': wheelPinion,
  'train-pendulum': trainPendulum,
  fusee,
  dividing,
  planting,
} as const satisfies Record<CalculatorName, unknown>;

/** A calculator seen without its own input and result types, for code that handles any of them by name. */
export type AnyCalculator = Calculator<z.ZodType, unknown>;

export function calculatorByName(name: CalculatorName): AnyCalculator {
  return calculators[name] as AnyCalculator;
}
