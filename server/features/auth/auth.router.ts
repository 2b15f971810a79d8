import { Router, type Request } from 'express';
import passport from 'passport';
import * as z from 'zod/mini';
import { LoginInput, PasswordResetInput, PasswordResetRequest, type UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { parseBody } from '../../lib/validate';
import { requireAuth, currentUser } from './guards';
import { startSignedInSession } from './session';
import {
  findOpenReset,
  requestPasswordReset,
  resetLinkGone,
  resetPassword,
  spendOpenResets,
} from './password-reset.service';
import { resetRequestLimits, signInLimits } from './auth-limits';
import { requireHttpsForSignIn } from './secure-sign-in';

const RESET_REQUESTED = {
  message:
    'If that address belongs to an active account, an e-mail with a link to set a new password is on its way. The link works for one hour.',
};
const ResetToken = z.string().check(z.minLength(1), z.maxLength(200));

export function authRouter(deps: { appUrl: string }) {
  const router = Router();

  router.post('/login', requireHttpsForSignIn(deps.appUrl), ...signInLimits(), async (req, res) => {
    const input = parseBody(LoginInput, req);
    req.body = input;
    const user = await authenticate(req);
    if (!user) throw new AppError('BAD_CREDENTIALS', 'That e-mail and password do not match an active account.', 401);
    await spendOpenResets(user.id);
    await startSignedInSession(req, user);
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

  router.post('/password-reset', ...resetRequestLimits(), async (req, res) => {
    const { email } = parseBody(PasswordResetRequest, req);
    // Answered before the lookup and the queued e-mail, so that neither the reply nor its timing tells whether the
    // address has an account. A failure afterwards still reaches the error handler, which logs it.
    res.status(202).json(RESET_REQUESTED);
    await requestPasswordReset(email, deps.appUrl);
  });

  // Lets the reset page say at once that a link is spent, before anyone types a new password.
  router.get('/password-reset/:token', async (req, res) => {
    const token = ResetToken.safeParse(req.params.token);
    if (!token.success) throw resetLinkGone();
    await findOpenReset(token.data);
    res.status(204).end();
  });

  router.post('/password-reset/:token', async (req, res) => {
    const { password } = parseBody(PasswordResetInput, req);
    const token = ResetToken.safeParse(req.params.token);
    if (!token.success) throw resetLinkGone();
    await resetPassword(token.data, password);
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
