import { Op } from 'sequelize';
import type { Logger } from '../../lib/logger';
import type { Mailer } from '../../lib/mailer';
import { OutboxMessage } from './outbox-message.model';

const BATCH = 20;
const FIRST_RETRY_MS = 30_000;
const LONGEST_WAIT_MS = 3600_000;

/** 30 s after the first failure, doubling each time, never more than an hour apart. */
export const retryDelayMs = (attempts: number) => Math.min(FIRST_RETRY_MS * 2 ** (attempts - 1), LONGEST_WAIT_MS);

const LINK_RAN_OUT = 'The link in this message ran out before it could be delivered.';

export interface OutboxWorker {
  /** Delivers every message that is due now, one after another; resolves with how many were delivered. */
  deliverDue(): Promise<number>;
  start(): void;
  stop(): void;
}

/**
 * Delivers the outbox in the background: polls for due messages, sends them one at a time, and records each outcome.
 * A restart simply picks up whatever is still queued. Only one pass runs at a time in a process.
 */
export function createOutboxWorker(deps: { mailer: Mailer; logger: Logger; pollMs?: number }): OutboxWorker {
  const { mailer, logger, pollMs = 1000 } = deps;
  let tail: Promise<unknown> = Promise.resolve();
  let waiting = 0;
  let timer: NodeJS.Timeout | null = null;

  async function deliverOne(message: OutboxMessage): Promise<boolean> {
    const now = new Date();
    if (message.expiresAt && message.expiresAt <= now) {
      await message.update({ state: 'failed', lastError: LINK_RAN_OUT, nextAttemptAt: null });
      return false;
    }
    const attempts = message.attempts + 1;
    try {
      await mailer.send({ to: message.to, subject: message.subject, text: message.text });
    } catch (err) {
      const lastError = (err instanceof Error ? err.message : String(err)).slice(0, 500);
      const giveUp = now >= message.giveUpAt;
      await message.update({
        attempts,
        lastError,
        state: giveUp ? 'failed' : 'queued',
        nextAttemptAt: giveUp ? null : new Date(now.getTime() + retryDelayMs(attempts)),
      });
      logger.warn({ mailId: message.id, kind: message.kind, attempts, giveUp, error: lastError }, 'mail not delivered');
      return false;
    }
    await message.update({
      attempts,
      state: 'sent',
      sentAt: new Date(),
      lastError: null,
      nextAttemptAt: null,
      // A one-time link has no business lying in the database once it is in the person's mailbox.
      ...(message.secret ? { text: '' } : {}),
    });
    return true;
  }

  async function runPass(): Promise<number> {
    let delivered = 0;
    for (;;) {
      const due = await OutboxMessage.findAll({
        where: { state: 'queued', nextAttemptAt: { [Op.lte]: new Date() } },
        order: [['id', 'ASC']],
        limit: BATCH,
      });
      for (const message of due) if (await deliverOne(message)) delivered += 1;
      if (due.length < BATCH) return delivered;
    }
  }

  /** Passes run one after another; a caller always gets a pass that starts after its own message was written. */
  function deliverDue(): Promise<number> {
    waiting += 1;
    const pass = tail.then(runPass).finally(() => {
      waiting -= 1;
    });
    tail = pass.catch(() => undefined);
    return pass;
  }

  return {
    deliverDue,
    start() {
      if (timer) return;
      timer = setInterval(() => {
        if (waiting > 0) return;
        deliverDue().catch((err: Error) => logger.error({ err }, 'outbox pass failed'));
      }, pollMs);
      timer.unref();
    },
    stop() {
      if (timer) clearInterval(timer);
      timer = null;
    },
  };
}
