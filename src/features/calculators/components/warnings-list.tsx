import { TriangleAlert } from 'lucide-react';

/** The calculator's own warnings: inputs outside the trade's usual range, results worth a second look. */
export function WarningsList({ warnings }: { warnings: readonly string[] }) {
  if (warnings.length === 0) return null;
  return (
    <div role="status" className="mt-4 rounded-md border border-rework/40 bg-rework/5 p-3 text-sm text-ink">
      <p className="flex items-center gap-2 font-semibold text-rework">
        <TriangleAlert className="size-4" aria-hidden />
        Check before you go on
      </p>
      <ul className="mt-1 list-disc space-y-1 pl-6">
        {warnings.map((w) => (
          <li key={w}>{w}</li>
        ))}
      </ul>
    </div>
  );
}
