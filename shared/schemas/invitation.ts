import * as z from 'zod/mini';
import { MailStatus, OutboxState } from './outbox';
import { QueryId } from './query';
import { NewPassword } from './user';

export const INVITATION_DAYS = 14;
export const MAX_INVITES_PER_REQUEST = 200;

/** Addresses are checked one by one on the server, so that one bad address is reported, not a failed request. */
export const InviteInput = z.object({
  emails: z
    .array(z.string().check(z.maxLength(320)))
    .check(
      z.minLength(1, 'Enter at least one e-mail address.'),
      z.maxLength(MAX_INVITES_PER_REQUEST, `At most ${MAX_INVITES_PER_REQUEST} addresses at a time.`),
    ),
});
export type InviteInput = z.infer<typeof InviteInput>;

/** What happened to one address: the first two are successes, the rest say why nothing was done. */
export const InviteOutcome = z.enum([
  'enrolled',
  'invited',
  'bad-address',
  'duplicate',
  'already-enrolled',
  'already-invited',
  'class-full',
  'not-an-apprentice',
  'account-inactive',
]);
export type InviteOutcome = z.infer<typeof InviteOutcome>;

export const InviteResult = z.object({
  email: z.string(),
  outcome: InviteOutcome,
  message: z.string(),
  /** The e-mail's state in the outbox ("queued" at first); null where no mail was due. */
  mail: z.nullable(OutboxState),
});
export type InviteResult = z.infer<typeof InviteResult>;

export const InviteReply = z.object({ results: z.array(InviteResult) });
export type InviteReply = z.infer<typeof InviteReply>;

export const ResendReply = z.object({ mail: MailStatus });

export const InvitationDTO = z.object({
  id: z.int(),
  classId: z.int(),
  className: z.string(),
  email: z.string(),
  name: z.nullable(z.string()),
  expiresAt: z.string(),
  expired: z.boolean(),
  sentAt: z.string(),
  invitedBy: z.nullable(z.object({ id: z.int(), name: z.string() })),
  /** What became of the latest e-mail carrying the link (null for invitations older than the outbox). */
  mail: z.nullable(MailStatus),
});
export type InvitationDTO = z.infer<typeof InvitationDTO>;

export const InvitationListQuery = z.object({ classId: QueryId });
export const InvitationListReply = z.object({ invitations: z.array(InvitationDTO) });
export type InvitationListReply = z.infer<typeof InvitationListReply>;

/** What the public accept page may show about an invitation: nothing beyond the class, course and invitee. */
export const InvitationPreview = z.object({
  email: z.string(),
  name: z.nullable(z.string()),
  className: z.string(),
  courseTitle: z.string(),
  courseSlug: z.string(),
  expiresAt: z.string(),
});
export type InvitationPreview = z.infer<typeof InvitationPreview>;

export const AcceptInvitationInput = z.object({
  name: z.string().check(z.trim(), z.minLength(2, 'Enter your name.'), z.maxLength(120)),
  password: NewPassword,
});
export type AcceptInvitationInput = z.infer<typeof AcceptInvitationInput>;

export const RosterRow = z.object({
  name: z.string().check(z.trim(), z.maxLength(120)),
  email: z.string().check(z.trim(), z.maxLength(320)),
});
export type RosterRow = z.infer<typeof RosterRow>;

/** A row of an uploaded roster as it would fare on import; `ok` rows are the ones imported on confirming. */
export const RosterPreviewRow = z.extend(RosterRow, {
  /** Line number in the file, counting the header as line 1. */
  line: z.int(),
  outcome: InviteOutcome,
  ok: z.boolean(),
  message: z.string(),
});
export type RosterPreviewRow = z.infer<typeof RosterPreviewRow>;

export const RosterPreviewReply = z.object({
  rows: z.array(RosterPreviewRow),
  okCount: z.int(),
  problemCount: z.int(),
});
export type RosterPreviewReply = z.infer<typeof RosterPreviewReply>;

export const RosterImportInput = z.object({
  rows: z.array(RosterRow).check(z.minLength(1, 'There are no rows to import.'), z.maxLength(MAX_INVITES_PER_REQUEST)),
});
export type RosterImportInput = z.infer<typeof RosterImportInput>;
