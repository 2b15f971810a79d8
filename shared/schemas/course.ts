import { z } from 'zod';
import { ProjectCriterion, Skill } from './content';

/** Replies of the courses, lessons and search API; the client parses every reply with these. */
const Id = z.number().int();
export const CourseLevel = z.enum(['foundation', 'intermediate', 'advanced']);
export type CourseLevel = z.infer<typeof CourseLevel>;

export const CourseCard = z.object({
  id: Id,
  slug: z.string(),
  title: z.string(),
  summary: z.string(),
  level: CourseLevel,
  lessonCount: z.number().int(),
  minutes: z.number().int(),
  /** Only for apprentices: how many of the course's lessons they have marked done, and that as a fraction 0..1. */
  lessonsDone: z.number().int().nullable(),
  progress: z.number().min(0).max(1).nullable(),
});
export type CourseCard = z.infer<typeof CourseCard>;

export const CourseListReply = z.object({ courses: z.array(CourseCard) });
export type CourseListReply = z.infer<typeof CourseListReply>;

const ProjectBadge = z.object({ id: Id, title: z.string() });

export const LessonListItem = z.object({
  id: Id,
  slug: z.string(),
  position: z.number().int(),
  title: z.string(),
  minutes: z.number().int(),
  skills: z.array(Skill),
  /** null for mentors and the admin, who do not keep progress. */
  done: z.boolean().nullable(),
  project: ProjectBadge.nullable(),
});
export type LessonListItem = z.infer<typeof LessonListItem>;

export const CourseDetailReply = z.object({
  course: CourseCard.extend({ intro: z.string(), skills: z.array(Skill) }),
  lessons: z.array(LessonListItem),
});
export type CourseDetailReply = z.infer<typeof CourseDetailReply>;

export const OutlineHeading = z.object({ depth: z.number().int(), text: z.string(), id: z.string() });
export type OutlineHeading = z.infer<typeof OutlineHeading>;

export const ProjectDTO = ProjectBadge.extend({
  brief: z.string(),
  passMark: z.number(),
  criteria: z.array(ProjectCriterion),
});
export type ProjectDTO = z.infer<typeof ProjectDTO>;

const LessonLink = z.object({ slug: z.string(), title: z.string() });
const CourseRef = z.object({ id: Id, slug: z.string(), title: z.string() });

export const LessonReply = z.object({
  course: CourseRef,
  lesson: LessonListItem.omit({ project: true }).extend({ body: z.string(), outline: z.array(OutlineHeading) }),
  previous: LessonLink.nullable(),
  next: LessonLink.nullable(),
  project: ProjectDTO.nullable(),
});
export type LessonReply = z.infer<typeof LessonReply>;

/** A lesson's basics by id, for features that point at a lesson (submissions, log entries); retired ones too. */
export const LessonBasicsReply = z.object({
  lesson: z.object({ id: Id, slug: z.string(), title: z.string(), position: z.number().int(), retired: z.boolean() }),
  course: CourseRef,
});
export type LessonBasicsReply = z.infer<typeof LessonBasicsReply>;

export const LessonDoneReply = z.object({ lessonId: Id, done: z.boolean(), completedAt: z.iso.datetime().nullable() });
export type LessonDoneReply = z.infer<typeof LessonDoneReply>;

/** The apprentice's next lesson: the first one not done in the course of their class; lesson null once all are done. */
export const NextLessonReply = z.object({
  course: CourseRef.extend({ lessonCount: z.number().int(), lessonsDone: z.number().int() }).nullable(),
  lesson: LessonLink.extend({ minutes: z.number().int(), position: z.number().int() }).nullable(),
});
export type NextLessonReply = z.infer<typeof NextLessonReply>;

export const SearchQuery = z.object({
  q: z.string().trim().min(2, 'Type at least two letters.').max(100, 'Keep the search under 100 characters.'),
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
