import { z } from 'zod';
import { PersonRef } from './class';

/**
 * The apprentice's record: per course, each skill with its standard, the evidence gathered for it from the
 * apprentice's own work, and the mentor's sign-off. Certificates and the public check live here too.
 */
export const SKILL_STATUSES = ['not-started', 'gathering', 'ready', 'signed-off'] as const;
export const SkillStatus = z.enum(SKILL_STATUSES);
export type SkillStatus = z.infer<typeof SkillStatus>;

export const EVIDENCE_KINDS = ['submission', 'log-entry', 'calculation'] as const;
export const EvidenceKind = z.enum(EVIDENCE_KINDS);
export type EvidenceKind = z.infer<typeof EvidenceKind>;

const Id = z.number().int().positive();

export const EvidenceRef = z.object({ kind: EvidenceKind, id: Id });
export type EvidenceRef = z.infer<typeof EvidenceRef>;

export const EvidenceItem = z.object({
  kind: EvidenceKind,
  id: z.number().int(),
  title: z.string(),
  /** YYYY-MM-DD: when the piece was sent, the entry's day, or when the result was saved. */
  date: z.string(),
  /** A submission's latest review; absent while it waits. */
  outcome: z.enum(['passed', 'rework']).optional(),
  /** A submission's weighted score, or the mean of a log entry's latest grade, on the 0-4 scale. */
  score: z.number().optional(),
  /** Photos to show beside the item (thumbnails on the record page). */
  photoIds: z.array(z.number().int()),
});
export type EvidenceItem = z.infer<typeof EvidenceItem>;

export const SignOffDTO = z.object({
  id: z.number().int(),
  by: PersonRef,
  at: z.string(),
  note: z.string(),
});
export type SignOffDTO = z.infer<typeof SignOffDTO>;

export const WithdrawnSignOff = SignOffDTO.extend({
  withdrawnAt: z.string(),
  withdrawnBy: z.nullable(PersonRef),
  reason: z.string(),
});
export type WithdrawnSignOff = z.infer<typeof WithdrawnSignOff>;

export const RecordSkill = z.object({
  key: z.string(),
  label: z.string(),
  standard: z.string(),
  status: SkillStatus,
  evidence: z.array(EvidenceItem),
  signOff: SignOffDTO.nullable(),
  /** Earlier sign-offs that were withdrawn, kept with who withdrew them and why. */
  withdrawn: z.array(WithdrawnSignOff),
  /** Bench-log time on the lessons that teach the skill. */
  minutes: z.number().int(),
});
export type RecordSkill = z.infer<typeof RecordSkill>;

const WeekHours = z.object({ weekStart: z.string(), minutes: z.number().int() });

/** Bench time per week since the class began, against what the class asks for. */
export const HoursAgainstClass = z.object({
  class: z.object({ id: z.number().int(), name: z.string(), startsOn: z.string(), endsOn: z.string() }),
  requiredMinutesPerWeek: z.number().int().nullable(),
  weeks: z.array(WeekHours),
  loggedMinutes: z.number().int(),
  requiredMinutes: z.number().int(),
  /** True when the shortfall to date is more than one week's requirement. */
  behind: z.boolean(),
});
export type HoursAgainstClass = z.infer<typeof HoursAgainstClass>;

export const RecordCourse = z.object({
  course: z.object({ id: z.number().int(), slug: z.string(), title: z.string() }),
  skills: z.array(RecordSkill),
  /** Bench-log time on the course's lessons. */
  minutes: z.number().int(),
  hours: HoursAgainstClass.nullable(),
});
export type RecordCourse = z.infer<typeof RecordCourse>;

export const ApprenticeRecord = z.object({
  apprentice: PersonRef,
  courses: z.array(RecordCourse),
});
export type ApprenticeRecord = z.infer<typeof ApprenticeRecord>;

export const SignOffInput = z.object({
  courseId: Id,
  skillKey: z.string().trim().min(1).max(80),
  // Both default to empty so that a sign-off sent without them is refused for what matters first: no evidence (422).
  note: z.string().trim().max(2000).default(''),
  evidence: z.array(EvidenceRef).max(50).default([]),
});
export type SignOffInput = z.infer<typeof SignOffInput>;

export const ReasonInput = z.object({
  reason: z.string().trim().min(3, 'Give the reason in a few words.').max(2000),
});
export type ReasonInput = z.infer<typeof ReasonInput>;

export const CreatedId = z.object({ id: z.number().int() });

export const CertificateCreateInput = z.object({ apprenticeId: Id, courseId: Id });
export type CertificateCreateInput = z.infer<typeof CertificateCreateInput>;

export const CertificateCreated = z.object({ id: z.number().int(), code: z.string() });

export const CertificateDTO = z.object({
  id: z.number().int(),
  code: z.string(),
  apprentice: PersonRef,
  course: z.object({ id: z.number().int(), title: z.string() }),
  issuedAt: z.string(),
  revokedAt: z.string().nullable(),
});
export type CertificateDTO = z.infer<typeof CertificateDTO>;

export const CertificateList = z.object({ certificates: z.array(CertificateDTO) });
export type CertificateList = z.infer<typeof CertificateList>;

/** Empty filter fields from a form arrive as `?courseId=`: treated as not given. */
const optionalId = z.preprocess((v) => (v === '' ? undefined : v), z.coerce.number().int().positive().optional());
export const CertificateListQuery = z.object({ apprenticeId: optionalId, courseId: optionalId });
export type CertificateListQuery = z.infer<typeof CertificateListQuery>;

/** What anyone holding a certificate's code may learn, and nothing more. */
export const CertificateCheck = z.object({
  valid: z.boolean(),
  apprentice: z.object({ name: z.string() }),
  course: z.object({ title: z.string() }),
  issuedAt: z.string(),
  guild: z.string(),
  revokedAt: z.string().nullable(),
});
export type CertificateCheck = z.infer<typeof CertificateCheck>;

/** 20 characters of a 32-letter alphabet (100 bits), in groups of five: TW-XXXXX-XXXXX-XXXXX-XXXXX. */
export const CERTIFICATE_CODE = /^TW(-[0-9A-HJKMNP-TV-Z]{5}){4}$/;
