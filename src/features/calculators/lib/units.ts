import type { Quantity } from '@shared/calc/types';
import type { UnitSystem } from '@shared/schemas/user';
import { cToF, fToC, gToOunce, inchToMm, mmToInch, ounceToG } from '@shared/units/convert';

interface Conversion {
  metric: string;
  imperial: string;
  /** From the calculator's unit (mm, °C, g) to the imperial one, and back. */
  out: (v: number) => number;
  back: (v: number) => number;
}

// Only these three follow the unit toggle (see shared/units/convert.ts); every other quantity keeps one unit.
const CONVERTED: Partial<Record<Quantity, Conversion>> = {
  length: { metric: 'mm', imperial: 'in', out: mmToInch, back: inchToMm },
  temperature: { metric: '°C', imperial: '°F', out: cToF, back: fToC },
  mass: { metric: 'g', imperial: 'oz', out: gToOunce, back: ounceToG },
};

const FIXED: Record<Quantity, string> = {
  length: 'mm',
  temperature: '°C',
  mass: 'g',
  angle: '°',
  force: 'N',
  torque: 'N·mm',
  stress: 'MPa',
  modulus: 'GPa',
  ratio: '',
  count: '',
  speed: 'm/min',
  rpm: 'rpm',
  acceleration: 'm/s²',
  time: 's',
};

export function unitLabel(quantity: Quantity, system: UnitSystem): string {
  const c = CONVERTED[quantity];
  return c ? c[system] : FIXED[quantity];
}

/**
 * Figures shown in an input box after conversion: what a bench measures, not the float's last digit. The draft keeps
 * the exact mm, °C or g until the box is edited, so nothing is lost by showing fewer.
 */
export const INPUT_FIGURES = 5;

/** A value in the calculator's unit shown in the user's unit system. */
export function toDisplay(value: number, quantity: Quantity, system: UnitSystem): number {
  const c = CONVERTED[quantity];
  return c && system === 'imperial' ? c.out(value) : value;
}

/** A value typed in the user's unit system, back in the calculator's unit. */
export function fromDisplay(value: number, quantity: Quantity, system: UnitSystem): number {
  const c = CONVERTED[quantity];
  return c && system === 'imperial' ? c.back(value) : value;
}

/**
 * A number for the screen: significant figures rather than fixed decimals, because the calculators span 0.01 mm
 * shakes and 10 000 rpm spindles. Anything not finite is a dash, never "NaN" or "Infinity".
 */
export function formatNumber(value: number, significant = 4): string {
  if (!Number.isFinite(value)) return '—';
  const rounded = Number(value.toPrecision(significant));
  return Math.abs(rounded) >= 10_000 ? rounded.toLocaleString('en-GB').replace(/,/g, '\u2009') : String(rounded);
}

/**
 * A number to fixed decimals, for figures whose precision is what the bench measures (whole HRC, tilt to 0.01°,
 * fusee radii to 0.01 mm, pendulum length to 0.1 mm). Anything not finite is a dash.
 */
export function formatFixed(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return '—';
  const text = value.toFixed(decimals);
  // "-0.0" says nothing a plain 0 does not.
  return Number(text) === 0 ? (0).toFixed(decimals) : text;
}

/**
 * Decimals for a figure given to `metricDecimals` in the calculator's unit, in the user's unit: an inch is 25.4 mm, so
 * inches need two more places for the same step (0.01 mm ≈ 0.0004 in); °F and ounces keep the metric count.
 */
export function decimalsIn(quantity: Quantity, system: UnitSystem, metricDecimals: number): number {
  return quantity === 'length' && system === 'imperial' ? metricDecimals + 2 : metricDecimals;
}

/** Value and unit as one string; degrees sit on the figure, every other unit takes a thin gap. */
export function withUnit(text: string, unit: string): string {
  if (!unit) return text;
  return unit === '°' ? `${text}°` : `${text}\u00a0${unit}`;
}
