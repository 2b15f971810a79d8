import { planting } from '@shared/calc/planting';
import { defineForm } from '../../lib/define-form';
import { num } from '../../lib/draft';
import { writeRows } from '../row-cells/json-rows';
import { EXAMPLE_ARBORS, arborInput, arborRows, blankArbor, type ArborRow } from './arbor-rows';
import { PlantingInputs } from './planting-inputs';
import { PlantingResultsView } from './planting-results';

const text = (v: number | undefined) => (v === undefined ? '' : String(v));

export const plantingForm = defineForm({
  calculator: planting,
  initial: { datumX: '0', datumY: '0', arbors: writeRows(EXAMPLE_ARBORS) },
  toInput: (d) => ({
    datum: { x: num(d.datumX) ?? 0, y: num(d.datumY) ?? 0 },
    arbors: arborRows(d).map(arborInput),
  }),
  fromInput: (input) => ({
    datumX: String(input.datum.x),
    datumY: String(input.datum.y),
    arbors: writeRows(
      input.arbors.map((a): ArborRow => {
        const row = { ...blankArbor('xy', a.name), pitch: text(a.pitchRadiusMm) };
        if ('x' in a) return { ...row, x: String(a.x), y: String(a.y) };
        if ('distance' in a) {
          return { ...row, how: 'polar', from: a.from, distance: String(a.distance), angle: String(a.angleDeg) };
        }
        return {
          ...row,
          how: 'two',
          fromA: a.from[0],
          fromB: a.from[1],
          distA: String(a.distances[0]),
          distB: String(a.distances[1]),
          side: a.side,
        };
      }),
    ),
  }),
  Inputs: PlantingInputs,
  Results: PlantingResultsView,
});
