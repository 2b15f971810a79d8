import { fusee } from '@shared/calc/fusee';
import { defineForm } from '../../lib/define-form';
import { num } from '../../lib/draft';
import { writeRows } from '../row-cells/json-rows';
import { FuseeInputs } from './fusee-inputs';
import { FuseeResults } from './fusee-results';
import { EXAMPLE_READINGS, readingRows, readingsInput } from './readings';
import { SPRING_STEEL, SPRING_STEEL_GPA, TYPED_MODULUS } from './material';

const text = (v: number | undefined) => (v === undefined ? '' : String(v));

export const fuseeForm = defineForm({
  calculator: fusee,
  // TRADE.md §6 check value: barrel 30 mm, arbor 10 mm, strip 0.30 mm gives 1047.2 mm at half fill and 7.869 turns.
  initial: {
    barrelDiameterMm: '30',
    arborDiameterMm: '10',
    springThicknessMm: '0.3',
    springLengthMm: '',
    springWidthMm: '',
    material: SPRING_STEEL,
    youngsModulusGPa: String(SPRING_STEEL_GPA),
    readings: writeRows(EXAMPLE_READINGS),
    maxRadiusMm: '',
    barrelRadiusMm: '',
  },
  toInput: (d) => ({
    barrelDiameterMm: num(d.barrelDiameterMm) as number,
    arborDiameterMm: num(d.arborDiameterMm) as number,
    springThicknessMm: num(d.springThicknessMm) as number,
    springLengthMm: num(d.springLengthMm),
    springWidthMm: num(d.springWidthMm),
    youngsModulusGPa: d.material === TYPED_MODULUS ? num(d.youngsModulusGPa) : SPRING_STEEL_GPA,
    readings: readingsInput(readingRows(d)),
    maxRadiusMm: num(d.maxRadiusMm),
    barrelRadiusMm: num(d.barrelRadiusMm),
  }),
  fromInput: (input) => ({
    barrelDiameterMm: String(input.barrelDiameterMm),
    arborDiameterMm: String(input.arborDiameterMm),
    springThicknessMm: String(input.springThicknessMm),
    springLengthMm: text(input.springLengthMm),
    springWidthMm: text(input.springWidthMm),
    material: input.youngsModulusGPa === SPRING_STEEL_GPA ? SPRING_STEEL : TYPED_MODULUS,
    youngsModulusGPa: String(input.youngsModulusGPa),
    readings: writeRows(input.readings.map((r) => ({ massG: String(r.massG), distanceMm: String(r.distanceMm) }))),
    maxRadiusMm: text(input.maxRadiusMm),
    barrelRadiusMm: text(input.barrelRadiusMm),
  }),
  Inputs: FuseeInputs,
  Results: FuseeResults,
});
