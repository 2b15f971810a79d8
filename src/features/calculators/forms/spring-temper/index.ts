import { CLICK_SPRING_MATERIALS, springTemper, type SpringTemperInput } from '@shared/calc/spring-temper';
import { defineForm } from '../../lib/define-form';
import { num, type Draft } from '../../lib/draft';
import { TYPED_MATERIAL } from './material';
import { SpringInputs } from './spring-inputs';
import { SpringResults } from './spring-results';

function clickSpringMaterial(d: Draft) {
  if (d.material === TYPED_MATERIAL) {
    return { youngsModulusGPa: num(d.youngsModulusGPa), yieldStrengthMPa: num(d.yieldStrengthMPa) };
  }
  const m = CLICK_SPRING_MATERIALS.find((x) => x.id === d.material);
  return m ? { youngsModulusGPa: m.youngsModulusGPa, yieldStrengthMPa: m.yieldStrengthMPa } : { youngsModulusGPa: NaN };
}

function toInput(d: Draft): SpringTemperInput {
  if (d.mode === 'brass') return { mode: 'brass', numbersHard: num(d.numbersHard) as number };
  if (d.mode === 'click-spring') {
    return {
      mode: 'click-spring',
      widthMm: num(d.widthMm) as number,
      thicknessMm: num(d.thicknessMm) as number,
      lengthMm: num(d.lengthMm) as number,
      deflectionMm: num(d.deflectionMm) as number,
      ...clickSpringMaterial(d),
    };
  }
  return {
    mode: 'steel',
    steel: (d.steel || undefined) as 'O1' | undefined,
    temperatureC: num(d.temperatureC),
    colour: d.colour || undefined,
  };
}

const text = (v: number | string | null | undefined) => (v === undefined || v === null ? '' : String(v));

export const springTemperForm = defineForm({
  calculator: springTemper,
  // Click-spring starting values are TRADE.md §3d's first check row: b = 2, t = 0.3, L = 20, δ = 1 mm, E = 206 GPa,
  // in hardened and tempered spring steel.
  initial: {
    mode: 'steel',
    steel: 'O1',
    temperatureC: '230',
    colour: '',
    numbersHard: '2',
    widthMm: '2',
    thicknessMm: '0.3',
    lengthMm: '20',
    deflectionMm: '1',
    material: 'spring-steel',
    youngsModulusGPa: '206',
    yieldStrengthMPa: '',
  },
  toInput,
  fromInput: (input): Draft => {
    if (input.mode === 'steel') {
      return { mode: 'steel', steel: input.steel, temperatureC: text(input.temperatureC), colour: text(input.colour) };
    }
    if (input.mode === 'brass') return { mode: 'brass', numbersHard: String(input.numbersHard) };
    const m = CLICK_SPRING_MATERIALS.find(
      (x) => x.youngsModulusGPa === input.youngsModulusGPa && x.yieldStrengthMPa === input.yieldStrengthMPa,
    );
    return {
      mode: 'click-spring',
      widthMm: String(input.widthMm),
      thicknessMm: String(input.thicknessMm),
      lengthMm: String(input.lengthMm),
      deflectionMm: String(input.deflectionMm),
      material: m?.id ?? TYPED_MATERIAL,
      youngsModulusGPa: String(input.youngsModulusGPa),
      yieldStrengthMPa: text(input.yieldStrengthMPa),
    };
  },
  Inputs: SpringInputs,
  Results: SpringResults,
});
