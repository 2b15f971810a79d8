import * as z from 'zod/mini';

/** The front matter of content/<course>/course.md and NN-slug.md lesson files; content:check and the sync use it. */
const Key = z.string().check(z.regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'use kebab-case (a-z, 0-9 and dashes)'));
const Text = z.string().check(z.minLength(1));

export const Skill = z.object({
  key: Key,
  label: Text,
  /** What a mentor must see before signing the skill off: one or two sentences. content:check requires it. */
  standard: z.optional(z.string().check(z.trim(), z.minLength(1), z.maxLength(600))),
});
export type Skill = z.infer<typeof Skill>;

export const ProjectCriterion = z.object({
  key: Key,
  label: Text,
  weight: z.int().check(z.positive()),
  /** What a score of 0, 1, 2, 3 and 4 means for this criterion. */
  scores: z.array(Text).check(z.length(5)),
});
export type ProjectCriterion = z.infer<typeof ProjectCriterion>;

export const ProjectSpec = z.object({
  title: Text,
  brief: Text,
  passMark: z.number().check(z.gte(0), z.lte(4)),
  criteria: z.array(ProjectCriterion).check(
    z.minLength(3),
    z.maxLength(5),
    z.refine((c) => new Set(c.map((x) => x.key)).size === c.length, 'criterion keys must be unique'),
  ),
});
export type ProjectSpec = z.infer<typeof ProjectSpec>;

export const CourseFrontMatter = z.object({
  title: Text,
  slug: Key,
  summary: Text,
  level: z.enum(['foundation', 'intermediate', 'advanced']),
  order: z.int().check(z.nonnegative()),
  skills: z.array(Skill).check(z.minLength(1)),
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
    .check(z.refine((o) => Object.keys(o).length > 0, 'name at least one figure the lesson shows')),
});
export type CalculatorExample = z.infer<typeof CalculatorExample>;

export const LessonFrontMatter = z.object({
  title: Text,
  minutes: z.int().check(z.gte(1), z.lte(600)),
  skills: z._default(z.array(Key), []),
  project: z.optional(ProjectSpec),
  calculatorExamples: z._default(z.array(CalculatorExample), []),
});
export type LessonFrontMatter = z.infer<typeof LessonFrontMatter>;

export const LESSON_FILE = /^(\d{2})-([a-z0-9]+(?:-[a-z0-9]+)*)\.md$/;
