import type { RequestHandler } from 'express';
import type { Role, UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';

export const requireAuth: RequestHandler = (req, _res, next) => {
  if (!req.user) return next(new AppError('UNAUTHENTICATED', 'Please sign in.', 401));
  next();
};

export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next(new AppError('UNAUTHENTICATED', 'Please sign in.', 401));
    if (!roles.includes(req.user.role)) return next(AppError.forbidden());
    next();
  };
}

/** The signed-in user of a request that has passed requireAuth. */
export function currentUser(req: Express.Request): UserDTO {
  if (!req.user) throw new AppError('UNAUTHENTICATED', 'Please sign in.', 401);
  return req.user;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends UserDTO {}
  }
}
