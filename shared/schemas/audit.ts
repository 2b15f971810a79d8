import * as z from 'zod/mini';
import { emptyAsAbsent, QueryInt, QueryPage } from './query';

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
  id: z.int(),
  actor: z.nullable(z.object({ id: z.int(), name: z.string() })),
  action: AuditAction,
  targetType: AuditTargetType,
  targetId: z.int(),
  /** A readable name for the target as it was at the time (a class name, an e-mail address). */
  targetLabel: z.string(),
  details: z.record(z.string(), z.unknown()),
  createdAt: z.string(),
});
export type AuditEventDTO = z.infer<typeof AuditEventDTO>;

const Day = z.iso.date('Enter a date as YYYY-MM-DD.');

export const AuditQuery = z.object({
  actor: emptyAsAbsent(QueryInt(1, Number.MAX_SAFE_INTEGER)),
  action: emptyAsAbsent(AuditAction),
  from: emptyAsAbsent(Day),
  to: emptyAsAbsent(Day),
  page: QueryPage(10_000),
});
export type AuditQuery = z.infer<typeof AuditQuery>;

export const AUDIT_PAGE_SIZE = 50;

export const AuditPage = z.object({
  events: z.array(AuditEventDTO),
  page: z.int(),
  pageSize: z.int(),
  total: z.int(),
  /** Everyone who appears as an actor, for the filter. */
  actors: z.array(z.object({ id: z.int(), name: z.string() })),
});
export type AuditPage = z.infer<typeof AuditPage>;
