import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from '@/lib/api-client';

/** Puts the server's field errors (a 400 reply) beside the fields they name; reports whether any was placed. */
export function showFieldErrors<T extends FieldValues>(
  error: unknown,
  fields: Path<T>[],
  setError: UseFormSetError<T>,
): boolean {
  if (!(error instanceof ApiError) || !error.fields) return false;
  let placed = false;
  for (const name of fields) {
    const message = error.fields[name]?.[0];
    if (message) {
      setError(name, { type: 'server', message });
      placed = true;
    }
  }
  return placed;
}
