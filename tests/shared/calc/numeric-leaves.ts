/** Every number inside a calculator result, however deeply nested, so a property can check they are all finite. */
export function numericLeaves(value: unknown): number[] {
  if (typeof value === 'number') return [value];
  if (Array.isArray(value)) return value.flatMap(numericLeaves);
  if (value !== null && typeof value === 'object') return Object.values(value).flatMap(numericLeaves);
  return [];
}
