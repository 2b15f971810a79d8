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
  // The fusee lesson's barrel: 30 mm inside with a 10 mm arbor and a 0.30 mm strip (TRADE.md §6: 1047.2 mm at half
  // fill, 7.869 turns), 32 mm outside with a 1.0 mm chain, and a fusee 10 mm at its largest radius.
  initial: {
    barrelDiameterMm: '30',
    arborDiameterMm: '10',
    springThicknessMm: '0.3',
    springLengthMm: '',
    springWidthMm: '',
    material: SPRING_STEEL,
    youngsModulusGPa: String(SPRING_STEEL_GPA),
    readings: writeRows(EXAMPLE_READINGS),
    maxRadiusMm: '10',
    chainRadiusMm: '',
    barrelOutsideDiameterMm: '32',
    chainThicknessMm: '1',
  },
  toInput: (d) => ({
    barrelDiameterMm: num(d.barrelDiameterMm),
    arborDiameterMm: num(d.arborDiameterMm),
    springThicknessMm: num(d.springThicknessMm),
    springLengthMm: num(d.springLengthMm),
    springWidthMm: num(d.springWidthMm),
    youngsModulusGPa: d.material === TYPED_MODULUS ? num(d.youngsModulusGPa) : SPRING_STEEL_GPA,
    readings: readingsInput(readingRows(d)),
    maxRadiusMm: num(d.maxRadiusMm),
    chainRadiusMm: num(d.chainRadiusMm),
    barrelOutsideDiameterMm: num(d.barrelOutsideDiameterMm),
    chainThicknessMm: num(d.chainThicknessMm),
  }),
  fromInput: (input) => ({
    barrelDiameterMm: text(input.barrelDiameterMm),
    arborDiameterMm: text(input.arborDiameterMm),
    springThicknessMm: text(input.springThicknessMm),
    springLengthMm: text(input.springLengthMm),
    springWidthMm: text(input.springWidthMm),
    material: input.youngsModulusGPa === SPRING_STEEL_GPA ? SPRING_STEEL : TYPED_MODULUS,
    youngsModulusGPa: String(input.youngsModulusGPa),
    readings: writeRows(input.readings.map((r) => ({ massG: String(r.massG), distanceMm: String(r.distanceMm) }))),
    maxRadiusMm: text(input.maxRadiusMm),
    chainRadiusMm: text(input.chainRadiusMm),
    barrelOutsideDiameterMm: text(input.barrelOutsideDiameterMm),
    chainThicknessMm: text(input.chainThicknessMm),
  }),
  Inputs: FuseeInputs,
  Results: FuseeResults,
});
