import path from 'node:path';
import express from 'express';
import expressStaticGzip from 'express-static-gzip';

const IMMUTABLE = 'public, max-age=31536000, immutable';
// index.html names the current hashed files, so the browser must ask again every time (a 304 when nothing changed).
const REVALIDATE = 'no-cache';

/**
 * The built client: files under /assets/ carry a content hash in their name and are cached for a year; the `.br` and
 * `.gz` copies made at build time are sent to browsers that accept them; every other path gets index.html.
 */
export function clientFiles(clientDir: string): express.Router {
  const router = express.Router();
  router.use(
    expressStaticGzip(clientDir, {
      enableBrotli: true,
      orderPreference: ['br', 'gz'],
      index: false,
      serveStatic: {
        cacheControl: false,
        setHeaders: (res, filePath) => {
          const underAssets = path.relative(clientDir, filePath).startsWith(`assets${path.sep}`);
          res.setHeader('Cache-Control', underAssets ? IMMUTABLE : REVALIDATE);
        },
      },
    }),
  );
  // A hashed file that is not there (an old page asking after a new deploy) is a 404, not a page of HTML.
  router.use('/assets', (_req, res) => res.status(404).end());
  router.get('/{*splat}', (_req, res) => {
    res.setHeader('Cache-Control', REVALIDATE);
    res.sendFile(path.join(clientDir, 'index.html'));
  });
  return router;
}
