import { Router } from 'express';
import { idParam } from '../../lib/validate';
import { currentUser, requireAuth, requireRole } from '../auth/guards';
import { getCourse, getLesson, getLessonBasics, listCourses } from './courses.service';
import { markDone, markNotDone, nextLesson } from './progress.service';

/** Mounted at /api/courses: every signed-in role reads every live course and lesson. */
export function coursesRouter() {
  const router = Router();
  router.use(requireAuth);
  router.get('/', async (req, res) => {
    res.json({ courses: await listCourses(currentUser(req)) });
  });
  router.get('/:slug', async (req, res) => {
    res.json(await getCourse(currentUser(req), req.params.slug));
  });
  router.get('/:slug/lessons/:lessonSlug', async (req, res) => {
    res.json(await getLesson(currentUser(req), req.params.slug, req.params.lessonSlug));
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
