import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { idParam } from '../../lib/validate';
import { currentUser, requireAuth, requireRole } from '../auth/guards';
import { catalogueOf } from './catalogue';
import { getCourse, getLesson, getLessonBasics, listCourses } from './courses.service';
import { markDone, markNotDone, nextLesson } from './progress.service';

/**
 * Mounted at /api/courses: every signed-in role reads every live course and lesson, answered from the catalogue.
 * Express's weak ETag lets a browser revalidate an unchanged lesson with a 304 and no body.
 */
export function coursesRouter(sequelize: Sequelize) {
  const router = Router();
  router.use(requireAuth);
  router.get('/', async (req, res) => {
    res.json({ courses: await listCourses(catalogueOf(sequelize), currentUser(req)) });
  });
  router.get('/:slug', async (req, res) => {
    res.json(await getCourse(catalogueOf(sequelize), currentUser(req), req.params.slug));
  });
  router.get('/:slug/lessons/:lessonSlug', async (req, res) => {
    res.json(await getLesson(catalogueOf(sequelize), currentUser(req), req.params.slug, req.params.lessonSlug));
  });
  return router;
}

/** Mounted at /api/lessons: lessons by id, and the apprentice's own done marks. */
export function lessonsRouter() {
  const router = Router();
  router.use(requireAuth);
  router.get('/next', requireRole('apprentice'), async (req, res) => {
    res.json(await nextLesson(currentUser(req).id));
  });
  router.get('/:id', async (req, res) => {
    res.json(await getLessonBasics(idParam(req)));
  });
  router.put('/:id/done', requireRole('apprentice'), async (req, res) => {
    res.json(await markDone(currentUser(req).id, idParam(req)));
  });
  router.delete('/:id/done', requireRole('apprentice'), async (req, res) => {
    res.json(await markNotDone(currentUser(req).id, idParam(req)));
  });
  return router;
}
