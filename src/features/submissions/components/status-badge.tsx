import type { SubmissionStatus } from '@shared/schemas/submission';

const LOOK: Record<SubmissionStatus, { label: string; className: string }> = {
  draft: { label: 'Draft', className: 'border-rule bg-paper text-muted' },
  waiting: { label: 'Waiting for review', className: 'border-steel/40 bg-steel/10 text-steel' },
  rework: { label: 'Rework', className: 'border-rework bg-card text-rework' },
  // Green is kept for this one state only.
  passed: { label: 'Passed', className: 'border-passed bg-passed text-white' },
};

export function StatusBadge({ status }: { status: SubmissionStatus }) {
  const look = LOOK[status];
  return (
    <span
      className={`inline-flex items-center rounded-full border px-3 py-0.5 text-sm font-semibold ${look.className}`}
    >
      {look.label}
    </span>
  );
}
