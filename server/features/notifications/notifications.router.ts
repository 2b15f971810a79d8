import { Router } from 'express';
import { NotificationListQuery } from '@shared/schemas/notification';
import { idParam, parseQuery } from '../../lib/validate';
import { currentUser, requireAuth } from '../auth/guards';
import { listNotifications, markAllRead, markRead, unreadCount } from './notifications.service';

/** Everyone signed in has their own notices; nobody can read or mark another person's. */
export function notificationsRouter() {
  const router = Router();
  router.use(requireAuth);

  router.get('/', async (req, res) => {
    const { page } = parseQuery(NotificationListQuery, req);
    res.json(await listNotifications(currentUser(req).id, page));
  });

  router.get('/count', async (req, res) => {
    res.json({ unreadCount: await unreadCount(currentUser(req).id) });
  });

  router.post('/read-all', async (req, res) => {
    const userId = currentUser(req).id;
    await markAllRead(userId);
    res.json({ unreadCount: await unreadCount(userId) });
  });

  router.post('/:id/read', async (req, res) => {
    res.json(await markRead(currentUser(req).id, idParam(req)));
  });

  return router;
}
