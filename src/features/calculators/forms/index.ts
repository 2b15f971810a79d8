import type { CalculatorName } from '@shared/calc/names';
import type { AnyCalculatorForm } from '../lib/define-form';
import { inputToDraft, type Draft } from '../lib/draft';
import { broachTaperForm } from './broach-taper';
import { pivotBurnishForm } from './pivot-burnish';
import { springTemperForm } from './spring-temper';
import { wheelPinionForm } from './wheel-pinion';
import { trainPendulumForm } from './train-pendulum';
import { fuseeForm } from './fusee';
import { dividingForm } from './dividing';
import { plantingForm } from './planting';

/**
 * The calculators that have a form. A calculator without one is listed on the index but not linked, and its page
 * and lesson widget say the form is still to come.
 */
export const FORMS: Partial<Record<CalculatorName, AnyCalculatorForm>> = {
  'broach-taper': broachTaperForm,
  'pivot-burnish': pivotBurnishForm,
  'spring-temper': springTemperForm,
  'wheel-pinion': wheelPinionForm,
  'train-pendulum': trainPendulumForm,
  fusee: fuseeForm,
  dividing: dividingForm,
  planting: plantingForm,
};

/** A saved result's inputs as the draft its form reopens with. */
export function draftFromSaved(form: AnyCalculatorForm, inputs: Record<string, unknown>): Draft {
  return form.fromInput ? form.fromInput(inputs) : inputToDraft(inputs);
}
