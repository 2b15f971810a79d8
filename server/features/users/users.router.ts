import { Router } from 'express';
import { UserListQuery, UserUpdateInput } from '@shared/schemas/user';
import { idParam, parseBody, parseQuery } from '../../lib/validate';
import { currentUser, requireRole } from '../auth/guards';
import { updateUser } from './user-admin.service';
import { listUsers } from './users.service';

export function usersRouter() {
  const router = Router();
  router.get('/', requireRole('admin'), async (req, res) => {
    res.json(await listUsers(parseQuery(UserListQuery, req)));
  });
  router.patch('/:id', requireRole('admin'), async (req, res) => {
    res.json({ user: await updateUser(idParam(req), parseBody(UserUpdateInput, req), currentUser(req)) });
  });
  return router;
}
