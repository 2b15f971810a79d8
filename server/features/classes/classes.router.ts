import { Router } from 'express';
import { ClassCreateInput, ClassListQuery, ClassUpdateInput } from '@shared/schemas/class';
import { AppError } from '../../lib/app-error';
import { idParam, parseBody, parseQuery } from '../../lib/validate';
import { currentUser, requireAuth, requireRole } from '../auth/guards';
import { classFormOptions, createClass, getClass, listClasses, updateClass } from './classes.service';
import { classInvitationsRouter, type InvitationDeps } from './invitations.router';
import { getRoster, setEnrolmentStatus } from './roster.service';

/** Classes, their rosters and enrolments. Reading follows access rules per class; every change is the admin's. */
export function classesRouter(deps: InvitationDeps) {
  const router = Router();
  const admin = requireRole('admin');

  router.get('/form-options', admin, async (_req, res) => {
    res.json(await classFormOptions());
  });

  router.post('/', admin, async (req, res) => {
    res.status(201).json(await createClass(parseBody(ClassCreateInput, req), currentUser(req)));
  });

  router.get('/', requireAuth, async (req, res) => {
    res.json({ classes: await listClasses(currentUser(req), parseQuery(ClassListQuery, req)) });
  });

  router.get('/:id', requireAuth, async (req, res) => {
    res.json(await getClass(currentUser(req), idParam(req)));
  });

  router.patch('/:id', admin, async (req, res) => {
    const id = idParam(req);
    if (id < 0) throw AppError.notFound('That class');
    res.json(await updateClass(id, parseBody(ClassUpdateInput, req), currentUser(req)));
  });

  router.get('/:id/roster', requireRole('admin', 'mentor'), async (req, res) => {
    res.json(await getRoster(currentUser(req), idParam(req)));
  });

  for (const [action, status] of [
    ['withdraw', 'withdrawn'],
    ['reenrol', 'active'],
  ] as const) {
    router.post(`/:id/enrolments/:userId/${action}`, admin, async (req, res) => {
      const classId = idParam(req);
      const userId = idParam(req, 'userId');
      if (classId < 0 || userId < 0) throw AppError.notFound('That enrolment');
      await setEnrolmentStatus(classId, userId, status, currentUser(req));
      res.json(await getRoster(currentUser(req), classId));
    });
  }

  router.use(classInvitationsRouter(deps));
  return router;
}
