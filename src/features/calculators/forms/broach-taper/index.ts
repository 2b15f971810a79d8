import { broachTaper, taperFromDiameters, taperFromRatio } from '@shared/calc/broach-taper';
import { defineForm } from '../../lib/define-form';
import { num, type Draft } from '../../lib/draft';
import { BroachInputs } from './broach-inputs';
import { BroachResults } from './broach-results';

/** Where the taper comes from: typed as mm per mm, two micrometer readings, or a ratio such as 1:50. */
export type TaperFrom = 'taper' | 'diameters' | 'ratio';

function taper(d: Draft): number | undefined {
  if (d.taperFrom === 'diameters') {
    const [d1, d2, span] = [num(d.d1Mm), num(d.d2Mm), num(d.spanMm)];
    if (d1 === undefined || d2 === undefined || span === undefined) return undefined;
    return taperFromDiameters(d1, d2, span) ?? NaN;
  }
  if (d.taperFrom === 'ratio') return d.ratio?.trim() ? (taperFromRatio(d.ratio) ?? NaN) : undefined;
  return num(d.taperPerMm);
}

export const broachTaperForm = defineForm({
  calculator: broachTaper,
  // TRADE.md §1 check values: k = 1/50, broach 0.50 mm at the mark, target 1.05 mm, 2.0 mm plate, 1.00 mm pivot.
  initial: {
    taperFrom: 'taper',
    taperPerMm: '0.02',
    d1Mm: '',
    d2Mm: '',
    spanMm: '25',
    ratio: '1:50',
    refDiameterMm: '0.5',
    targetDiameterMm: '1.05',
    plateThicknessMm: '2',
    pivotDiameterMm: '1',
  },
  toInput: (d) => ({
    taperPerMm: taper(d) as number,
    refDiameterMm: num(d.refDiameterMm) as number,
    targetDiameterMm: num(d.targetDiameterMm) as number,
    plateThicknessMm: num(d.plateThicknessMm) as number,
    pivotDiameterMm: num(d.pivotDiameterMm) as number,
  }),
  fromInput: (input) => ({
    taperFrom: 'taper',
    taperPerMm: String(input.taperPerMm),
    refDiameterMm: String(input.refDiameterMm),
    targetDiameterMm: String(input.targetDiameterMm),
    plateThicknessMm: String(input.plateThicknessMm),
    pivotDiameterMm: String(input.pivotDiameterMm),
  }),
  Inputs: BroachInputs,
  Results: BroachResults,
});
