/** Unit endings of result names in the calculators (e.g. insertionDepthMm), longest first so "Nmm" wins over "Mm". */
const UNIT_SUFFIXES: [string, string][] = [
  ['MPerMin', 'm/min'],
  ['NPerMm', 'N/mm'],
  ['Percent', '%'],
  ['Nmm', 'N·mm'],
  ['MPa', 'MPa'],
  ['GPa', 'GPa'],
  ['Rpm', 'rpm'],
  ['Deg', '°'],
  ['Mm', 'mm'],
  ['C', '°C'],
  ['F', '°F'],
  ['N', 'N'],
  ['S', 's'],
  ['G', 'g'],
];

function labelAndUnit(key: string): { label: string; unit: string } {
  const hit = UNIT_SUFFIXES.find(([suffix]) => key.endsWith(suffix) && key.length > suffix.length);
  const stem = hit ? key.slice(0, -hit[0].length) : key;
  const words = stem.replace(/([a-z0-9])([A-Z])/g, '$1 $2').toLowerCase();
  return { label: words.charAt(0).toUpperCase() + words.slice(1), unit: hit ? hit[1] : '' };
}

/**
 * The plain-number results of a saved calculation as "label, value with unit", for an entry's attached results.
 * Nested results (tables, lists) are left to the calculator's own page, which the entry links to.
 */
export function resultLines(results: unknown, limit = 6): { label: string; value: string }[] {
  if (!results || typeof results !== 'object') return [];
  return Object.entries(results as Record<string, unknown>)
    .filter((pair): pair is [string, number] => typeof pair[1] === 'number' && Number.isFinite(pair[1]))
    .slice(0, limit)
    .map(([key, value]) => {
      const { label, unit } = labelAndUnit(key);
      const figure = String(Number(value.toPrecision(4)));
      return { label, value: unit === '°' ? `${figure}°` : unit ? `${figure}\u00a0${unit}` : figure };
    });
}
