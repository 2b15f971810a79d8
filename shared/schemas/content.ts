import { z } from 'zod';

/** The front matter of content/<course>/course.md and NN-slug.md lesson files; content:check and the sync use it. */
const Key = z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'use kebab-case (a-z, 0-9 and dashes)');

export const Skill = z.object({
  key: Key,
  label: z.string().min(1),
  /** What a mentor must see before signing the skill off: one or two sentences. content:check requires it. */
  standard: z.string().trim().min(1).max(600).optional(),
});
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

/**
 * A worked example a lesson prints for a calculator it embeds. content:check runs the calculator on `inputs` and
 * fails the lesson unless every figure in `shows` is what the calculator gives, rounded as the lesson writes it, and
 * appears in the lesson's text.
 */
export const CalculatorExample = z.object({
  calculator: Key,
  /** Inputs as the calculator takes them: mm, °C, g, N. */
  inputs: z.record(z.string(), z.unknown()),
  /**
   * Figures keyed by result path ("insertionDepthMm", "radiiMm.0", "solutions.0.fraction"). Quote numbers as the
   * lesson writes them ("0.040"): the decimals given are the precision checked.
   */
  shows: z
    .record(z.string(), z.union([z.string(), z.number(), z.boolean()]))
    .refine((o) => Object.keys(o).length > 0, 'name at least one figure the lesson shows'),
});
export type CalculatorExample = z.infer<typeof CalculatorExample>;

export const LessonFrontMatter = z.object({
  title: z.string().min(1),
  minutes: z.number().int().min(1).max(600),
  skills: z.array(Key).default([]),
  project: ProjectSpec.optional(),
  calculatorExamples: z.array(CalculatorExample).default([]),
});
export type LessonFrontMatter = z.infer<typeof LessonFrontMatter>;

export const LESSON_FILE = /^(\d{2})-([a-z0-9]+(?:-[a-z0-9]+)*)\.md$/;
