import { z } from 'zod';
import { Outcome, Person } from './submission';

const Id = z.number().int().positive();
const Unit = z.number().min(0, 'A pin must lie on the photo (0 to 1).').max(1, 'A pin must lie on the photo (0 to 1).');

/** x and y are fractions of the photo's width and height from its top-left corner, so a pin lands right at every size. */
const PinInput = z.object({
  uploadId: Id,
  x: Unit,
  y: Unit,
  note: z.string().trim().min(1, 'Write what the pin points at.').max(1000, 'Keep a pin note under 1000 characters.'),
});

export const ReviewInput = z.object({
  scores: z.record(
    z.string(),
    z.number().int('Scores are whole numbers.').min(0, 'Scores run from 0 to 4.').max(4, 'Scores run from 0 to 4.'),
  ),
  comment: z.string().trim().max(20_000, 'Keep the comment under 20 000 characters.').default(''),
  pins: z.array(PinInput).max(40, 'Drop at most 40 pins.').default([]),
  outcome: Outcome,
});
export type ReviewInput = z.infer<typeof ReviewInput>;

export const QUEUE_SORTS = ['waiting', 'apprentice', 'project'] as const;
export const QUEUE_PAGE_SIZE = 20;
const OptionalId = z.coerce.number().int().positive().optional();

export const ReviewQueueQuery = z.object({
  sort: z.enum(QUEUE_SORTS).default('waiting'),
  /** For "waiting", ascending puts the piece that has waited longest first. */
  dir: z.enum(['asc', 'desc']).default('asc'),
  classId: OptionalId,
  courseId: OptionalId,
  projectId: OptionalId,
  page: z.coerce.number().int().min(1).max(100_000).default(1),
});
export type ReviewQueueQuery = z.infer<typeof ReviewQueueQuery>;

export const ReviewQueueRow = z.object({
  submissionId: z.number().int(),
  apprentice: Person,
  project: z.object({ id: z.number().int(), title: z.string() }),
  course: z.object({ id: z.number().int(), title: z.string() }),
  className: z.string().nullable(),
  version: z.number().int(),
  sentAt: z.string(),
  photoCount: z.number().int(),
  thumbUrl: z.string().nullable(),
});
export type ReviewQueueRow = z.infer<typeof ReviewQueueRow>;

export const ReviewQueuePage = z.object({
  rows: z.array(ReviewQueueRow),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});
export type ReviewQueuePage = z.infer<typeof ReviewQueuePage>;

const Option = z.object({ id: z.number().int(), label: z.string() });
export const ReviewQueueFilters = z.object({
  classes: z.array(Option),
  courses: z.array(Option),
  projects: z.array(Option.extend({ courseId: z.number().int() })),
});
export type ReviewQueueFilters = z.infer<typeof ReviewQueueFilters>;

export const QueueCount = z.object({ count: z.number().int() });

/** A review as listed on Today: the piece, who reviewed it and how it came out. */
export const RecentReview = z.object({
  id: z.number().int(),
  submissionId: z.number().int(),
  projectTitle: z.string(),
  version: z.number().int(),
  apprentice: Person,
  mentor: Person,
  outcome: Outcome,
  weightedScore: z.number(),
  pinCount: z.number().int(),
  createdAt: z.string(),
});
export type RecentReview = z.infer<typeof RecentReview>;
export const RecentReviews = z.object({ items: z.array(RecentReview) });
