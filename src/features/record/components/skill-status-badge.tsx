import type { SkillStatus } from '@shared/schemas/record';

// Green stays with "passed" pieces alone; a signed-off skill wears the brass of the guild.
const LOOK: Record<SkillStatus, { label: string; className: string }> = {
  'not-started': { label: 'Not started', className: 'border-rule bg-paper text-muted' },
  gathering: { label: 'Gathering evidence', className: 'border-steel/40 bg-steel/10 text-steel' },
  ready: { label: 'Ready for sign-off', className: 'border-brass bg-card text-brass-dark' },
  'signed-off': { label: 'Signed off', className: 'border-brass-dark bg-brass-dark text-white' },
};

export function SkillStatusBadge({ status }: { status: SkillStatus }) {
  const look = LOOK[status];
  return (
    <span
      className={`inline-flex items-center rounded-full border px-3 py-0.5 text-sm font-semibold whitespace-nowrap ${look.className}`}
    >
      {look.label}
    </span>
  );
}
