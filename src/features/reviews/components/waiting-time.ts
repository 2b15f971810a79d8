/** How long a piece has waited, in the largest whole unit: "45 minutes", "3 hours", "2 days". */
export function waitingFor(sentAt: string, now = Date.now()): string {
  const minutes = Math.max(0, Math.floor((now - new Date(sentAt).getTime()) / 60_000));
  const plural = (n: number, unit: string) => `${n} ${unit}${n === 1 ? '' : 's'}`;
  if (minutes < 60) return plural(minutes, 'minute');
  const hours = Math.floor(minutes / 60);
  if (hours < 48) return plural(hours, 'hour');
  return plural(Math.floor(hours / 24), 'day');
}
