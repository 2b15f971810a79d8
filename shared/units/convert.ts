/** Unit conversions for calculator inputs and results. Inside calculators: mm, °C, g. */
export const MM_PER_INCH = 25.4;
export const G_PER_OUNCE = 28.349523125;

export const mmToInch = (mm: number) => mm / MM_PER_INCH;
export const inchToMm = (inch: number) => inch * MM_PER_INCH;
export const cToF = (c: number) => (c * 9) / 5 + 32;
export const fToC = (f: number) => ((f - 32) * 5) / 9;
export const gToOunce = (g: number) => g / G_PER_OUNCE;
export const ounceToG = (oz: number) => oz * G_PER_OUNCE;
