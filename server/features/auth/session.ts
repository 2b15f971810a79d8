import connectSessionSequelize from 'connect-session-sequelize';
import session from 'express-session';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { Sequelize } from 'sequelize';
import type { NextFunction, Request, Response } from 'express';
import type { UserDTO } from '@shared/schemas/user';
import type { Config } from '../../config/env';
import { findActiveUser, verifyCredentials } from './auth.service';

declare module 'express-session' {
  interface SessionData {
    passport?: { user?: number };
    /** Set when the expiry was pushed back; changing the session is what makes express-session save it. */
    renewedAt?: number;
  }
}

const SequelizeStore = connectSessionSequelize(session.Store);
const TWO_WEEKS_MS = 14 * 24 * 3600 * 1000;

/** express-session stored in SQLite plus passport-local; returns the middleware in the order they must run. */
export function sessionMiddleware(sequelize: Sequelize, config: Config) {
  // disableTouch is a documented option of the store that its typings leave out, hence the separate object.
  const storeOptions = {
    db: sequelize,
    table: 'Session',
    checkExpirationInterval: 15 * 60 * 1000,
    expiration: TWO_WEEKS_MS,
    // Reads never write: the expiry is pushed back by renewWhenHalfSpent, not on every request.
    disableTouch: true,
    // The user id is kept in its own column so that a user's sessions can be ended together.
    extendDefaultFields: (defaults: { data: string; expires: Date }, sess: { passport?: { user?: number } }) => ({
      data: defaults.data,
      expires: defaults.expires,
      userId: sess.passport?.user ?? null,
    }),
  };
  const store = new SequelizeStore(storeOptions);

  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      verifyCredentials(email, password).then((user) => done(null, user ?? false), done);
    }),
  );
  passport.serializeUser<number>((user, done) => done(null, user.id));
  // A deactivated or deleted account simply has no user any more: its open sessions stop working at once.
  passport.deserializeUser<number>((id, done) => {
    findActiveUser(id).then((user) => done(null, user ?? false), done);
  });

  return {
    store,
    handlers: [
      session({
        name: 'tickwright.sid',
        secret: config.sessionSecret,
        store,
        resave: false,
        saveUninitialized: false,
        rolling: false,
        proxy: true,
        cookie: {
          httpOnly: true,
          sameSite: 'lax',
          secure: config.appUrl.startsWith('https://'),
          maxAge: TWO_WEEKS_MS,
        },
      }),
      renewWhenHalfSpent,
      passport.session(),
    ],
  };
}

/**
 * A signed-in session is written again (new expiry, cookie sent anew) only once less than half of its two weeks is
 * left, so that ordinary reads never queue behind the database's single writer. Changing the session marks it for
 * saving; express-session then stores it with a fresh expiry.
 */
function renewWhenHalfSpent(req: Request, _res: Response, next: NextFunction) {
  const expires = req.session?.cookie.expires;
  const signedIn = req.session?.passport?.user !== undefined;
  if (signedIn && expires && expires.getTime() - Date.now() < TWO_WEEKS_MS / 2) req.session.renewedAt = Date.now();
  next();
}

/** Signs a user in on this request with a fresh session id, so an id planted before sign-in is worth nothing after. */
export async function startSignedInSession(req: Request, user: UserDTO): Promise<void> {
  await new Promise<void>((resolve, reject) => req.session.regenerate((err) => (err ? reject(err) : resolve())));
  await new Promise<void>((resolve, reject) => req.login(user, (err) => (err ? reject(err) : resolve())));
}
