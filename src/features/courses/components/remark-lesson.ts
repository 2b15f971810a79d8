import type { Heading, Paragraph, Root, Text } from 'mdast';
import { visit } from 'unist-util-visit';
import { nodeText, uniqueHeadingIds } from '@shared/content/heading-ids';

interface RemarkLessonOptions {
  /** Where the course's images/ folder is served, e.g. /api/content/<course>/images/. */
  imageBase: string;
}

/**
 * Turns the lesson dialect into plain elements the page maps to components: `:::caution` becomes an <aside>,
 * `::calculator{name}` an empty <div data-calculator>, a lone image a <figure> with its title as caption, and
 * every heading gets the id the server lists in the outline.
 */
export function remarkLesson({ imageBase }: RemarkLessonOptions) {
  return (tree: Root) => {
    const headings: Heading[] = [];
    visit(tree, (node, index, parent) => {
      switch (node.type) {
        case 'heading':
          headings.push(node);
          break;
        case 'containerDirective':
          node.data = node.name === 'caution' ? { hName: 'aside' } : { hName: 'div' };
          break;
        case 'leafDirective':
          node.data =
            node.name === 'calculator'
              ? { hName: 'div', hProperties: { dataCalculator: node.attributes?.name ?? '' }, hChildren: [] }
              : { hName: 'p' };
          break;
        case 'textDirective': {
          // Usually a colon typed straight before a word ("ratio:one"): show what was written.
          if (!parent || index === undefined) break;
          const text: Text = { type: 'text', value: `:${node.name}${nodeText(node)}` };
          parent.children.splice(index, 1, text);
          return index + 1;
        }
        case 'image':
          if (node.url.startsWith('images/')) node.url = imageBase + node.url.slice('images/'.length);
          break;
        case 'paragraph':
          toFigure(node);
          break;
      }
    });
    const ids = uniqueHeadingIds(headings.map((h) => nodeText(h).trim()));
    headings.forEach((h, i) => {
      h.data = { ...h.data, hProperties: { ...h.data?.hProperties, id: ids[i] } };
    });
  };
}

/** A paragraph holding only an image is a figure; the image's title is its caption. */
function toFigure(paragraph: Paragraph) {
  const parts = paragraph.children.filter((c) => !(c.type === 'text' && c.value.trim() === ''));
  const image = parts[0];
  if (parts.length !== 1 || image.type !== 'image') return;
  paragraph.data = { hName: 'figure' };
  if (image.title) {
    paragraph.children = [
      image,
      { type: 'emphasis', data: { hName: 'figcaption' }, children: [{ type: 'text', value: image.title }] },
    ];
  }
}
