import type { LogEntryFilters } from '@shared/schemas/log-entry';

/** The filters as a query string (with a leading "?" when any is set), in the names the API takes. */
export function filterQuery(filters: LogEntryFilters & { page?: number }): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters)) {
    if (value !== undefined && value !== '' && !(key === 'page' && value === 1)) params.set(key, String(value));
  }
  const text = params.toString();
  return text ? `?${text}` : '';
}
