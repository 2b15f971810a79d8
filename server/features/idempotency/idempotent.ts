import type { NextFunction, Request, Response } from 'express';
import { Op, UniqueConstraintError } from 'sequelize';
import { AppError } from '../../lib/app-error';
import { currentUser } from '../auth/guards';
import { IdempotencyKey } from './idempotency-key.model';

const KEEP_MS = 24 * 3600 * 1000;
/** A request still marked in progress after this long died with its process; its key may be used afresh. */
const ABANDONED_MS = 5 * 60 * 1000;
const KEY = /^[\x21-\x7e]{1,200}$/;

const inProgress = () =>
  new AppError('REQUEST_IN_PROGRESS', 'The same request is still being handled. Wait a moment and look again.', 409);

/**
 * For a signed-in POST that creates something: with an `Idempotency-Key` header, the first successful answer is kept
 * for a day and the same key from the same user gets that answer again, without doing the work twice. A retry while
 * the first is still running answers 409; a first attempt that failed leaves nothing behind, so a retry runs afresh.
 * Without the header the route behaves as usual. Mount it after the route's sign-in guard.
 */
export async function idempotent(req: Request, res: Response, next: NextFunction) {
  const key = req.get('Idempotency-Key');
  if (key === undefined) return next();
  if (!KEY.test(key)) {
    throw AppError.badRequest('The Idempotency-Key header must be 1 to 200 visible characters.', {
      'Idempotency-Key': ['Use 1 to 200 visible characters, such as a random UUID.'],
    });
  }
  const userId = currentUser(req).id;
  const request = `${req.method} ${req.baseUrl}${req.path}`;
  const seen = await IdempotencyKey.findOne({ where: { userId, key } });
  if (seen) {
    const age = Date.now() - seen.createdAt.getTime();
    if (seen.request !== request && age < KEEP_MS) {
      throw new AppError('KEY_REUSED', 'This Idempotency-Key was already used for a different request.', 422);
    }
    if (seen.status !== null && age < KEEP_MS) {
      res.set('Idempotent-Replayed', 'true');
      return res.status(seen.status).type('application/json').send(seen.body);
    }
    if (seen.status === null && age < ABANDONED_MS) throw inProgress();
    await IdempotencyKey.destroy({ where: { id: seen.id } });
  }
  let row: IdempotencyKey;
  try {
    row = await IdempotencyKey.create({ userId, key, request });
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw inProgress();
    throw err;
  }

  // The answer is stored before it is sent, so a retry that follows it at once already finds it.
  const send = res.json.bind(res);
  res.json = (body: unknown) => {
    const ok = res.statusCode >= 200 && res.statusCode < 300;
    const stored = ok
      ? row.update({ status: res.statusCode, body: JSON.stringify(body) })
      : IdempotencyKey.destroy({ where: { id: row.id } });
    stored.then(
      () => send(body),
      (err: unknown) => next(err),
    );
    return res;
  };
  next();
}

/** Keys older than a day are of no more use; removed now and then by the caller. */
export async function forgetOldKeys(): Promise<number> {
  return IdempotencyKey.destroy({ where: { createdAt: { [Op.lt]: new Date(Date.now() - KEEP_MS) } } });
}
