import * as z from 'zod/mini';
import { QueryId } from './query';
import { ProjectCriterion } from './content';
import { UploadDTO } from './upload';

export const SubmissionStatus = z.enum(['draft', 'waiting', 'passed', 'rework']);
export type SubmissionStatus = z.infer<typeof SubmissionStatus>;

export const MAX_PHOTOS = 12;
const Id = z.int().check(z.positive());
const IdList = (what: string) =>
  z.array(Id).check(
    z.maxLength(30, `Link at most 30 ${what}.`),
    z.refine((ids) => new Set(ids).size === ids.length, `Each of the ${what} may be linked once.`),
  );

const PhotoInput = z.object({
  uploadId: Id,
  caption: z._default(z.string().check(z.trim(), z.maxLength(300, 'Keep a caption under 300 characters.')), ''),
});

/**
 * What the apprentice edits in a draft version; photos are in the order they will be shown. Fields left out keep their
 * value (a new version after rework starts from the version before it).
 */
export const SubmissionDraftPatch = z.object({
  notes: z.optional(z.string().check(z.maxLength(20_000, 'Keep the notes under 20 000 characters.'))),
  photos: z.optional(
    z.array(PhotoInput).check(
      z.maxLength(MAX_PHOTOS, `Send at most ${MAX_PHOTOS} photos.`),
      z.refine((p) => new Set(p.map((x) => x.uploadId)).size === p.length, 'Each photo may appear once.'),
    ),
  ),
  logEntryIds: z.optional(IdList('log entries')),
  calculationIds: z.optional(IdList('calculations')),
});
export type SubmissionDraftPatch = z.infer<typeof SubmissionDraftPatch>;

export const SubmissionCreateInput = z.extend(SubmissionDraftPatch, { projectId: Id });
export type SubmissionCreateInput = z.infer<typeof SubmissionCreateInput>;

export const SubmissionListQuery = z.object({
  projectId: QueryId,
  /** Mentors and the admin name the apprentice whose pieces they want. */
  apprentice: QueryId,
});
export type SubmissionListQuery = z.infer<typeof SubmissionListQuery>;

export const Person = z.object({ id: z.int(), name: z.string() });
export type Person = z.infer<typeof Person>;

export const ProjectSummary = z.object({
  id: z.int(),
  title: z.string(),
  brief: z.string(),
  passMark: z.number(),
  criteria: z.array(ProjectCriterion),
  lesson: z.object({ id: z.int(), slug: z.string(), title: z.string() }),
  course: z.object({ id: z.int(), slug: z.string(), title: z.string() }),
});
export type ProjectSummary = z.infer<typeof ProjectSummary>;

export const SubmissionPhotoDTO = z.extend(z.omit(UploadDTO, { id: true }), {
  uploadId: z.int(),
  position: z.int(),
  caption: z.string(),
});
export type SubmissionPhotoDTO = z.infer<typeof SubmissionPhotoDTO>;

export const PinDTO = z.object({
  id: z.int(),
  number: z.int(),
  uploadId: z.int(),
  x: z.number(),
  y: z.number(),
  note: z.string(),
});
export type PinDTO = z.infer<typeof PinDTO>;

export const Outcome = z.enum(['passed', 'rework']);
export type Outcome = z.infer<typeof Outcome>;

export const ReviewDTO = z.object({
  id: z.int(),
  versionId: z.int(),
  mentor: Person,
  scores: z.record(z.string(), z.int()),
  comment: z.string(),
  weightedScore: z.number(),
  outcome: Outcome,
  createdAt: z.string(),
  pins: z.array(PinDTO),
});
export type ReviewDTO = z.infer<typeof ReviewDTO>;

/** A linked bench-log entry or saved calculation; `label` is null when the record is gone or unreadable. */
export const LinkedRecord = z.object({ id: z.int(), label: z.nullable(z.string()) });
export type LinkedRecord = z.infer<typeof LinkedRecord>;

export const VersionDTO = z.object({
  id: z.int(),
  number: z.int(),
  notes: z.string(),
  sentAt: z.nullable(z.string()),
  photos: z.array(SubmissionPhotoDTO),
  logEntries: z.array(LinkedRecord),
  calculations: z.array(LinkedRecord),
  review: z.nullable(ReviewDTO),
});
export type VersionDTO = z.infer<typeof VersionDTO>;

export const SubmissionDTO = z.object({
  id: z.int(),
  status: SubmissionStatus,
  apprentice: Person,
  project: ProjectSummary,
  currentVersion: z.int(),
  sentAt: z.nullable(z.string()),
  createdAt: z.string(),
  updatedAt: z.string(),
  /** Oldest first. */
  versions: z.array(VersionDTO),
});
export type SubmissionDTO = z.infer<typeof SubmissionDTO>;

export const SubmissionListItem = z.object({
  id: z.int(),
  status: SubmissionStatus,
  project: z.object({ id: z.int(), title: z.string() }),
  lesson: z.object({ slug: z.string(), title: z.string() }),
  course: z.object({ slug: z.string(), title: z.string() }),
  currentVersion: z.int(),
  sentAt: z.nullable(z.string()),
  updatedAt: z.string(),
  thumbUrl: z.nullable(z.string()),
  lastReview: z.nullable(z.object({ outcome: Outcome, weightedScore: z.number(), createdAt: z.string() })),
});
export type SubmissionListItem = z.infer<typeof SubmissionListItem>;

export const SubmissionList = z.object({ items: z.array(SubmissionListItem) });
export type SubmissionList = z.infer<typeof SubmissionList>;

/** Bench-log entries and saved calculations the apprentice may link to a piece. */
export const LinkOptions = z.object({ logEntries: z.array(LinkedRecord), calculations: z.array(LinkedRecord) });
export type LinkOptions = z.infer<typeof LinkOptions>;

/** A project as the apprentice starts a piece from it, with the piece already begun for it, if any. */
export const ProjectForPiece = z.object({ project: ProjectSummary, submissionId: z.nullable(z.int()) });
export type ProjectForPiece = z.infer<typeof ProjectForPiece>;
