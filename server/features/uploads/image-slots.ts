/**
 * Decoding a 12-megapixel photo takes a few hundred megabytes and both cores; a handful at a time keeps memory bounded
 * while ten people uploading at once simply queue for a moment.
 */
const MAX_AT_ONCE = 3;
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
