import type { ReactNode } from 'react';
import { ApiError } from '@/lib/api-client';

export function Loading({ label = 'Loading…' }: { label?: string }) {
  return (
    <div role="status" className="flex items-center gap-3 py-8 text-muted">
      <span className="size-5 animate-spin rounded-full border-2 border-brass border-t-transparent" aria-hidden />
      {label}
    </div>
  );
}

export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded-lg border border-dashed border-rule bg-card/60 p-8 text-center">
      <p className="font-serif text-lg text-ink">{title}</p>
      {children && <div className="mt-2 text-muted">{children}</div>}
    </div>
  );
}

export function ErrorNotice({ error, title = 'That did not work' }: { error: unknown; title?: string }) {
  const message = error instanceof ApiError ? error.message : error instanceof Error ? error.message : String(error);
  return (
    <div role="alert" className="rounded-md border border-error/40 bg-error/5 p-4 text-error">
      <p className="font-semibold">{title}</p>
      <p className="text-sm">{message}</p>
    </div>
  );
}

/** A horizontal progress bar with its percentage for screen readers. */
export function ProgressBar({ value, label }: { value: number; label: string }) {
  const pct = Math.round(Math.max(0, Math.min(1, value)) * 100);
  return (
    <div
      role="progressbar"
      aria-label={label}
      aria-valuemin={0}
      aria-valuemax={100}
      aria-valuenow={pct}
      className="h-2 w-full overflow-hidden rounded-full bg-rule"
    >
      <div className="h-full rounded-full bg-brass transition-[width]" style={{ width: `${pct}%` }} />
    </div>
  );
}
