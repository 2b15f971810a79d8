import * as z from 'zod/mini';
import { emptyAsAbsent, QueryPage } from './query';

/**
 * Every e-mail waits in the outbox until it is delivered. `queued` covers both "not tried yet" and "will be tried
 * again" (see attempts and lastError); `failed` means the outbox gave up (after a day of retries, or the link in the
 * message ran out first) and only the guild office's resend tries again.
 */
export const OUTBOX_STATES = ['queued', 'sent', 'failed'] as const;
export const OutboxState = z.enum(OUTBOX_STATES);
export type OutboxState = z.infer<typeof OutboxState>;

export const OUTBOX_KINDS = ['password-reset', 'invitation', 'enrolment', 'notification'] as const;
export type OutboxKind = (typeof OUTBOX_KINDS)[number];

export const OutboxMessageDTO = z.object({
  id: z.int(),
  to: z.string(),
  subject: z.string(),
  kind: z.enum(OUTBOX_KINDS),
  state: OutboxState,
  attempts: z.int(),
  lastError: z.nullable(z.string()),
  nextAttemptAt: z.nullable(z.string()),
  sentAt: z.nullable(z.string()),
  createdAt: z.string(),
});
export type OutboxMessageDTO = z.infer<typeof OutboxMessageDTO>;

export const OUTBOX_PAGE_SIZE = 50;

export const OutboxQuery = z.object({
  state: emptyAsAbsent(OutboxState),
  page: QueryPage(10_000),
});
export type OutboxQuery = z.infer<typeof OutboxQuery>;

export const OutboxReply = z.object({
  messages: z.array(OutboxMessageDTO),
  total: z.int(),
  page: z.int(),
  pageSize: z.int(),
  /** How many are in each state, whatever the filter. */
  counts: z.object({ queued: z.int(), sent: z.int(), failed: z.int() }),
});
export type OutboxReply = z.infer<typeof OutboxReply>;

/** What an invitation's e-mail has come to, shown beside it. */
export const MailStatus = z.object({ state: OutboxState, lastError: z.nullable(z.string()) });
export type MailStatus = z.infer<typeof MailStatus>;
