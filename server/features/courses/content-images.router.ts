import { existsSync, statSync } from 'node:fs';
import path from 'node:path';
import { Router } from 'express';
import { CONTENT_DIR } from '../../boot';
import { AppError } from '../../lib/app-error';
import { requireAuth } from '../auth/guards';
import { SAFE_IMAGE_NAME } from './content-check';

const COURSE_SLUG = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;

/** Mounted at /api/content: the figures of a course's lessons, only from its images/ folder. */
export function contentImagesRouter(contentDir = CONTENT_DIR) {
  const router = Router();
  router.get('/:courseSlug/images/:file', requireAuth, (req, res) => {
    const courseSlug = String(req.params.courseSlug);
    const file = String(req.params.file);
    if (!COURSE_SLUG.test(courseSlug) || !SAFE_IMAGE_NAME.test(file)) throw AppError.notFound('The image');
    const full = path.join(contentDir, courseSlug, 'images', file);
    if (!existsSync(full) || !statSync(full).isFile()) throw AppError.notFound('The image');
    res.setHeader('X-Content-Type-Options', 'nosniff');
    res.setHeader('Cache-Control', 'private, max-age=3600');
    // An SVG opened on its own is a document: it must not run anything or load anything.
    res.setHeader('Content-Security-Policy', "default-src 'none'; style-src 'unsafe-inline'");
    res.sendFile(full);
  });
  return router;
}
