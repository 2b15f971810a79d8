import { Pause, Play, Square } from 'lucide-react';
import { Button } from '@/components/ui/button';
import { useBenchTimer } from '../lib/use-bench-timer';

const clock = (ms: number) => {
  const s = Math.floor(ms / 1000);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${Math.floor(s / 3600)}:${pad(Math.floor(s / 60) % 60)}:${pad(s % 60)}`;
};

/** Runs while the apprentice works, survives a reload, and on stop hands the whole minutes to the time fields. */
export function BenchTimer({ userId, onStop }: { userId: number; onStop: (minutes: number) => void }) {
  const timer = useBenchTimer(userId);
  const started = timer.running || timer.elapsedMs > 0;
  return (
    <div
      className="flex flex-wrap items-center gap-3 rounded-md border border-rule bg-paper px-3 py-2"
      role="group"
      aria-label="Bench timer"
    >
      <span className="num text-2xl" aria-live="off" title="Hours:minutes:seconds">
        {clock(timer.elapsedMs)}
      </span>
      <span className="sr-only" aria-live="polite">
        {timer.running ? 'Timer running' : started ? 'Timer paused' : 'Timer stopped'}
      </span>
      {timer.running ? (
        <Button variant="secondary" onClick={timer.pause}>
          <Pause className="size-4" aria-hidden />
          Pause
        </Button>
      ) : (
        <Button variant="secondary" onClick={timer.start}>
          <Play className="size-4" aria-hidden />
          {started ? 'Carry on' : 'Start timer'}
        </Button>
      )}
      {started && (
        <Button variant="secondary" onClick={() => onStop(timer.stop())}>
          <Square className="size-4" aria-hidden />
          Stop and use the time
        </Button>
      )}
    </div>
  );
}
