import { availableParallelism } from 'node:os';

/**
 * Re-encoding a 12-megapixel photo holds about a hundred megabytes of pixels and keeps a core busy; one job per core
 * (two to four) keeps memory bounded, and ten people uploading at once simply queue for a moment.
 */
const MAX_AT_ONCE = Math.max(2, Math.min(4, availableParallelism()));
let running = 0;
const waiting: (() => void)[] = [];

export async function withImageSlot<T>(work: () => Promise<T>): Promise<T> {
  // A finishing job hands its slot straight to the next in line, so the count never overshoots.
  if (running >= MAX_AT_ONCE) await new Promise<void>((resolve) => waiting.push(resolve));
  else running += 1;
  try {
    return await work();
  } finally {
    const next = waiting.shift();
    if (next) next();
    else running -= 1;
  }
}
