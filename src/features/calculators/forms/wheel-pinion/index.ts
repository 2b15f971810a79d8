import { wheelPinion } from '@shared/calc/wheel-pinion';
import { defineForm } from '../../lib/define-form';
import { num } from '../../lib/draft';
import { WheelPinionInputs } from './wheel-pinion-inputs';
import { WheelPinionResultsView } from './wheel-pinion-results';

export const wheelPinionForm = defineForm({
  calculator: wheelPinion,
  // TRADE.md §4 check values: m = 0.5, a 64-tooth wheel and an 8-leaf pinion, a = 18.00 mm.
  initial: { moduleMm: '0.5', wheelTeeth: '64', pinionLeaves: '8', pinionKind: 'leaf', trundleDiameterMm: '' },
  toInput: (d) => {
    const lantern = d.pinionKind === 'lantern';
    return {
      moduleMm: num(d.moduleMm) as number,
      wheelTeeth: num(d.wheelTeeth) as number,
      pinionLeaves: num(d.pinionLeaves) as number,
      pinionKind: lantern ? ('lantern' as const) : ('leaf' as const),
      trundleDiameterMm: lantern ? num(d.trundleDiameterMm) : undefined,
    };
  },
  Inputs: WheelPinionInputs,
  Results: WheelPinionResultsView,
});
