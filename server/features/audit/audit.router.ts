import { Router } from 'express';
import { AuditQuery } from '@shared/schemas/audit';
import { parseQuery } from '../../lib/validate';
import { requireRole } from '../auth/guards';
import { listAudit } from './audit.service';

export function auditRouter() {
  const router = Router();
  router.get('/', requireRole('admin'), async (req, res) => {
    res.json(await listAudit(parseQuery(AuditQuery, req)));
  });
  return router;
}
