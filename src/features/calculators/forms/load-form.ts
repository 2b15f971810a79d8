import { use } from 'react';
import type { CalculatorName } from '@shared/calc/names';
import type { AnyCalculatorForm } from '../lib/define-form';

// One chunk per calculator (its form, its pure function, its drawings): a page or lesson that shows one calculator
// downloads and runs only that one. The pages that list every calculator use FORMS from ./index instead.
const LOADERS: Record<CalculatorName, () => Promise<AnyCalculatorForm>> = {
  'broach-taper': () => import('./broach-taper').then((m) => m.broachTaperForm),
  'pivot-burnish': () => import('./pivot-burnish').then((m) => m.pivotBurnishForm),
  'spring-temper': () => import('./spring-temper').then((m) => m.springTemperForm),
  'wheel-pinion': () => import('./wheel-pinion').then((m) => m.wheelPinionForm),
  'train-pendulum': () => import('./train-pendulum').then((m) => m.trainPendulumForm),
  fusee: () => import('./fusee').then((m) => m.fuseeForm),
  dividing: () => import('./dividing').then((m) => m.dividingForm),
  planting: () => import('./planting').then((m) => m.plantingForm),
};

const loading = new Map<CalculatorName, Promise<AnyCalculatorForm>>();

/** Starts loading a calculator's form (once); route loaders call it so the chunk comes in parallel with the page's. */
export function loadForm(name: CalculatorName): Promise<AnyCalculatorForm> {
  let form = loading.get(name);
  if (!form) {
    form = LOADERS[name]();
    // A failed download (the network dropped) is tried again on the next visit rather than remembered.
    form.catch(() => loading.delete(name));
    loading.set(name, form);
  }
  return form;
}

/** The form of one calculator; suspends until its chunk has arrived. */
export const useCalculatorForm = (name: CalculatorName) => use(loadForm(name));
