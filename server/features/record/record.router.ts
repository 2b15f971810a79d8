import { ZipArchive, type ArchiverError } from 'archiver';
import { Router } from 'express';
import { ReasonInput, SignOffInput } from '@shared/schemas/record';
import type { AppDeps } from '../../app';
import { idParam, parseBody } from '../../lib/validate';
import { currentUser, requireAuth, requireRole } from '../auth/guards';
import { uploadFile } from '../uploads/upload-files';
import { portfolioDetails } from './portfolio-details';
import { portfolioPdf } from './portfolio-pdf';
import { apprenticeRecord } from './record.service';
import { signOff, withdrawSignOff } from './sign-offs.service';

const fileSafe = (name: string) => name.replace(/[^A-Za-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'apprentice';

/** Mounted at /apprentices: an apprentice's record, sign-offs against it, and the portfolio to take away. */
export function apprenticesRouter({ sequelize, config, logger }: AppDeps) {
  const router = Router();

  router.get('/:id/record', requireAuth, async (req, res) => {
    res.json(await apprenticeRecord(sequelize, currentUser(req), idParam(req)));
  });

  router.post('/:id/sign-offs', requireRole('mentor', 'admin'), async (req, res) => {
    const input = parseBody(SignOffInput, req);
    const created = await signOff(sequelize, currentUser(req), idParam(req), input, { appUrl: config.appUrl });
    res.status(201).json(created);
  });

  // Everything is checked and gathered before the first byte goes out; after that the ZIP streams as it is built.
  router.get('/:id/portfolio.zip', requireAuth, async (req, res) => {
    const record = await apprenticeRecord(sequelize, currentUser(req), idParam(req));
    const details = await portfolioDetails(record);
    const pdf = portfolioPdf(record, details, { guild: config.guildName, dataDir: config.dataDir });
    const zip = new ZipArchive({ zlib: { level: 6 } });
    zip.on('warning', (err: ArchiverError) => logger.warn({ err }, 'portfolio: a file was skipped'));
    zip.on('error', (err: ArchiverError) => {
      logger.error({ err }, 'portfolio: the ZIP could not be finished');
      res.destroy(err);
    });
    res.setHeader('Content-Type', 'application/zip');
    res.setHeader('Content-Disposition', `attachment; filename="portfolio-${fileSafe(record.apprentice.name)}.zip"`);
    zip.pipe(res);
    zip.append(pdf, { name: 'portfolio.pdf' });
    for (const photo of details.photos)
      zip.file(uploadFile(config.dataDir, photo.fileKey, 'full'), { name: `photos/${photo.name}` });
    await zip.finalize();
  });

  return router;
}

/** Mounted at /sign-offs. */
export function signOffsRouter({ sequelize, config }: AppDeps) {
  const router = Router();
  router.post('/:id/withdraw', requireRole('mentor', 'admin'), async (req, res) => {
    const input = parseBody(ReasonInput, req);
    await withdrawSignOff(sequelize, currentUser(req), idParam(req), input, { appUrl: config.appUrl });
    res.json({ id: idParam(req), withdrawn: true });
  });
  return router;
}
