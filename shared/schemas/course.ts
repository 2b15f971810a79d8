import * as z from 'zod/mini';
import { ProjectCriterion, Skill } from './content';

/** Replies of the courses, lessons and search API; the client parses every reply with these. */
const Id = z.int();
export const CourseLevel = z.enum(['foundation', 'intermediate', 'advanced']);
export type CourseLevel = z.infer<typeof CourseLevel>;

export const CourseCard = z.object({
  id: Id,
  slug: z.string(),
  title: z.string(),
  summary: z.string(),
  level: CourseLevel,
  lessonCount: z.int(),
  minutes: z.int(),
  /** Only for apprentices: how many of the course's lessons they have marked done, and that as a fraction 0..1. */
  lessonsDone: z.nullable(z.int()),
  progress: z.nullable(z.number().check(z.gte(0), z.lte(1))),
});
export type CourseCard = z.infer<typeof CourseCard>;

export const CourseListReply = z.object({ courses: z.array(CourseCard) });
export type CourseListReply = z.infer<typeof CourseListReply>;

const ProjectBadge = z.object({ id: Id, title: z.string() });

export const LessonListItem = z.object({
  id: Id,
  slug: z.string(),
  position: z.int(),
  title: z.string(),
  minutes: z.int(),
  skills: z.array(Skill),
  /** null for mentors and the admin, who do not keep progress. */
  done: z.nullable(z.boolean()),
  project: z.nullable(ProjectBadge),
});
export type LessonListItem = z.infer<typeof LessonListItem>;

export const CourseDetailReply = z.object({
  course: z.extend(CourseCard, { intro: z.string(), skills: z.array(Skill) }),
  lessons: z.array(LessonListItem),
});
export type CourseDetailReply = z.infer<typeof CourseDetailReply>;

export const OutlineHeading = z.object({ depth: z.int(), text: z.string(), id: z.string() });
export type OutlineHeading = z.infer<typeof OutlineHeading>;

export const ProjectDTO = z.extend(ProjectBadge, {
  brief: z.string(),
  passMark: z.number(),
  criteria: z.array(ProjectCriterion),
});
export type ProjectDTO = z.infer<typeof ProjectDTO>;

const LessonLink = z.object({ slug: z.string(), title: z.string() });
const CourseRef = z.object({ id: Id, slug: z.string(), title: z.string() });

export const LessonReply = z.object({
  course: CourseRef,
  lesson: z.extend(z.omit(LessonListItem, { project: true }), { body: z.string(), outline: z.array(OutlineHeading) }),
  previous: z.nullable(LessonLink),
  next: z.nullable(LessonLink),
  project: z.nullable(ProjectDTO),
});
export type LessonReply = z.infer<typeof LessonReply>;

/** A lesson's basics by id, for features that point at a lesson (submissions, log entries); retired ones too. */
export const LessonBasicsReply = z.object({
  lesson: z.object({ id: Id, slug: z.string(), title: z.string(), position: z.int(), retired: z.boolean() }),
  course: CourseRef,
});
export type LessonBasicsReply = z.infer<typeof LessonBasicsReply>;

export const LessonDoneReply = z.object({ lessonId: Id, done: z.boolean(), completedAt: z.nullable(z.iso.datetime()) });
export type LessonDoneReply = z.infer<typeof LessonDoneReply>;

/** The apprentice's next lesson: the first one not done in the course of their class; lesson null once all are done. */
export const NextLessonReply = z.object({
  course: z.nullable(z.extend(CourseRef, { lessonCount: z.int(), lessonsDone: z.int() })),
  lesson: z.nullable(z.extend(LessonLink, { minutes: z.int(), position: z.int() })),
});
export type NextLessonReply = z.infer<typeof NextLessonReply>;

export const SearchQuery = z.object({
  q: z
    .string()
    .check(
      z.trim(),
      z.minLength(2, 'Type at least two letters.'),
      z.maxLength(100, 'Keep the search under 100 characters.'),
    ),
});
export type SearchQuery = z.infer<typeof SearchQuery>;

export const SearchResult = z.object({
  lessonId: Id,
  courseSlug: z.string(),
  courseTitle: z.string(),
  lessonSlug: z.string(),
  title: z.string(),
  /** Plain text around the first match; the client marks the terms in it. */
  snippet: z.string(),
  /** The words of the lesson that matched (a search for "broach" also matches "broaches"). */
  terms: z.array(z.string()),
  score: z.number(),
});
export type SearchResult = z.infer<typeof SearchResult>;

export const SearchReply = z.object({ query: z.string(), results: z.array(SearchResult) });
export type SearchReply = z.infer<typeof SearchReply>;
