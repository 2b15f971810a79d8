import { Router } from 'express';
import { requireRole } from './guards';

/** Where the local fake mail service shows what the app sent; null when real SMTP is configured or it did not start. */
export function devMailRouter(inboxUrl: string | null) {
  const router = Router();
  router.get('/', requireRole('admin'), (_req, res) => {
    res.json({ inboxUrl });
  });
  return router;
}
