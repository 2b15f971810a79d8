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
  // The broaching lesson's example: Ruth's five-sided cutting broach reads 0.50 mm at the tip and 1.00 mm 25 mm along
  // (k = 0.02); a 2.0 mm plate opened from both faces to 1.05 mm at mid-plate for a 1.00 mm pivot.
  initial: {
    taperFrom: 'taper',
    taperPerMm: '0.02',
    d1Mm: '',
    d2Mm: '',
    spanMm: '25',
    ratio: '1:50',
    broachSides: '5',
    openedFrom: 'both',
    refDiameterMm: '0.5',
    targetDiameterMm: '1.05',
    plateThicknessMm: '2',
    pivotDiameterMm: '1',
    pivotLengthMm: '',
  },
  toInput: (d) => ({
    taperPerMm: taper(d) as number,
    refDiameterMm: num(d.refDiameterMm) as number,
    targetDiameterMm: num(d.targetDiameterMm) as number,
    plateThicknessMm: num(d.plateThicknessMm) as number,
    pivotDiameterMm: num(d.pivotDiameterMm) as number,
    broachSides: num(d.broachSides) as number,
    openedFrom: d.openedFrom === 'one' ? ('one' as const) : ('both' as const),
    pivotLengthMm: num(d.pivotLengthMm),
  }),
  fromInput: (input) => ({
    taperFrom: 'taper',
    taperPerMm: String(input.taperPerMm),
    broachSides: String(input.broachSides),
    openedFrom: input.openedFrom,
    refDiameterMm: String(input.refDiameterMm),
    targetDiameterMm: String(input.targetDiameterMm),
    plateThicknessMm: String(input.plateThicknessMm),
    pivotDiameterMm: String(input.pivotDiameterMm),
    pivotLengthMm: input.pivotLengthMm === undefined ? '' : String(input.pivotLengthMm),
  }),
  Inputs: BroachInputs,
  Results: BroachResults,
});
