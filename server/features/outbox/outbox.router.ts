import { Router } from 'express';
import { OutboxQuery } from '@shared/schemas/outbox';
import { idParam, parseQuery } from '../../lib/validate';
import { requireRole } from '../auth/guards';
import { listOutbox, resendMessage } from './outbox.service';

/** Mounted at /api/outbox: the guild office watches outgoing mail and sends again what could not be delivered. */
export function outboxRouter() {
  const router = Router();
  router.use(requireRole('admin'));
  router.get('/', async (req, res) => {
    res.json(await listOutbox(parseQuery(OutboxQuery, req)));
  });
  router.post('/:id/resend', async (req, res) => {
    res.json(await resendMessage(idParam(req)));
  });
  return router;
}
