import { z } from 'zod';

/** Every action the audit log records; the admin filters by these. */
export const AUDIT_ACTIONS = [
  'class.created',
  'class.updated',
  'class.archived',
  'class.unarchived',
  'class.mentors-changed',
  'invitation.sent',
  'invitation.resent',
  'invitation.revoked',
  'invitation.accepted',
  'enrolment.added',
  'enrolment.withdrawn',
  'enrolment.reenrolled',
  'roster.imported',
  'user.role-changed',
  'user.deactivated',
  'user.reactivated',
  'sign-off.recorded',
  'sign-off.withdrawn',
  'certificate.issued',
  'certificate.revoked',
] as const;
export const AuditAction = z.enum(AUDIT_ACTIONS);
export type AuditAction = z.infer<typeof AuditAction>;

export const AuditTargetType = z.enum(['class', 'invitation', 'user', 'enrolment', 'sign-off', 'certificate']);
export type AuditTargetType = z.infer<typeof AuditTargetType>;

export const AuditEventDTO = z.object({
  id: z.number().int(),
  actor: z.object({ id: z.number().int(), name: z.string() }).nullable(),
  action: AuditAction,
  targetType: AuditTargetType,
  targetId: z.number().int(),
  /** A readable name for the target as it was at the time (a class name, an e-mail address). */
  targetLabel: z.string(),
  details: z.record(z.string(), z.unknown()),
  createdAt: z.string(),
});
export type AuditEventDTO = z.infer<typeof AuditEventDTO>;

const Day = z.iso.date('Enter a date as YYYY-MM-DD.');
/** Filter fields left empty in a form arrive as `?actor=`: treated as not given. */
const optional = <S extends z.ZodType>(schema: S) => z.preprocess((v) => (v === '' ? undefined : v), schema.optional());

export const AuditQuery = z.object({
  actor: optional(z.coerce.number().int().positive()),
  action: optional(AuditAction),
  from: optional(Day),
  to: optional(Day),
  page: z.coerce.number().int().min(1).max(10_000).default(1),
});
export type AuditQuery = z.infer<typeof AuditQuery>;

export const AUDIT_PAGE_SIZE = 50;

export const AuditPage = z.object({
  events: z.array(AuditEventDTO),
  page: z.number().int(),
  pageSize: z.number().int(),
  total: z.number().int(),
  /** Everyone who appears as an actor, for the filter. */
  actors: z.array(z.object({ id: z.number().int(), name: z.string() })),
});
export type AuditPage = z.infer<typeof AuditPage>;
