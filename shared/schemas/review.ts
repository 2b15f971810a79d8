import * as z from 'zod/mini';
import { QueryId, QueryPage } from './query';
import { Outcome, Person } from './submission';

const Id = z.int().check(z.positive());
const OFF_PHOTO = 'A pin must lie on the photo (0 to 1).';
const Unit = z.number().check(z.gte(0, OFF_PHOTO), z.lte(1, OFF_PHOTO));

/** x and y are fractions of the photo's width and height from its top-left corner, so a pin lands right at every size. */
const PinInput = z.object({
  uploadId: Id,
  x: Unit,
  y: Unit,
  note: z
    .string()
    .check(
      z.trim(),
      z.minLength(1, 'Write what the pin points at.'),
      z.maxLength(1000, 'Keep a pin note under 1000 characters.'),
    ),
});

export const ReviewInput = z.object({
  scores: z.record(
    z.string(),
    z
      .number()
      .check(
        z.int('Scores are whole numbers.'),
        z.gte(0, 'Scores run from 0 to 4.'),
        z.lte(4, 'Scores run from 0 to 4.'),
      ),
  ),
  comment: z._default(z.string().check(z.trim(), z.maxLength(20_000, 'Keep the comment under 20 000 characters.')), ''),
  pins: z._default(z.array(PinInput).check(z.maxLength(40, 'Drop at most 40 pins.')), []),
  outcome: Outcome,
});
export type ReviewInput = z.infer<typeof ReviewInput>;

export const QUEUE_SORTS = ['waiting', 'apprentice', 'project'] as const;
export const QUEUE_PAGE_SIZE = 20;

export const ReviewQueueQuery = z.object({
  sort: z._default(z.enum(QUEUE_SORTS), 'waiting'),
  /** For "waiting", ascending puts the piece that has waited longest first. */
  dir: z._default(z.enum(['asc', 'desc']), 'asc'),
  classId: QueryId,
  courseId: QueryId,
  projectId: QueryId,
  page: QueryPage(100_000),
});
export type ReviewQueueQuery = z.infer<typeof ReviewQueueQuery>;

export const ReviewQueueRow = z.object({
  submissionId: z.int(),
  apprentice: Person,
  project: z.object({ id: z.int(), title: z.string() }),
  course: z.object({ id: z.int(), title: z.string() }),
  className: z.nullable(z.string()),
  version: z.int(),
  sentAt: z.string(),
  photoCount: z.int(),
  thumbUrl: z.nullable(z.string()),
});
export type ReviewQueueRow = z.infer<typeof ReviewQueueRow>;

export const ReviewQueuePage = z.object({
  rows: z.array(ReviewQueueRow),
  total: z.int(),
  page: z.int(),
  pageSize: z.int(),
});
export type ReviewQueuePage = z.infer<typeof ReviewQueuePage>;

const Option = z.object({ id: z.int(), label: z.string() });
export const ReviewQueueFilters = z.object({
  classes: z.array(Option),
  courses: z.array(Option),
  projects: z.array(z.extend(Option, { courseId: z.int() })),
});
export type ReviewQueueFilters = z.infer<typeof ReviewQueueFilters>;

export const QueueCount = z.object({ count: z.int() });

/** A review as listed on Today: the piece, who reviewed it and how it came out. */
export const RecentReview = z.object({
  id: z.int(),
  submissionId: z.int(),
  projectTitle: z.string(),
  version: z.int(),
  apprentice: Person,
  mentor: Person,
  outcome: Outcome,
  weightedScore: z.number(),
  pinCount: z.int(),
  createdAt: z.string(),
});
export type RecentReview = z.infer<typeof RecentReview>;
export const RecentReviews = z.object({ items: z.array(RecentReview) });
