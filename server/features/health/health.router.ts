import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { APP_VERSION } from '../../lib/version';

export function healthRouter(sequelize: Sequelize) {
  const router = Router();
  router.get('/', async (_req, res) => {
    const db = await sequelize
      .query('SELECT 1')
      .then(() => 'ok' as const)
      .catch(() => 'down' as const);
    res.status(db === 'ok' ? 200 : 503).json({ ok: db === 'ok', db, version: APP_VERSION });
  });
  return router;
}
