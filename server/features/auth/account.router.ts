import { Router } from 'express';
import { AccountUpdateInput, PasswordChangeInput } from '@shared/schemas/user';
import { parseBody } from '../../lib/validate';
import { changePassword, updateAccount } from './account.service';
import { currentUser, requireAuth } from './guards';

/** The signed-in person's own account: every role, and only ever their own row. */
export function accountRouter() {
  const router = Router();
  router.use(requireAuth);

  router.patch('/', async (req, res) => {
    const user = await updateAccount(currentUser(req).id, parseBody(AccountUpdateInput, req));
    res.json({ user });
  });

  router.post('/password', async (req, res) => {
    await changePassword(currentUser(req).id, parseBody(PasswordChangeInput, req), req.sessionID);
    res.status(204).end();
  });

  return router;
}
