import { Op, type Transaction } from 'sequelize';
import {
  OUTBOX_PAGE_SIZE,
  type MailStatus,
  type OutboxKind,
  type OutboxMessageDTO,
  type OutboxQuery,
  type OutboxReply,
} from '@shared/schemas/outbox';
import { AppError } from '../../lib/app-error';
import type { OutgoingMail } from '../../lib/mailer';
import { OutboxMessage } from './outbox-message.model';

/** How long the outbox keeps trying a message before it calls it failed. */
export const RETRY_FOR_MS = 24 * 3600 * 1000;
const retryUntil = () => new Date(Date.now() + RETRY_FOR_MS);

interface QueueOptions {
  kind: OutboxKind;
  /** The text holds a one-time link: never logged, emptied once delivered. */
  secret?: boolean;
  /** When the link in the message runs out; it is not sent after that. */
  expiresAt?: Date | null;
  transaction?: Transaction;
}

/**
 * Puts an e-mail in the outbox. Call it inside the transaction of the action that causes it, so that the mail exists
 * exactly when the action does; the outbox worker delivers it moments later, whatever the mail server does.
 */
export async function queueMail(mail: OutgoingMail, options: QueueOptions): Promise<OutboxMessage> {
  const { kind, secret = false, expiresAt = null, transaction } = options;
  return OutboxMessage.create(
    { ...mail, kind, secret, expiresAt, nextAttemptAt: new Date(), giveUpAt: retryUntil() },
    { transaction },
  );
}

const iso = (d: Date | null) => (d ? d.toISOString() : null);

const toDTO = (m: OutboxMessage): OutboxMessageDTO => ({
  id: m.id,
  to: m.to,
  subject: m.subject,
  kind: m.kind,
  state: m.state,
  attempts: m.attempts,
  lastError: m.lastError,
  nextAttemptAt: m.state === 'queued' ? iso(m.nextAttemptAt) : null,
  sentAt: iso(m.sentAt),
  createdAt: m.createdAt.toISOString(),
});

/** The guild office's view: newest first, never the message text (it may hold someone's one-time link). */
export async function listOutbox(query: OutboxQuery): Promise<OutboxReply> {
  const byState = (await OutboxMessage.count({ group: ['state'] })) as unknown as { state: string; count: number }[];
  const counts = { queued: 0, sent: 0, failed: 0 };
  for (const { state, count: n } of byState) if (state in counts) counts[state as keyof typeof counts] = n;
  // The per-state counts already give the total, so the page itself needs no count of its own.
  const total = query.state ? counts[query.state] : counts.queued + counts.sent + counts.failed;
  const rows = await OutboxMessage.findAll({
    where: query.state ? { state: query.state } : {},
    attributes: { exclude: ['text'] },
    order: [['id', 'DESC']],
    limit: OUTBOX_PAGE_SIZE,
    offset: (query.page - 1) * OUTBOX_PAGE_SIZE,
  });
  return { messages: rows.map(toDTO), total, page: query.page, pageSize: OUTBOX_PAGE_SIZE, counts };
}

/** Sends a message that the outbox gave up on again, from scratch: a fresh day of retries. */
export async function resendMessage(id: number): Promise<OutboxMessageDTO> {
  const message = await OutboxMessage.findByPk(id, { attributes: { exclude: ['text'] } });
  if (!message) throw AppError.notFound('That message');
  if (message.state !== 'failed') throw AppError.conflict('Only a message that could not be delivered can be resent.');
  if (message.expiresAt && message.expiresAt <= new Date()) {
    throw AppError.conflict('The link in this message has run out: send a new invitation or ask for a new reset.');
  }
  await message.update({
    state: 'queued',
    attempts: 0,
    lastError: null,
    nextAttemptAt: new Date(),
    giveUpAt: retryUntil(),
  });
  return toDTO(message);
}

/** What became of the given messages, for screens that show a mail's fate beside what it was about. */
export async function mailStatuses(ids: (number | null)[]): Promise<Map<number, MailStatus>> {
  const wanted = ids.filter((id): id is number => id !== null);
  if (wanted.length === 0) return new Map();
  const rows = await OutboxMessage.findAll({
    where: { id: { [Op.in]: wanted } },
    attributes: ['id', 'state', 'lastError'],
  });
  return new Map(rows.map((r) => [r.id, { state: r.state, lastError: r.lastError }]));
}
