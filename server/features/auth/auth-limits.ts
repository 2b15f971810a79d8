import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit, type RateLimitInfo } from 'express-rate-limit';
import { AppError } from '../../lib/app-error';

const MINUTE_MS = 60 * 1000;

/**
 * Limits on the two routes that anyone may call with somebody else's address: sign-in and asking for a reset link.
 * Refusals answer 429 with Retry-After in the usual error shape. Counts are keyed by the address as typed (trimmed,
 * lower-case), never by whether it has an account, so a refusal tells nothing about that.
 *
 * The counts are kept in memory, not in the database: Tickwright runs as one process, and a restart that forgets
 * them is something only the operator can cause, not an attacker; in exchange a flood of requests never turns into a
 * flood of database writes. Each app instance gets its own counters.
 */
export const SIGN_IN_LIMITS = {
  /** Wrong passwords for one address from one client: the guesser is stopped, nobody else. */
  pair: { windowMs: 15 * MINUTE_MS, limit: 10 },
  /** Wrong passwords from one client, whatever the address: stops one machine trying many accounts. */
  client: { windowMs: 15 * MINUTE_MS, limit: 30 },
  /** Wrong passwords for one address from everywhere: slower, so that many machines cannot guess freely either. */
  address: { windowMs: 60 * MINUTE_MS, limit: 50 },
} as const;

export const RESET_REQUEST_LIMITS = {
  /** Reset requests naming one address: at most this many e-mails to one inbox per window. */
  address: { windowMs: 60 * MINUTE_MS, limit: 3 },
  /** Reset requests from one client, whatever the address (a workshop shares one address to the internet). */
  client: { windowMs: 60 * MINUTE_MS, limit: 20 },
} as const;

const addressOf = (req: Request): string | null => {
  const email: unknown = req.body?.email;
  return typeof email === 'string' && email.trim() ? email.trim().toLowerCase() : null;
};
export const clientOf = (req: Request) => ipKeyGenerator(req.ip ?? 'unknown');

type Window = { windowMs: number; limit: number };
type Key = (req: Request) => string | null;

/** One limit in the app's error shape (429, Retry-After); also used by other public routes (the certificate check). */
export function limiter(
  window: Window,
  key: Key,
  onlyFailures: boolean,
  refuse: (wait: string) => string,
): RequestHandler {
  return rateLimit({
    ...window,
    skipSuccessfulRequests: onlyFailures,
    standardHeaders: false,
    legacyHeaders: false,
    skip: (req) => key(req) === null,
    keyGenerator: (req) => key(req)!,
    handler: (req, res, next) => {
      const info = (req as Request & { rateLimit?: RateLimitInfo }).rateLimit;
      const resetAt = info?.resetTime?.getTime() ?? Date.now() + window.windowMs;
      const seconds = Math.max(1, Math.ceil((resetAt - Date.now()) / 1000));
      const minutes = Math.ceil(seconds / 60);
      res.setHeader('Retry-After', String(seconds));
      next(new AppError('TOO_MANY_ATTEMPTS', refuse(`${minutes} minute${minutes === 1 ? '' : 's'}`), 429));
    },
  });
}

/**
 * Only failed sign-ins count. The right password from a client that has not been failing gets in unless the address
 * itself has drawn 50 failures within the hour. The order matters: a request refused per pair never reaches the
 * per-address count, so one client retrying after its refusal cannot lock the address for everyone.
 */
export function signInLimits(): RequestHandler[] {
  const refuse = (wait: string) => `Too many failed sign-ins. For safety, wait ${wait} before trying again.`;
  return [
    limiter(SIGN_IN_LIMITS.client, (req) => `client:${clientOf(req)}`, true, refuse),
    limiter(
      SIGN_IN_LIMITS.pair,
      (req) => (addressOf(req) ? `pair:${clientOf(req)}|${addressOf(req)}` : null),
      true,
      refuse,
    ),
    limiter(SIGN_IN_LIMITS.address, (req) => (addressOf(req) ? `address:${addressOf(req)}` : null), true, refuse),
  ];
}

/** Every request counts, answered or not: each one may send an e-mail. */
export function resetRequestLimits(): RequestHandler[] {
  const refuse = (wait: string) =>
    `Too many requests for a reset link. Wait ${wait} and ask again; a link already sent still works.`;
  return [
    limiter(RESET_REQUEST_LIMITS.client, (req) => `client:${clientOf(req)}`, false, refuse),
    limiter(
      RESET_REQUEST_LIMITS.address,
      (req) => (addressOf(req) ? `address:${addressOf(req)}` : null),
      false,
      refuse,
    ),
  ];
}
