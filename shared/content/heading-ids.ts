/**
 * Heading ids for a lesson: the server lists them in the table of contents and the client puts them on the rendered
 * headings, so both sides must derive them the same way from the same Markdown tree.
 */
interface TextLike {
  type: string;
  value?: unknown;
  alt?: unknown;
  children?: TextLike[];
}

/** The plain text of a Markdown node, the way a reader sees it (image alt text included, markup dropped). */
export function nodeText(node: TextLike): string {
  if (typeof node.value === 'string' && node.type !== 'html') return node.value;
  if (node.type === 'image' && typeof node.alt === 'string') return node.alt;
  return (node.children ?? []).map(nodeText).join('');
}

function slugify(text: string): string {
  const slug = text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return slug || 'section';
}

/** One id per heading text, in document order; repeats get -1, -2, ... so every id is unique on the page. */
export function uniqueHeadingIds(texts: string[]): string[] {
  const used = new Set<string>();
  return texts.map((text) => {
    const base = slugify(text);
    let id = base;
    for (let n = 1; used.has(id); n++) id = `${base}-${n}`;
    used.add(id);
    return id;
  });
}
