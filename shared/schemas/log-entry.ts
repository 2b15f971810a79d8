import { z } from 'zod';
import { CalculationDTO } from './calculation';
import { UploadDTO } from './upload';

/** One date holds at most this much bench time, whatever the number of entries. */
export const MAX_DAY_MINUTES = 24 * 60;
export const LOG_PAGE_SIZE = 20;
export const MAX_LOG_PHOTOS = 12;
export const MAX_MEASUREMENTS = 40;

const Id = z.number().int().positive();

/** Today's calendar date in the local time zone of whoever runs this code, as YYYY-MM-DD. */
export function localToday(now = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

const DAY_MS = 24 * 60 * 60 * 1000;

/** Calendar arithmetic on YYYY-MM-DD strings, done in UTC so that no daylight-saving change moves a day. */
export function addDays(date: string, days: number): string {
  return new Date(Date.parse(`${date}T00:00:00Z`) + days * DAY_MS).toISOString().slice(0, 10);
}

/** Weeks run Monday to Sunday, as a working week at the bench does. */
export function mondayOf(date: string): string {
  const weekday = new Date(`${date}T00:00:00Z`).getUTCDay();
  return addDays(date, -((weekday + 6) % 7));
}

/** Time spent the way the bench says it: "2 h 30 min", "45 min", "3 h". */
export function formatMinutes(total: number): string {
  const h = Math.floor(total / 60);
  const m = total % 60;
  if (h === 0) return `${m} min`;
  return m === 0 ? `${h} h` : `${h} h ${m} min`;
}

function isCalendarDate(s: string): boolean {
  const d = new Date(`${s}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === s;
}

/** No bench log reaches back before 1900 or forward past next year: a date outside that is a slip of the keyboard. */
export const EARLIEST_LOG_YEAR = 1900;
const latestLogYear = () => new Date().getFullYear() + 1;
// NaN (a malformed date, already refused by the pattern) compares false, so these add no second message for it.
const yearOf = (d: string) => Number(d.slice(0, 4));

export const LogDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date like 2026-10-05.')
  .refine(isCalendarDate, 'That date is not on the calendar.')
  .refine((d) => !(yearOf(d) < EARLIEST_LOG_YEAR), `Use a date from ${EARLIEST_LOG_YEAR} on.`)
  .refine((d) => !(yearOf(d) > latestLogYear()), 'Use a date no later than next year.');

/**
 * "Not in the future" is judged by the clock of the code that parses: on the server that is the server's local time
 * zone, which is the one that counts. The guild runs one server for one workshop, so its local date is the bench's
 * date; an apprentice far ahead of it may have to wait a few hours to log "today".
 */
const EntryDate = LogDate.refine((d) => d <= localToday(), 'The date cannot be in the future.');

export const Minutes = z
  .number({ error: 'Enter the time spent in minutes.' })
  .int('Use whole minutes.')
  .min(1, 'Log at least 1 minute.')
  .max(MAX_DAY_MINUTES, 'One date holds at most 24 h (1440 min).');

export const MeasurementInput = z.object({
  name: z.string().trim().min(1, 'Say what was measured.').max(80, 'Keep the name under 80 characters.'),
  value: z.number({ error: 'Enter the value as a number.' }),
  unit: z.string().trim().min(1, 'Give a unit (mm, µm, N …).').max(20, 'Keep the unit under 20 characters.'),
});
export type MeasurementInput = z.infer<typeof MeasurementInput>;

const IdList = (what: string, max: number) =>
  z
    .array(Id)
    .max(max, `Attach at most ${max} ${what}.`)
    .refine((ids) => new Set(ids).size === ids.length, `Attach each of the ${what} once.`);

/** Every field of an entry; a create fills the lists with empty ones, a patch leaves out what it does not change. */
const entryFields = {
  date: EntryDate,
  minutes: Minutes,
  title: z.string().trim().min(1, 'Give the entry a title.').max(120, 'Keep the title under 120 characters.'),
  notes: z.string().max(20_000, 'Keep the notes under 20 000 characters.'),
  lessonId: Id.nullable(),
  measurements: z.array(MeasurementInput).max(MAX_MEASUREMENTS, `Record at most ${MAX_MEASUREMENTS} measurements.`),
  uploadIds: IdList('photos', MAX_LOG_PHOTOS),
  calculationIds: IdList('saved results', 20),
};

export const LogEntryCreateInput = z.object({
  ...entryFields,
  notes: entryFields.notes.default(''),
  lessonId: entryFields.lessonId.optional(),
  measurements: entryFields.measurements.default([]),
  uploadIds: entryFields.uploadIds.default([]),
  calculationIds: entryFields.calculationIds.default([]),
});
export type LogEntryCreateInput = z.infer<typeof LogEntryCreateInput>;

export const LogEntryPatch = z.object(entryFields).partial();
export type LogEntryPatch = z.infer<typeof LogEntryPatch>;

const ApprenticeParam = z.coerce.number().int().positive().optional();

export const LogEntryFilters = z
  .object({
    /** Mentors and the guild office name the apprentice whose log they read; apprentices read their own. */
    apprentice: ApprenticeParam,
    from: LogDate.optional(),
    to: LogDate.optional(),
    lessonId: z.coerce.number().int().positive().optional(),
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, { message: 'The range ends before it starts.', path: ['to'] });
export type LogEntryFilters = z.infer<typeof LogEntryFilters>;

export const LogEntryListQuery = LogEntryFilters.and(
  z.object({ page: z.coerce.number().int().min(1).max(10_000).default(1) }),
);
export type LogEntryListQuery = z.infer<typeof LogEntryListQuery>;

export const LogSummaryQuery = z.object({
  apprentice: ApprenticeParam,
  weeks: z.coerce.number().int().min(1).max(52).default(8),
});
export type LogSummaryQuery = z.infer<typeof LogSummaryQuery>;

export const GRADE_ASPECTS = ['completeness', 'measurements', 'photos'] as const;
export type GradeAspect = (typeof GRADE_ASPECTS)[number];
export const GRADE_ASPECT_LABELS: Record<GradeAspect, string> = {
  completeness: 'Completeness',
  measurements: 'Measurements',
  photos: 'Photos',
};

const Score = z.number({ error: 'Choose a score from 0 to 4.' }).int().min(0, 'From 0 to 4.').max(4, 'From 0 to 4.');

export const LogGradeInput = z.object({
  completeness: Score,
  measurements: Score,
  photos: Score,
  comment: z.string().trim().max(2000, 'Keep the comment under 2000 characters.').default(''),
});
export type LogGradeInput = z.infer<typeof LogGradeInput>;

export const LogCommentInput = z.object({
  body: z.string().trim().min(1, 'Write a comment first.').max(4000, 'Keep a comment under 4000 characters.'),
});
export type LogCommentInput = z.infer<typeof LogCommentInput>;

const PersonRef = z.object({ id: z.number().int(), name: z.string() });

export const LogMeasurementDTO = MeasurementInput;

export const LogCommentDTO = z.object({
  id: z.number().int(),
  author: PersonRef,
  body: z.string(),
  createdAt: z.string(),
});
export type LogCommentDTO = z.infer<typeof LogCommentDTO>;

export const LogGradeDTO = z.object({
  id: z.number().int(),
  mentor: PersonRef,
  completeness: z.number().int(),
  measurements: z.number().int(),
  photos: z.number().int(),
  comment: z.string(),
  /** The entry's version when the grade was given; compare with the entry's `version`. */
  entryVersion: z.number().int(),
  createdAt: z.string(),
});
export type LogGradeDTO = z.infer<typeof LogGradeDTO>;

export const LogLessonRef = z.object({
  id: z.number().int(),
  slug: z.string(),
  title: z.string(),
  course: z.object({ id: z.number().int(), slug: z.string(), title: z.string() }),
});
export type LogLessonRef = z.infer<typeof LogLessonRef>;

export const LogEntryDTO = z.object({
  id: z.number().int(),
  apprentice: PersonRef,
  date: z.string(),
  minutes: z.number().int(),
  title: z.string(),
  notes: z.string(),
  lesson: LogLessonRef.nullable(),
  measurements: z.array(LogMeasurementDTO),
  photos: z.array(UploadDTO),
  calculations: z.array(CalculationDTO),
  comments: z.array(LogCommentDTO),
  /** Oldest first. */
  grades: z.array(LogGradeDTO),
  /** Starts at 1 and goes up by one with every edit. */
  version: z.number().int(),
  editedAt: z.string().nullable(),
  /** The time of the last edit when it came after the latest grade; null when ungraded or unchanged since. */
  changedAfterGradingAt: z.string().nullable(),
  createdAt: z.string(),
});
export type LogEntryDTO = z.infer<typeof LogEntryDTO>;

export const LogEntryList = z.object({
  entries: z.array(LogEntryDTO),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});
export type LogEntryList = z.infer<typeof LogEntryList>;

export const LogSummary = z.object({
  apprentice: PersonRef,
  /** Oldest first; weeks start on Monday. */
  weeks: z.array(z.object({ weekStart: z.string(), minutes: z.number().int() })),
  thisWeekMinutes: z.number().int(),
  totalMinutes: z.number().int(),
  entryCount: z.number().int(),
  /** All time, largest first; `course` null gathers entries without a lesson. */
  courses: z.array(
    z.object({
      course: z.object({ id: z.number().int(), title: z.string() }).nullable(),
      minutes: z.number().int(),
      entries: z.number().int(),
    }),
  ),
});
export type LogSummary = z.infer<typeof LogSummary>;

/** For a mentor's Today page: recent entries of their apprentices that no mentor has graded yet. */
export const LogEntriesToRead = z.object({
  entries: z.array(
    z.object({
      id: z.number().int(),
      apprentice: PersonRef,
      date: z.string(),
      title: z.string(),
      minutes: z.number().int(),
    }),
  ),
  total: z.number().int(),
});
export type LogEntriesToRead = z.infer<typeof LogEntriesToRead>;

export const LogApprentices = z.object({
  apprentices: z.array(
    PersonRef.extend({ entries: z.number().int(), lastDate: z.string().nullable(), ungraded: z.number().int() }),
  ),
});
export type LogApprentices = z.infer<typeof LogApprentices>;
