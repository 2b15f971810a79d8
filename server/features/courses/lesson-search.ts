import MiniSearch from 'minisearch';
import type { SearchResult } from '@shared/schemas/course';
import type { CatalogueCourse } from './catalogue';

interface LessonDoc {
  id: number;
  title: string;
  headings: string;
  text: string;
  courseSlug: string;
  courseTitle: string;
  lessonSlug: string;
}

export interface LessonSearchIndex {
  search: MiniSearch<LessonDoc>;
  texts: Map<number, string>;
}

/** The full-text index of every live lesson, built with the catalogue when content is synced. */
export function buildSearchIndex(courses: CatalogueCourse[]): LessonSearchIndex {
  const docs: LessonDoc[] = courses.flatMap(({ course, lessons }) =>
    lessons.map(({ lesson, outline, text }) => ({
      id: lesson.id,
      title: lesson.title,
      headings: outline.map((h) => h.text).join('\n'),
      text,
      courseSlug: course.slug,
      courseTitle: course.title,
      lessonSlug: lesson.slug,
    })),
  );
  const search = new MiniSearch<LessonDoc>({
    fields: ['title', 'headings', 'text'],
    storeFields: ['title', 'courseSlug', 'courseTitle', 'lessonSlug'],
    searchOptions: {
      boost: { title: 4, headings: 2 },
      prefix: true,
      fuzzy: (term) => (term.length > 4 ? 0.2 : false),
    },
  });
  search.addAll(docs);
  return { search, texts: new Map(docs.map((d) => [d.id, d.text])) };
}

/** Ranked lessons for a query: every word must match where some lesson has them all, otherwise any word. */
export function searchLessons(index: LessonSearchIndex, query: string, limit = 20): SearchResult[] {
  const { search, texts } = index;
  let hits = search.search(query, { combineWith: 'AND' });
  if (hits.length === 0) hits = search.search(query, { combineWith: 'OR' });
  return hits.slice(0, limit).map((hit) => ({
    lessonId: hit.id as number,
    courseSlug: hit.courseSlug as string,
    courseTitle: hit.courseTitle as string,
    lessonSlug: hit.lessonSlug as string,
    title: hit.title as string,
    snippet: snippet(texts.get(hit.id as number) ?? '', hit.terms),
    terms: hit.terms,
    score: hit.score,
  }));
}

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** About 200 characters of text around the first place a matched word appears, cut at word boundaries. */
function snippet(text: string, terms: string[], size = 200): string {
  const flat = text.replace(/\s+/g, ' ').trim();
  const pattern = terms.length ? new RegExp(`\\b(?:${terms.map(escape).join('|')})`, 'i') : null;
  const at = pattern ? flat.search(pattern) : -1;
  if (at < 0) return flat.length <= size ? flat : `${flat.slice(0, flat.lastIndexOf(' ', size))} …`;
  let start = Math.max(0, at - 60);
  if (start > 0) start = flat.indexOf(' ', start) + 1;
  let end = Math.min(flat.length, start + size);
  if (end < flat.length) end = Math.max(flat.lastIndexOf(' ', end), at + 1);
  return `${start > 0 ? '… ' : ''}${flat.slice(start, end)}${end < flat.length ? ' …' : ''}`;
}
