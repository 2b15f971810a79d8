import type { CalcStep } from './types';

/** Barrel fill and spring stiffness: the mainspring half of the fusee calculator, which needs the barrel's sizes. */

const num = (n: number) => String(Number(n.toPrecision(5)));

/** Coils against the barrel wall and on the arbor, and the turns between, for a strip of area L·t. */
export function barrelFill(R: number, r: number, t: number, L: number) {
  const area = (L * t) / Math.PI;
  const coilsRunDown = (R - Math.sqrt(Math.max(0, R * R - area))) / t;
  const coilsWoundUp = (Math.sqrt(r * r + area) - r) / t;
  return { coilsRunDown, coilsWoundUp, turns: coilsWoundUp - coilsRunDown };
}

/** The length that fills half the free area of the barrel, which gives the most turns. */
export const halfFillLength = (R: number, r: number, t: number) => (Math.PI * (R * R - r * r)) / (2 * t);

export function barrelFillSteps(
  R: number,
  r: number,
  t: number,
  given: boolean,
  fill: ReturnType<typeof barrelFill>,
): CalcStep[] {
  return [
    {
      label: given ? 'Length at half fill, for comparison' : 'Spring length (half the free area)',
      formula: `L = π(R² − r²)/(2t) = π(${num(R)}² − ${num(r)}²) / (2 × ${num(t)}) mm`,
      result: `${num(halfFillLength(R, r, t))} mm`,
    },
    {
      label: 'Coils run down (against the barrel)',
      formula: 'n_d = [R − √(R² − Lt/π)]/t',
      result: num(fill.coilsRunDown),
    },
    { label: 'Coils wound up (on the arbor)', formula: 'n_u = [√(r² + Lt/π) − r]/t', result: num(fill.coilsWoundUp) },
    {
      label: 'Turns of the barrel',
      formula: `N = n_u − n_d = ${num(fill.coilsWoundUp)} − ${num(fill.coilsRunDown)}`,
      result: `${num(fill.turns)} turns`,
    },
  ];
}

/** Beam-theory stiffness of the strip, k = E·b·t³/(12L), and the torque each turn adds, 2π·k. */
export function springStiffness(EGPa: number, b: number, t: number, L: number) {
  const k = (EGPa * 1000 * b * t ** 3) / (12 * L);
  const steps: CalcStep[] = [
    {
      label: 'Stiffness (beam theory)',
      formula: `k = E·b·t³/(12L) = ${num(EGPa * 1000)} N/mm² × ${num(b)} mm × (${num(t)} mm)³ / (12 × ${num(L)} mm)`,
      result: `${num(k)} N·mm/rad`,
    },
    { label: 'Torque added per turn', formula: 'M = 2π·k', result: `${num(2 * Math.PI * k)} N·mm` },
  ];
  return { stiffnessNmmPerRad: k, torquePerTurnNmm: 2 * Math.PI * k, steps };
}
