/** A moment in the reader's own words and time zone, e.g. "3 Nov 2026, 14:05". */
export const when = (iso: string) =>
  new Date(iso).toLocaleString(undefined, {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
  });

/** A calendar date (YYYY-MM-DD) as "Tue 3 Nov 2026", without any time-zone shift. */
export const day = (date: string) =>
  new Date(`${date}T12:00:00`).toLocaleDateString(undefined, {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
  });
