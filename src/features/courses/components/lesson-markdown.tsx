import { useMemo } from 'react';
import Markdown, { type Components, type Options } from 'react-markdown';
import remarkDirective from 'remark-directive';
import remarkGfm from 'remark-gfm';
import { CalculatorEmbed } from './calculator-embed';
import { CautionBlock } from './caution-block';
import { remarkLesson } from './remark-lesson';

/** Typography for reading at the bench: a column of about 70 characters, generous leading, the workshop palette. */
const LESSON_PROSE = [
  'prose prose-lg max-w-[70ch] text-ink',
  '[--tw-prose-body:var(--color-ink)] [--tw-prose-headings:var(--color-ink)] [--tw-prose-bold:var(--color-ink)]',
  '[--tw-prose-links:var(--color-steel)] [--tw-prose-bullets:var(--color-brass)] [--tw-prose-counters:var(--color-muted)]',
  '[--tw-prose-hr:var(--color-rule)] [--tw-prose-th-borders:var(--color-rule)] [--tw-prose-td-borders:var(--color-rule)]',
  '[--tw-prose-captions:var(--color-muted)] [--tw-prose-quote-borders:var(--color-brass)]',
  'prose-p:leading-[1.8] prose-li:leading-[1.75] prose-headings:font-serif prose-headings:scroll-mt-6',
  'prose-h2:border-b prose-h2:border-rule prose-h2:pb-1',
  'prose-table:text-base prose-th:bg-paper prose-th:px-3 prose-td:px-3 prose-td:align-top',
  'prose-figure:my-8 prose-img:mx-auto prose-img:rounded-md prose-img:border prose-img:border-rule prose-img:bg-white',
  'prose-figcaption:text-center prose-code:before:content-none prose-code:after:content-none',
  '[&_.footnotes]:mt-12 [&_.footnotes]:border-t [&_.footnotes]:border-rule [&_.footnotes]:pt-2 [&_.footnotes]:text-base',
  '[&_.footnotes_h2]:border-none [&_.footnotes_h2]:text-lg [&_sup_a]:no-underline [&_sup_a]:px-0.5',
  '[&_.contains-task-list]:list-none [&_.contains-task-list]:pl-0 [&_.task-list-item]:pl-0',
  '[&_.task-list-item_input]:mr-2 [&_.task-list-item_input]:size-4 [&_.task-list-item_input]:align-[-2px] [&_.task-list-item_input]:accent-brass',
].join(' ');

const components: Components = {
  aside: ({ children }) => <CautionBlock>{children}</CautionBlock>,
  div: ({ node: _node, ...props }) => {
    const name = (props as Record<string, unknown>)['data-calculator'];
    return typeof name === 'string' ? <CalculatorEmbed name={name} /> : <div {...props} />;
  },
  // A wide table scrolls on its own; the scroll area is named by its column headings so each one is distinct.
  table: ({ node, ...props }) => (
    <div className="overflow-x-auto" role="region" aria-label={`Table: ${headings(node)}`} tabIndex={0}>
      <table {...props} />
    </div>
  ),
  img: ({ node: _node, alt, ...props }) => <img alt={alt ?? ''} loading="lazy" {...props} />,
  // Checklists in a lesson are for the reader's eye; the boxes cannot be ticked, so they are not announced.
  input: ({ node: _node, ...props }) => <input {...props} aria-hidden />,
};

type HastNode = { type: string; tagName?: string; value?: string; children?: HastNode[] };

function hastText(node: HastNode): string {
  return node.value ?? (node.children ?? []).map(hastText).join('');
}

/** The text of a table's header cells, e.g. "How opened, Taper error". */
function headings(table: HastNode | undefined): string {
  const cells: string[] = [];
  const walk = (n: HastNode) => {
    if (n.tagName === 'th') cells.push(hastText(n).trim());
    else n.children?.forEach(walk);
  };
  if (table) walk(table);
  return cells.filter(Boolean).join(', ') || 'lesson table';
}

const remarkRehypeOptions = {
  footnoteLabel: 'Sources and notes',
  footnoteLabelProperties: { className: [] },
  footnoteBackLabel: (n: number) => `Back to the text of note ${n + 1}`,
};

/**
 * A lesson (or course introduction) rendered from its Markdown. Raw HTML in the text is never rendered:
 * react-markdown drops it, and no plugin here turns it back on.
 */
export function LessonMarkdown({ body, courseSlug }: { body: string; courseSlug: string }) {
  const remarkPlugins = useMemo<Options['remarkPlugins']>(
    () => [
      remarkGfm,
      remarkDirective,
      [remarkLesson, { imageBase: `/api/content/${encodeURIComponent(courseSlug)}/images/` }],
    ],
    [courseSlug],
  );
  return (
    <div className={LESSON_PROSE}>
      <Markdown remarkPlugins={remarkPlugins} remarkRehypeOptions={remarkRehypeOptions} components={components}>
        {body}
      </Markdown>
    </div>
  );
}
