import type { Request, RequestHandler } from 'express';
import { rateLimit, type RateLimitInfo } from 'express-rate-limit';
import { AppError } from '../../lib/app-error';

const WINDOW_MS = 15 * 60 * 1000;
const MAX_FAILURES = 10;

/**
 * Brute-force limits on sign-in: more than 10 failed attempts within 15 minutes, counted per client (IP address)
 * and per e-mail address, are refused with 429 and Retry-After. Successful sign-ins are not counted.
 *
 * The counts are kept in memory, not in the database: Tickwright runs as one process, and a restart that forgets
 * them is something only the operator can cause, not an attacker; in exchange a flood of wrong guesses never turns
 * into a flood of database writes. Each app instance gets its own counters.
 */
export function signInLimits(): [RequestHandler, RequestHandler] {
  const perClient = rateLimit(common());
  const perAddress = rateLimit({
    ...common(),
    skip: (req) => addressOf(req) === null,
    keyGenerator: (req) => `address:${addressOf(req)}`,
  });
  return [perClient, perAddress];
}

function common() {
  return {
    windowMs: WINDOW_MS,
    limit: MAX_FAILURES,
    skipSuccessfulRequests: true,
    standardHeaders: false,
    legacyHeaders: false,
    handler: tooManyAttempts,
  } as const;
}

const addressOf = (req: Request): string | null => {
  const email: unknown = req.body?.email;
  return typeof email === 'string' && email.trim() ? email.trim().toLowerCase() : null;
};

const tooManyAttempts: RequestHandler = (req, res, next) => {
  const info = (req as Request & { rateLimit?: RateLimitInfo }).rateLimit;
  const seconds = Math.max(1, Math.ceil(((info?.resetTime?.getTime() ?? Date.now() + WINDOW_MS) - Date.now()) / 1000));
  const minutes = Math.ceil(seconds / 60);
  res.setHeader('Retry-After', String(seconds));
  const wait = `${minutes} minute${minutes === 1 ? '' : 's'}`;
  next(
    new AppError('TOO_MANY_ATTEMPTS', `Too many failed sign-ins. For safety, wait ${wait} before trying again.`, 429),
  );
};
