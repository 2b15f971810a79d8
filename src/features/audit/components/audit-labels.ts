import type { AuditAction, AuditEventDTO } from '@shared/schemas/audit';

export const ACTION_LABEL: Record<AuditAction, string> = {
  'class.created': 'Created a class',
  'class.updated': 'Edited a class',
  'class.archived': 'Archived a class',
  'class.unarchived': 'Brought back a class',
  'class.mentors-changed': 'Changed mentors',
  'invitation.sent': 'Sent an invitation',
  'invitation.resent': 'Resent an invitation',
  'invitation.revoked': 'Revoked an invitation',
  'invitation.accepted': 'Accepted an invitation',
  'enrolment.added': 'Enrolled an apprentice',
  'enrolment.withdrawn': 'Withdrew an apprentice',
  'enrolment.reenrolled': 'Re-enrolled an apprentice',
  'roster.imported': 'Imported a roster file',
  'user.role-changed': 'Changed a role',
  'user.deactivated': 'Deactivated an account',
  'user.reactivated': 'Reactivated an account',
  'sign-off.recorded': 'Signed off a skill',
  'sign-off.withdrawn': 'Withdrew a sign-off',
  'certificate.issued': 'Issued a certificate',
  'certificate.revoked': 'Revoked a certificate',
};

const list = (v: unknown) => (Array.isArray(v) ? v.join(', ') : '');

/** The details that matter, in words: what changed from what, and in which class. */
export function describeDetails(e: AuditEventDTO): string {
  const d = e.details;
  const parts: string[] = [];
  if (e.action === 'class.updated' && d.changes && typeof d.changes === 'object') {
    for (const [field, pair] of Object.entries(d.changes as Record<string, [unknown, unknown]>))
      parts.push(`${field}: ${pair[0]} → ${pair[1]}`);
  }
  if (e.action === 'class.mentors-changed') {
    if (list(d.added)) parts.push(`added ${list(d.added)}`);
    if (list(d.removed)) parts.push(`removed ${list(d.removed)}`);
  }
  if (e.action === 'roster.imported')
    parts.push(`${d.rows} rows: ${d.invited} invited, ${d.enrolled} enrolled, ${d.skipped} left out`);
  if (e.action === 'user.role-changed') parts.push(`${d.from} → ${d.to}`);
  if (typeof d.className === 'string') parts.push(`class ${d.className}`);
  if (d.source === 'roster file') parts.push('from a roster file');
  return parts.join('; ');
}
