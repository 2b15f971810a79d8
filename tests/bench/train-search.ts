import { searchTrains } from '@shared/calc/train-pendulum';

/** The reverse train search runs on every keystroke in the browser: it must answer within a frame or two. */
const BUDGET_MS = 50;

export function runTrainSearchBench(): boolean {
  let worst = 0;
  for (const [target, pairs] of [
    [5400, 2],
    [8100, 3],
    [14400, 3],
    [3600, 4],
  ]) {
    searchTrains(target, pairs, 10); // warm up
    const started = performance.now();
    for (let i = 0; i < 5; i++) searchTrains(target, pairs, 10);
    worst = Math.max(worst, (performance.now() - started) / 5);
  }
  const ok = worst <= BUDGET_MS;
  console.log(
    `Train search (best ten): worst ${worst.toFixed(1)} ms per search (budget ${BUDGET_MS} ms) ${ok ? 'OK' : 'OVER BUDGET'}`,
  );
  return ok;
}
