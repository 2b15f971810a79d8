import { Router } from 'express';
import { CalculationCreateInput, CalculationListQuery } from '@shared/schemas/calculation';
import { idParam, parseBody, parseQuery } from '../../lib/validate';
import { currentUser, requireAuth, requireRole } from '../auth/guards';
import { deleteCalculation, getCalculation, listCalculations, saveCalculation } from './calculations.service';

/** Saved calculator results. Saving is the apprentice's (results go into their bench log); reading follows access.ts. */
export function calculationsRouter() {
  const router = Router();
  router.use(requireAuth);

  router.post('/', requireRole('apprentice'), async (req, res) => {
    const saved = await saveCalculation(currentUser(req).id, parseBody(CalculationCreateInput, req));
    res.status(201).json(saved);
  });

  router.get('/', async (req, res) => {
    res.json({ calculations: await listCalculations(currentUser(req), parseQuery(CalculationListQuery, req)) });
  });

  router.get('/:id', async (req, res) => {
    res.json(await getCalculation(currentUser(req), idParam(req)));
  });

  router.delete('/:id', async (req, res) => {
    await deleteCalculation(currentUser(req), idParam(req));
    res.status(204).end();
  });

  return router;
}
