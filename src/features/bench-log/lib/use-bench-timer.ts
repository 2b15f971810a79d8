import { useCallback, useEffect, useState } from 'react';

interface TimerState {
  /** Epoch ms when the running stretch began; null while paused or stopped. */
  startedAt: number | null;
  /** Time from earlier stretches, in ms. */
  banked: number;
}

const STOPPED: TimerState = { startedAt: null, banked: 0 };

function read(key: string): TimerState {
  try {
    const raw = JSON.parse(localStorage.getItem(key) ?? 'null') as Partial<TimerState> | null;
    if (!raw) return STOPPED;
    const startedAt = typeof raw.startedAt === 'number' ? raw.startedAt : null;
    const banked = typeof raw.banked === 'number' && raw.banked >= 0 ? raw.banked : 0;
    return { startedAt, banked };
  } catch {
    return STOPPED;
  }
}

/**
 * A bench timer kept in localStorage (one per person on a shared tablet), so that it keeps running through a reload
 * or a closed tab: only the start time is stored, and the elapsed time is worked out from the clock.
 */
export function useBenchTimer(userId: number) {
  const key = `tickwright.bench-timer.${userId}`;
  const [state, setState] = useState<TimerState>(() => read(key));
  const [now, setNow] = useState(() => Date.now());

  useEffect(() => {
    if (state.startedAt === null) return;
    const tick = setInterval(() => setNow(Date.now()), 1000);
    return () => clearInterval(tick);
  }, [state.startedAt]);

  useEffect(() => {
    const onStorage = (e: StorageEvent) => e.key === key && setState(read(key));
    window.addEventListener('storage', onStorage);
    return () => window.removeEventListener('storage', onStorage);
  }, [key]);

  const save = useCallback(
    (next: TimerState) => {
      if (next.startedAt === null && next.banked === 0) localStorage.removeItem(key);
      else localStorage.setItem(key, JSON.stringify(next));
      setState(next);
      setNow(Date.now());
    },
    [key],
  );

  const elapsedAt = (at: number) => state.banked + (state.startedAt === null ? 0 : Math.max(0, at - state.startedAt));

  return {
    running: state.startedAt !== null,
    elapsedMs: elapsedAt(now),
    start: () => save({ startedAt: Date.now(), banked: state.banked }),
    pause: () => save({ startedAt: null, banked: elapsedAt(Date.now()) }),
    /** Stops and clears the timer; answers the whole minutes timed (at least 1). */
    stop: (): number => {
      const minutes = Math.max(1, Math.round(elapsedAt(Date.now()) / 60_000));
      save(STOPPED);
      return minutes;
    },
  };
}
