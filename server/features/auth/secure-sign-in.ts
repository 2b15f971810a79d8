import type { Request, RequestHandler } from 'express';
import { AppError } from '../../lib/app-error';

/**
 * With an https APP_URL the session cookie is marked Secure, and express-session leaves it out of any reply to a plain
 * http request. A sign-in over http would then answer 200 while signing nobody in. Routes that start a session refuse
 * such a request with a clear error instead.
 *
 * "Secure" is judged as express-session judges it with `proxy: true` (session.ts): an encrypted socket, or a proxy
 * saying X-Forwarded-Proto: https. Any other test could disagree with the cookie's fate.
 */
function sessionSeesHttps(req: Request): boolean {
  if ((req.socket as { encrypted?: boolean }).encrypted) return true;
  const forwarded = req.get('x-forwarded-proto') ?? '';
  return forwarded.split(',')[0].trim().toLowerCase() === 'https';
}

export function requireHttpsForSignIn(appUrl: string): RequestHandler {
  const httpsOnly = appUrl.startsWith('https://');
  return (req, _res, next) => {
    if (!httpsOnly || sessionSeesHttps(req)) return next();
    next(
      new AppError(
        'HTTPS_REQUIRED',
        `Signing in works only over a secure connection. Open ${appUrl} (with https) and sign in there.`,
        403,
      ),
    );
  };
}
