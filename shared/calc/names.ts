/**
 * The calculators' names as used in URLs, lesson directives and saved results, in the order of the calculators index
 * (the bench sequence of PRODUCT.md). Kept apart from the registry so that checking a name loads no calculator.
 */
export const CALCULATOR_NAMES = [
  'broach-taper',
  'pivot-burnish',
  'spring-temper',
  'wheel-pinion',
  'train-pendulum',
  'fusee',
  'dividing',
  'planting',
] as const;

export type CalculatorName = (typeof CALCULATOR_NAMES)[number];

export function isCalculatorName(name: string): name is CalculatorName {
  return (CALCULATOR_NAMES as readonly string[]).includes(name);
}
