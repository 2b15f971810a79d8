import { Router } from 'express';
import multer from 'multer';
import { UPLOAD_MAX_BYTES, UploadSizeQuery, type StorageUsage } from '@shared/schemas/upload';
import type { AppDeps } from '../../app';
import { AppError } from '../../lib/app-error';
import { idParam, parseQuery } from '../../lib/validate';
import { currentUser, requireAuth, requireRole } from '../auth/guards';
import { idempotent } from '../idempotency/idempotent';
import { uploadFile } from './upload-files';
import { findViewableUpload, storageUsed, storeUpload, sweepNowAndThen } from './uploads.service';

/** Kept in memory until judged and re-encoded, so a refused or broken upload never touches the disk. */
const receive = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: UPLOAD_MAX_BYTES, files: 1, fields: 5 },
});

export function uploadsRouter({ sequelize, config, logger }: AppDeps) {
  const router = Router();

  router.post('/', requireRole('apprentice'), idempotent, receive.single('file'), async (req, res) => {
    if (!req.file) throw AppError.badRequest('Choose a photo to upload.', { file: ['Choose a photo to upload.'] });
    const upload = await storeUpload(config.dataDir, currentUser(req).id, req.file.buffer, config.uploadQuotaBytes);
    sweepNowAndThen(sequelize, config.dataDir, (err) => logger.warn({ err }, 'sweep of abandoned uploads failed'));
    res.status(201).json(upload);
  });

  // Before /:id, which would otherwise take "usage" for an id.
  router.get('/usage', requireAuth, async (req, res) => {
    const usage: StorageUsage = {
      usedBytes: await storageUsed(currentUser(req).id),
      quotaBytes: config.uploadQuotaBytes,
    };
    res.json(usage);
  });

  router.get('/:id', requireAuth, async (req, res) => {
    const upload = await findViewableUpload(currentUser(req), idParam(req));
    const { size } = parseQuery(UploadSizeQuery, req);
    // The bytes behind an id never change, so the browser may keep them; "private" keeps shared caches out.
    res.set('Cache-Control', 'private, max-age=31536000, immutable');
    res.type('image/jpeg');
    res.sendFile(uploadFile(config.dataDir, upload.fileKey, size), { dotfiles: 'deny' }, (err) => {
      if (err && !res.headersSent)
        res.status(404).json({ error: { code: 'NOT_FOUND', message: 'That photo was not found.' } });
    });
  });

  return router;
}
