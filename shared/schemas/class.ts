import * as z from 'zod/mini';

/** An enrolment row is active or withdrawn; "invited" is shown for invitations not yet accepted. */
export const EnrolmentStatus = z.enum(['active', 'withdrawn']);
export type EnrolmentStatus = z.infer<typeof EnrolmentStatus>;

export const RosterStatus = z.enum(['invited', 'active', 'withdrawn']);
export type RosterStatus = z.infer<typeof RosterStatus>;

const Day = z.iso.date('Enter a date as YYYY-MM-DD.');
const Id = z.int().check(z.positive());
const MentorIds = z.array(Id).check(z.maxLength(20, 'At most 20 mentors.'));

const RequiredMinutes = z
  .int('Give whole minutes.')
  .check(
    z.gte(1, 'Ask for at least 1 minute a week, or leave it empty.'),
    z.lte(7 * 24 * 60, 'A week has 10 080 minutes.'),
  );

const classFields = {
  name: z.string().check(z.trim(), z.minLength(2, 'Give the class a name of at least 2 characters.'), z.maxLength(120)),
  courseId: Id,
  startsOn: Day,
  endsOn: Day,
  capacity: z
    .int()
    .check(z.gte(1, 'A class has room for at least 1 apprentice.'), z.lte(500, 'At most 500 apprentices.')),
  mentorIds: z._default(MentorIds, []),
  /** Bench time asked of each apprentice per week, in minutes; null for none. */
  requiredMinutesPerWeek: z._default(z.nullable(RequiredMinutes), null),
};

const endsAfterStart = (v: { startsOn?: string; endsOn?: string }) =>
  !v.startsOn || !v.endsOn || v.endsOn >= v.startsOn;
const endsAfterStartIssue = { message: 'The class cannot end before it starts.', path: ['endsOn'] };

export const ClassCreateInput = z.object(classFields).check(z.refine(endsAfterStart, endsAfterStartIssue));
export type ClassCreateInput = z.infer<typeof ClassCreateInput>;

/** Any subset of the fields; `archived` archives (true) or brings back (false) the class. */
export const ClassUpdateInput = z
  .partial(
    z.object({
      ...classFields,
      mentorIds: MentorIds,
      requiredMinutesPerWeek: z.nullable(RequiredMinutes),
      archived: z.boolean(),
    }),
  )
  .check(z.refine(endsAfterStart, endsAfterStartIssue));
export type ClassUpdateInput = z.infer<typeof ClassUpdateInput>;

export const ClassListQuery = z.object({
  /** Absent: every class the viewer may see; "true": archived only; "false": current only. */
  archived: z.optional(z.enum(['true', 'false'])),
});
export type ClassListQuery = z.infer<typeof ClassListQuery>;

export const PersonRef = z.object({ id: z.int(), name: z.string() });
export type PersonRef = z.infer<typeof PersonRef>;

export const CourseRef = z.object({ id: z.int(), title: z.string(), slug: z.string() });
export type CourseRef = z.infer<typeof CourseRef>;

export const ClassCounts = z.object({
  active: z.int(),
  withdrawn: z.int(),
  /** Invitations sent and not yet accepted, revoked or expired: each holds a seat. */
  invited: z.int(),
  seatsLeft: z.int(),
});
export type ClassCounts = z.infer<typeof ClassCounts>;

export const ClassDTO = z.object({
  id: z.int(),
  name: z.string(),
  course: CourseRef,
  startsOn: z.string(),
  endsOn: z.string(),
  capacity: z.int(),
  requiredMinutesPerWeek: z.nullable(z.int()),
  archived: z.boolean(),
  archivedAt: z.nullable(z.string()),
  mentors: z.array(PersonRef),
  counts: ClassCounts,
});
export type ClassDTO = z.infer<typeof ClassDTO>;

export const ClassListReply = z.object({ classes: z.array(ClassDTO) });
export type ClassListReply = z.infer<typeof ClassListReply>;

/** What the class form offers: the courses a class can run and the mentors who can lead it. */
export const ClassFormOptions = z.object({
  courses: z.array(CourseRef),
  mentors: z.array(z.extend(PersonRef, { email: z.string() })),
});
export type ClassFormOptions = z.infer<typeof ClassFormOptions>;

export const RosterEntry = z.object({
  /** Null while the person is only invited and has no account yet. */
  userId: z.nullable(z.int()),
  invitationId: z.nullable(z.int()),
  name: z.string(),
  email: z.string(),
  status: RosterStatus,
  lessonsDone: z.int(),
  projectsPassed: z.int(),
  since: z.string(),
});
export type RosterEntry = z.infer<typeof RosterEntry>;

export const RosterReply = z.object({
  classId: z.int(),
  lessonsTotal: z.int(),
  projectsTotal: z.int(),
  entries: z.array(RosterEntry),
});
export type RosterReply = z.infer<typeof RosterReply>;
