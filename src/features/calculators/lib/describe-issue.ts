import type { Quantity } from '@shared/calc/types';
import type { UnitSystem } from '@shared/schemas/user';
import type { FieldIssue } from './draft';
import { formatNumber, toDisplay, unitLabel, withUnit } from './units';

/** A schema complaint in plain words, with any bound shown in the units the user is typing in. */
export function describeIssue(issue: FieldIssue, quantity: Quantity | undefined, system: UnitSystem): string {
  const bound = (v: number) => {
    const shown = quantity ? toDisplay(v, quantity, system) : v;
    return withUnit(formatNumber(shown, 6), quantity ? unitLabel(quantity, system) : '');
  };
  if (issue.code === 'invalid_type') return issue.expected === 'int' ? 'Enter a whole number.' : 'Enter a number.';
  if (issue.code === 'too_small' && issue.minimum !== undefined) {
    return issue.inclusive ? `Enter at least ${bound(issue.minimum)}.` : `Enter more than ${bound(issue.minimum)}.`;
  }
  if (issue.code === 'too_big' && issue.maximum !== undefined) {
    return issue.inclusive ? `Enter at most ${bound(issue.maximum)}.` : `Enter less than ${bound(issue.maximum)}.`;
  }
  return issue.message;
}
