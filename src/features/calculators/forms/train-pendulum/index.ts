import { trainPendulum, type TrainPendulumInput } from '@shared/calc/train-pendulum';
import { defineForm } from '../../lib/define-form';
import { num, type Draft } from '../../lib/draft';
import { cellNumber } from '../row-cells/json-rows';
import { STANDARD_GRAVITY_TEXT, joinCells, splitCells } from './train-cells';
import { TrainInputs } from './train-inputs';
import { TrainResults } from './train-results';

function pendulum(d: Draft): TrainPendulumInput['pendulum'] {
  if (d.pendulumKind === 'rod') return { kind: 'rod', rodLengthMm: num(d.rodLengthMm) as number };
  if (d.pendulumKind === 'rod-and-bob') {
    return {
      kind: 'rod-and-bob',
      rodLengthMm: num(d.rodLengthMm) as number,
      rodMassG: num(d.rodMassG) as number,
      bobMassG: num(d.bobMassG) as number,
      bobCentreMm: num(d.bobCentreMm) as number,
      bobRadiusMm: num(d.bobRadiusMm),
    };
  }
  return undefined;
}

const text = (v: number | undefined) => (v === undefined ? '' : String(v));

export const trainPendulumForm = defineForm({
  calculator: trainPendulum,
  // TRADE.md §5 check value: centre 80 → pinion 12, third 72 → escape pinion 8, escape 30 gives 3600 beats/h;
  // the 1.5 m uniform rod is the HyperPhysics check (1.000 m equivalent length).
  initial: {
    wheelTeeth: '80, 72',
    pinionLeaves: '12, 8',
    escapeTeeth: '30',
    gravity: STANDARD_GRAVITY_TEXT,
    targetBeatsPerHour: '',
    pendulumKind: 'none',
    rodLengthMm: '1500',
    rodMassG: '',
    bobMassG: '',
    bobCentreMm: '',
    bobRadiusMm: '',
  },
  toInput: (d) => ({
    wheelTeeth: splitCells(d.wheelTeeth).map(cellNumber),
    pinionLeaves: splitCells(d.pinionLeaves).map(cellNumber),
    escapeTeeth: num(d.escapeTeeth) as number,
    gravity: num(d.gravity),
    targetBeatsPerHour: num(d.targetBeatsPerHour),
    pendulum: pendulum(d),
  }),
  fromInput: (input) => {
    const p = input.pendulum;
    return {
      wheelTeeth: joinCells(input.wheelTeeth),
      pinionLeaves: joinCells(input.pinionLeaves),
      escapeTeeth: String(input.escapeTeeth),
      gravity: String(input.gravity),
      targetBeatsPerHour: text(input.targetBeatsPerHour),
      pendulumKind: p?.kind ?? 'none',
      rodLengthMm: text(p?.rodLengthMm),
      rodMassG: p?.kind === 'rod-and-bob' ? String(p.rodMassG) : '',
      bobMassG: p?.kind === 'rod-and-bob' ? String(p.bobMassG) : '',
      bobCentreMm: p?.kind === 'rod-and-bob' ? String(p.bobCentreMm) : '',
      bobRadiusMm: p?.kind === 'rod-and-bob' ? text(p.bobRadiusMm) : '',
    };
  },
  Inputs: TrainInputs,
  Results: TrainResults,
});
