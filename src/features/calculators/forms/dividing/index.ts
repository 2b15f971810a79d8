import { dividing, PLATE_SETS } from '@shared/calc/dividing';
import { defineForm } from '../../lib/define-form';
import { list, num, type Draft } from '../../lib/draft';
import { DividingInputs } from './dividing-inputs';
import { DividingResults } from './dividing-results';
import { OWN_CIRCLES } from './plates';

function circles(d: Draft): number[] | undefined {
  if (d.plate === OWN_CIRCLES) return list(d.ownCircles) ?? [];
  return PLATE_SETS.find((p) => p.key === d.plate)?.circles ?? [];
}

export const dividingForm = defineForm({
  calculator: dividing,
  // TRADE.md §7 check value: 64 divisions is 10 holes on the 16 circle with the Brown & Sharpe plates (computed).
  initial: { teeth: '64', ratio: '40', plate: PLATE_SETS[0].key, ownCircles: '' },
  toInput: (d) => ({ teeth: num(d.teeth) as number, ratio: num(d.ratio), circles: circles(d) }),
  fromInput: (input) => {
    const set = PLATE_SETS.find((p) => p.circles.join(',') === input.circles.join(','));
    return {
      teeth: String(input.teeth),
      ratio: String(input.ratio),
      plate: set ? set.key : OWN_CIRCLES,
      ownCircles: set ? '' : input.circles.join(', '),
    };
  },
  Inputs: DividingInputs,
  Results: DividingResults,
});
