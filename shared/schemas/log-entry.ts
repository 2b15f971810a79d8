import * as z from 'zod/mini';
import { QueryId, QueryInt, QueryPage } from './query';
import { CalculationDTO } from './calculation';
import { UploadDTO } from './upload';

/** One date holds at most this much bench time, whatever the number of entries. */
export const MAX_DAY_MINUTES = 24 * 60;
export const LOG_PAGE_SIZE = 20;
export const MAX_LOG_PHOTOS = 12;
export const MAX_MEASUREMENTS = 40;

const Id = z.int().check(z.positive());

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

export const LogDate = z.string().check(
  z.regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date like 2026-10-05.'),
  z.refine(isCalendarDate, 'That date is not on the calendar.'),
  z.refine((d) => !(yearOf(d) < EARLIEST_LOG_YEAR), `Use a date from ${EARLIEST_LOG_YEAR} on.`),
  z.refine((d) => !(yearOf(d) > latestLogYear()), 'Use a date no later than next year.'),
);

/**
 * "Not in the future" is judged by the clock of the code that parses: on the server that is the server's local time
 * zone, which is the one that counts. The guild runs one server for one workshop, so its local date is the bench's
 * date; an apprentice far ahead of it may have to wait a few hours to log "today".
 */
const EntryDate = LogDate.check(z.refine((d) => d <= localToday(), 'The date cannot be in the future.'));

export const Minutes = z
  .number({ error: 'Enter the time spent in minutes.' })
  .check(
    z.int('Use whole minutes.'),
    z.gte(1, 'Log at least 1 minute.'),
    z.lte(MAX_DAY_MINUTES, 'One date holds at most 24 h (1440 min).'),
  );

export const MeasurementInput = z.object({
  name: z
    .string()
    .check(z.trim(), z.minLength(1, 'Say what was measured.'), z.maxLength(80, 'Keep the name under 80 characters.')),
  value: z.number({ error: 'Enter the value as a number.' }),
  unit: z
    .string()
    .check(
      z.trim(),
      z.minLength(1, 'Give a unit (mm, µm, N …).'),
      z.maxLength(20, 'Keep the unit under 20 characters.'),
    ),
});
export type MeasurementInput = z.infer<typeof MeasurementInput>;

const IdList = (what: string, max: number) =>
  z.array(Id).check(
    z.maxLength(max, `Attach at most ${max} ${what}.`),
    z.refine((ids) => new Set(ids).size === ids.length, `Attach each of the ${what} once.`),
  );

/** Every field of an entry; a create fills the lists with empty ones, a patch leaves out what it does not change. */
const entryFields = {
  date: EntryDate,
  minutes: Minutes,
  title: z
    .string()
    .check(
      z.trim(),
      z.minLength(1, 'Give the entry a title.'),
      z.maxLength(120, 'Keep the title under 120 characters.'),
    ),
  notes: z.string().check(z.maxLength(20_000, 'Keep the notes under 20 000 characters.')),
  lessonId: z.nullable(Id),
  measurements: z
    .array(MeasurementInput)
    .check(z.maxLength(MAX_MEASUREMENTS, `Record at most ${MAX_MEASUREMENTS} measurements.`)),
  uploadIds: IdList('photos', MAX_LOG_PHOTOS),
  calculationIds: IdList('saved results', 20),
};

export const LogEntryCreateInput = z.object({
  ...entryFields,
  notes: z._default(entryFields.notes, ''),
  lessonId: z.optional(entryFields.lessonId),
  measurements: z._default(entryFields.measurements, []),
  uploadIds: z._default(entryFields.uploadIds, []),
  calculationIds: z._default(entryFields.calculationIds, []),
});
export type LogEntryCreateInput = z.infer<typeof LogEntryCreateInput>;

export const LogEntryPatch = z.partial(z.object(entryFields));
export type LogEntryPatch = z.infer<typeof LogEntryPatch>;

export const LogEntryFilters = z
  .object({
    /** Mentors and the guild office name the apprentice whose log they read; apprentices read their own. */
    apprentice: QueryId,
    from: z.optional(LogDate),
    to: z.optional(LogDate),
    lessonId: QueryId,
  })
  .check(
    z.refine((q) => !q.from || !q.to || q.from <= q.to, { message: 'The range ends before it starts.', path: ['to'] }),
  );
export type LogEntryFilters = z.infer<typeof LogEntryFilters>;

export const LogEntryListQuery = z.intersection(LogEntryFilters, z.object({ page: QueryPage(10_000) }));
export type LogEntryListQuery = z.infer<typeof LogEntryListQuery>;

export const LogSummaryQuery = z.object({
  apprentice: QueryId,
  weeks: z._default(QueryInt(1, 52), 8),
});
export type LogSummaryQuery = z.infer<typeof LogSummaryQuery>;

export const GRADE_ASPECTS = ['completeness', 'measurements', 'photos'] as const;
export type GradeAspect = (typeof GRADE_ASPECTS)[number];
export const GRADE_ASPECT_LABELS: Record<GradeAspect, string> = {
  completeness: 'Completeness',
  measurements: 'Measurements',
  photos: 'Photos',
};

const Score = z
  .number({ error: 'Choose a score from 0 to 4.' })
  .check(z.int(), z.gte(0, 'From 0 to 4.'), z.lte(4, 'From 0 to 4.'));

export const LogGradeInput = z.object({
  completeness: Score,
  measurements: Score,
  photos: Score,
  comment: z._default(z.string().check(z.trim(), z.maxLength(2000, 'Keep the comment under 2000 characters.')), ''),
});
export type LogGradeInput = z.infer<typeof LogGradeInput>;

export const LogCommentInput = z.object({
  body: z
    .string()
    .check(
      z.trim(),
      z.minLength(1, 'Write a comment first.'),
      z.maxLength(4000, 'Keep a comment under 4000 characters.'),
    ),
});
export type LogCommentInput = z.infer<typeof LogCommentInput>;

const PersonRef = z.object({ id: z.int(), name: z.string() });

export const LogMeasurementDTO = MeasurementInput;

export const LogCommentDTO = z.object({
  id: z.int(),
  author: PersonRef,
  body: z.string(),
  createdAt: z.string(),
});
export type LogCommentDTO = z.infer<typeof LogCommentDTO>;

export const LogGradeDTO = z.object({
  id: z.int(),
  mentor: PersonRef,
  completeness: z.int(),
  measurements: z.int(),
  photos: z.int(),
  comment: z.string(),
  /** The entry's version when the grade was given; compare with the entry's `version`. */
  entryVersion: z.int(),
  createdAt: z.string(),
});
export type LogGradeDTO = z.infer<typeof LogGradeDTO>;

export const LogLessonRef = z.object({
  id: z.int(),
  slug: z.string(),
  title: z.string(),
  course: z.object({ id: z.int(), slug: z.string(), title: z.string() }),
});
export type LogLessonRef = z.infer<typeof LogLessonRef>;

export const LogEntryDTO = z.object({
  id: z.int(),
  apprentice: PersonRef,
  date: z.string(),
  minutes: z.int(),
  title: z.string(),
  notes: z.string(),
  lesson: z.nullable(LogLessonRef),
  measurements: z.array(LogMeasurementDTO),
  photos: z.array(UploadDTO),
  calculations: z.array(CalculationDTO),
  comments: z.array(LogCommentDTO),
  /** Oldest first. */
  grades: z.array(LogGradeDTO),
  /** Starts at 1 and goes up by one with every edit. */
  version: z.int(),
  editedAt: z.nullable(z.string()),
  /** The time of the last edit when it came after the latest grade; null when ungraded or unchanged since. */
  changedAfterGradingAt: z.nullable(z.string()),
  createdAt: z.string(),
});
export type LogEntryDTO = z.infer<typeof LogEntryDTO>;

export const LogEntryList = z.object({
  entries: z.array(LogEntryDTO),
  total: z.int(),
  page: z.int(),
  pageSize: z.int(),
});
export type LogEntryList = z.infer<typeof LogEntryList>;

export const LogSummary = z.object({
  apprentice: PersonRef,
  /** Oldest first; weeks start on Monday. */
  weeks: z.array(z.object({ weekStart: z.string(), minutes: z.int() })),
  thisWeekMinutes: z.int(),
  totalMinutes: z.int(),
  entryCount: z.int(),
  /** All time, largest first; `course` null gathers entries without a lesson. */
  courses: z.array(
    z.object({
      course: z.nullable(z.object({ id: z.int(), title: z.string() })),
      minutes: z.int(),
      entries: z.int(),
    }),
  ),
});
export type LogSummary = z.infer<typeof LogSummary>;

/** For a mentor's Today page: recent entries of their apprentices that no mentor has graded yet. */
export const LogEntriesToRead = z.object({
  entries: z.array(
    z.object({
      id: z.int(),
      apprentice: PersonRef,
      date: z.string(),
      title: z.string(),
      minutes: z.int(),
    }),
  ),
  total: z.int(),
});
export type LogEntriesToRead = z.infer<typeof LogEntriesToRead>;

export const LogApprentices = z.object({
  apprentices: z.array(z.extend(PersonRef, { entries: z.int(), lastDate: z.nullable(z.string()), ungraded: z.int() })),
});
export type LogApprentices = z.infer<typeof LogApprentices>;
