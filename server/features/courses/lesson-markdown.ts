import type { Heading, Root, RootContent } from 'mdast';
import remarkDirective from 'remark-directive';
import remarkGfm from 'remark-gfm';
import remarkParse from 'remark-parse';
import { unified } from 'unified';
import { visit } from 'unist-util-visit';
import { nodeText, uniqueHeadingIds } from '@shared/content/heading-ids';

/** The same Markdown dialect the lesson page renders: GitHub-flavoured plus directives. */
const processor = unified().use(remarkParse).use(remarkGfm).use(remarkDirective);

export const parseLessonMarkdown = (body: string): Root => processor.parse(body);

export interface OutlineHeading {
  depth: number;
  text: string;
  id: string;
}

/** Every heading of a lesson with the id the page gives it. */
export function lessonOutline(tree: Root): OutlineHeading[] {
  const headings: Heading[] = [];
  visit(tree, 'heading', (h) => {
    headings.push(h);
  });
  const texts = headings.map((h) => nodeText(h).trim());
  const ids = uniqueHeadingIds(texts);
  return headings.map((h, i) => ({ depth: h.depth, text: texts[i], id: ids[i] }));
}

/** The readable text of a lesson without its headings (indexed separately) or embedded calculators. */
export function lessonPlainText(tree: Root): string {
  const blocks: string[] = [];
  const walk = (nodes: RootContent[]) => {
    for (const node of nodes) {
      if (node.type === 'heading' || node.type === 'leafDirective' || node.type === 'html') continue;
      if (node.type === 'containerDirective' || node.type === 'list' || node.type === 'blockquote') {
        walk(node.children as RootContent[]);
      } else if (node.type === 'listItem' || node.type === 'footnoteDefinition') {
        walk(node.children as RootContent[]);
      } else if (node.type === 'table') {
        for (const row of node.children) blocks.push(row.children.map((cell) => nodeText(cell).trim()).join(' · '));
      } else {
        const text = nodeText(node).replace(/\s+/g, ' ').trim();
        if (text) blocks.push(text);
      }
    }
  };
  walk(tree.children);
  return blocks.join('\n');
}
