import { useId, type ReactNode } from 'react';
import { TriangleAlert } from 'lucide-react';

/** A lesson's `:::caution` block: work that can hurt someone, set apart so it is read, not skimmed. */
export function CautionBlock({ children }: { children: ReactNode }) {
  const headingId = useId();
  return (
    <aside
      role="note"
      aria-labelledby={headingId}
      className="not-prose my-8 rounded-lg border-l-4 border-rework bg-rework/8 px-5 py-4 text-ink"
    >
      <p id={headingId} className="flex items-center gap-2 font-serif text-lg font-semibold text-ink">
        <TriangleAlert className="size-5 shrink-0 text-rework" aria-hidden />
        Caution
      </p>
      <div className="mt-2 space-y-3 leading-relaxed [&_a]:text-steel [&_strong]:font-semibold [&_ul]:list-disc [&_ul]:pl-5">
        {children}
      </div>
    </aside>
  );
}
