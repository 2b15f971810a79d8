import type { RequestHandler } from 'express';
import { AppError } from '../../lib/app-error';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Cross-site request protection: a state-changing request must say it comes from this app, by Origin or, where a
 * browser leaves that out, by Referer. The app's configured URL and the origin the request itself was sent to count.
 */
export function originCheck(appUrl: string): RequestHandler {
  const configured = new URL(appUrl).origin;
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    const claimed = originOf(req.get('origin')) ?? originOf(req.get('referer'));
    const own = `${req.protocol}://${req.get('host')}`;
    if (claimed && (claimed === configured || claimed === own)) return next();
    next(new AppError('BAD_ORIGIN', 'This request did not come from Tickwright itself.', 403));
  };
}

function originOf(value: string | undefined): string | null {
  if (!value || value === 'null') return null;
  try {
    return new URL(value).origin;
  } catch {
    return null;
  }
}
