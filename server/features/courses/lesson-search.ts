import MiniSearch from 'minisearch';
import type { Sequelize } from 'sequelize';
import type { SearchResult } from '@shared/schemas/course';
import { Course, Lesson } from './course.model';
import { lessonOutline, lessonPlainText, parseLessonMarkdown } from './lesson-markdown';

interface LessonDoc {
  id: number;
  title: string;
  headings: string;
  text: string;
  courseSlug: string;
  courseTitle: string;
  lessonSlug: string;
}

interface LessonIndex {
  search: MiniSearch<LessonDoc>;
  texts: Map<number, string>;
}

/** One index per database, built from the lesson rows on first need and dropped whenever content is synced. */
const indexes = new WeakMap<Sequelize, Promise<LessonIndex>>();

export function markSearchStale(sequelize: Sequelize) {
  indexes.delete(sequelize);
}

/** Starts building the index ahead of the first search (at start-up); a failure is retried on that search. */
export function warmSearchIndex(sequelize: Sequelize) {
  indexFor(sequelize).catch(() => markSearchStale(sequelize));
}

function indexFor(sequelize: Sequelize): Promise<LessonIndex> {
  let index = indexes.get(sequelize);
  if (!index) {
    index = buildIndex();
    indexes.set(sequelize, index);
  }
  return index;
}

async function buildIndex(): Promise<LessonIndex> {
  const courses = await Course.findAll({ where: { retiredAt: null } });
  const lessons = await Lesson.findAll({ where: { retiredAt: null } });
  const byId = new Map(courses.map((c) => [c.id, c]));
  const docs: LessonDoc[] = [];
  for (const lesson of lessons) {
    const course = byId.get(lesson.courseId);
    if (!course) continue;
    const tree = parseLessonMarkdown(lesson.body);
    docs.push({
      id: lesson.id,
      title: lesson.title,
      headings: lessonOutline(tree)
        .map((h) => h.text)
        .join('\n'),
      text: lessonPlainText(tree),
      courseSlug: course.slug,
      courseTitle: course.title,
      lessonSlug: lesson.slug,
    });
  }
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
export async function searchLessons(sequelize: Sequelize, query: string, limit = 20): Promise<SearchResult[]> {
  const { search, texts } = await indexFor(sequelize);
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
