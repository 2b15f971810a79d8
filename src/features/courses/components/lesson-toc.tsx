import type { OutlineHeading } from '@shared/schemas/course';

/** The lesson's ## and ### headings, linking to the ids the rendered headings carry. */
export function LessonToc({ outline }: { outline: OutlineHeading[] }) {
  const items = outline.filter((h) => h.depth === 2 || h.depth === 3);
  if (items.length === 0) return null;
  return (
    <nav aria-label="In this lesson" className="text-sm">
      <p className="mb-2 font-serif text-base font-semibold text-ink">In this lesson</p>
      <ol className="space-y-1 border-l-2 border-rule">
        {items.map((h) => (
          <li key={h.id} className={h.depth === 3 ? 'pl-6' : 'pl-3'}>
            <a href={`#${h.id}`} className="inline-block py-1 text-muted no-underline hover:text-steel">
              {h.text}
            </a>
          </li>
        ))}
      </ol>
    </nav>
  );
}
