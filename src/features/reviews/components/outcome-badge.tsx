import type { Outcome } from '@shared/schemas/submission';

/** Passed is the one place green appears; rework is amber. */
export function OutcomeBadge({ outcome }: { outcome: Outcome }) {
  return outcome === 'passed' ? (
    <span className="inline-flex items-center rounded-full border border-passed bg-passed px-3 py-0.5 text-sm font-semibold text-white">
      Passed
    </span>
  ) : (
    <span className="inline-flex items-center rounded-full border border-rework bg-card px-3 py-0.5 text-sm font-semibold text-rework">
      Rework
    </span>
  );
}
