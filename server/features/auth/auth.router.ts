import { Router, type Request } from 'express';
import passport from 'passport';
import { LoginInput, type UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { parseBody } from '../../lib/validate';
import { requireAuth, currentUser } from './guards';

export function authRouter() {
  const router = Router();

  router.post('/login', async (req, res) => {
    const input = parseBody(LoginInput, req);
    req.body = input;
    const user = await authenticate(req);
    if (!user) throw new AppError('BAD_CREDENTIALS', 'That e-mail and password do not match an active account.', 401);
    // A fresh session id at sign-in, so that an id planted before sign-in is worth nothing after it.
    await new Promise<void>((resolve, reject) => req.session.regenerate((err) => (err ? reject(err) : resolve())));
    await new Promise<void>((resolve, reject) => req.login(user, (err) => (err ? reject(err) : resolve())));
    res.json({ user });
  });

  router.get('/me', requireAuth, (req, res) => {
    res.json({ user: currentUser(req) });
  });

  router.post('/logout', async (req, res) => {
    await new Promise<void>((resolve, reject) => req.logout((err) => (err ? reject(err) : resolve())));
    await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
    res.clearCookie('tickwright.sid');
    res.status(204).end();
  });

  return router;
}

function authenticate(req: Request): Promise<UserDTO | null> {
  return new Promise((resolve, reject) => {
    passport.authenticate('local', { session: false }, (err: unknown, user: UserDTO | false) => {
      if (err) reject(err);
      else resolve(user || null);
    })(req);
  });
}
