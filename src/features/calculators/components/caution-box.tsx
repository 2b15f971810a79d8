import { TriangleAlert } from 'lucide-react';
import type { ReactNode } from 'react';

/**
 * A safety caution, drawn like the `:::caution` blocks of the lessons: a ruled box with a warning sign. Used for the
 * cautions every calculator carries; lessons may use it for their own blocks.
 */
export function CautionBox({ title = 'Caution', children }: { title?: string; children: ReactNode }) {
  return (
    <aside
      aria-label={title}
      className="rounded-md border border-rework/50 border-l-4 border-l-rework bg-rework/5 p-4 text-ink print:break-inside-avoid"
    >
      <p className="flex items-center gap-2 font-serif text-lg font-semibold text-rework">
        <TriangleAlert className="size-5" aria-hidden />
        {title}
      </p>
      <div className="mt-2 text-sm leading-relaxed">{children}</div>
    </aside>
  );
}

/** A calculator's cautions as a list inside a caution box, with the deference to local rules the trade expects. */
export function CalculatorCautions({ cautions }: { cautions: readonly string[] }) {
  if (cautions.length === 0) return null;
  return (
    <CautionBox title="Caution at the bench">
      <ul className="list-disc space-y-1 pl-5">
        {cautions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </CautionBox>
  );
}
