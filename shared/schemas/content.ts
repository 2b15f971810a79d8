import { z } from 'zod';

/** The front matter of content/<course>/course.md and NN-slug.md lesson files; content:check and the sync use it. */
const Key = z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'use kebab-case (a-z, 0-9 and dashes)');

export const Skill = z.object({ key: Key, label: z.string().min(1) });
export type Skill = z.infer<typeof Skill>;

export const ProjectCriterion = z.object({
  key: Key,
  label: z.string().min(1),
  weight: z.number().int().positive(),
  /** What a score of 0, 1, 2, 3 and 4 means for this criterion. */
  scores: z.array(z.string().min(1)).length(5),
});
export type ProjectCriterion = z.infer<typeof ProjectCriterion>;

export const ProjectSpec = z.object({
  title: z.string().min(1),
  brief: z.string().min(1),
  passMark: z.number().min(0).max(4),
  criteria: z
    .array(ProjectCriterion)
    .min(3)
    .max(5)
    .refine((c) => new Set(c.map((x) => x.key)).size === c.length, 'criterion keys must be unique'),
});
export type ProjectSpec = z.infer<typeof ProjectSpec>;

export const CourseFrontMatter = z.object({
  title: z.string().min(1),
  slug: Key,
  summary: z.string().min(1),
  level: z.enum(['foundation', 'intermediate', 'advanced']),
  order: z.number().int().nonnegative(),
  skills: z.array(Skill).min(1),
});
export type CourseFrontMatter = z.infer<typeof CourseFrontMatter>;

export const LessonFrontMatter = z.object({
  title: z.string().min(1),
  minutes: z.number().int().min(1).max(600),
  skills: z.array(Key).default([]),
  project: ProjectSpec.optional(),
});
export type LessonFrontMatter = z.infer<typeof LessonFrontMatter>;

export const LESSON_FILE = /^(\d{2})-([a-z0-9]+(?:-[a-z0-9]+)*)\.md$/;
