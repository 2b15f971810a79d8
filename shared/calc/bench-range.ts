/**
 * Ranges a bench figure normally falls in. Outside one the calculator still works the figure out, because odd work
 * exists, but it says the input is far from bench practice instead of printing a silly number plainly.
 */
export interface BenchRange {
  min: number;
  max: number;
}

/** Four significant figures, without trailing zeros: the way warnings and steps quote a figure. */
export const figure = (n: number) => String(Number(n.toPrecision(4)));

/** A figure with its unit; degrees sit on the figure (1.4°), every other unit takes a space (27.5 mm). */
export const withUnit = (n: number, unit: string) =>
  unit === '' ? figure(n) : `${figure(n)}${unit === '°' ? '' : ' '}${unit}`;

export const inBench = (value: number, range: BenchRange) => value >= range.min && value <= range.max;

/** The warning for a figure outside its bench range, or null when it lies inside. */
export function outsideBench(what: string, value: number, range: BenchRange, unit: string): string | null {
  if (inBench(value, range)) return null;
  const span = `${figure(range.min)}–${figure(range.max)}${unit === '' ? '' : ` ${unit}`}`;
  return `${what} of ${withUnit(value, unit)} is far outside bench practice (about ${span}): check the figure before trusting the result.`;
}

/** Adds each warning that is not null; keeps the calculators' warning lists free of if-blocks. */
export function pushWarnings(warnings: string[], ...found: (string | null)[]): void {
  for (const w of found) if (w !== null) warnings.push(w);
}
