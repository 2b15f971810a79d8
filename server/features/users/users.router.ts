import { Router } from 'express';
import { UserListQuery } from '@shared/schemas/user';
import { parseQuery } from '../../lib/validate';
import { requireRole } from '../auth/guards';
import { listUsers } from './users.service';

export function usersRouter() {
  const router = Router();
  router.get('/', requireRole('admin'), async (req, res) => {
    res.json(await listUsers(parseQuery(UserListQuery, req)));
  });
  return router;
}
