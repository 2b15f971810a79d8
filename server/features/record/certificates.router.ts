import { Router } from 'express';
import {
  CertificateCreateInput,
  CertificateListQuery,
  ReasonInput,
  type CertificateList,
} from '@shared/schemas/record';
import type { AppDeps } from '../../app';
import { idParam, parseBody, parseQuery } from '../../lib/validate';
import { clientOf, limiter } from '../auth/auth-limits';
import { currentUser, requireAuth, requireRole } from '../auth/guards';
import { certificatePdf } from './certificate-pdf';
import {
  checkCertificate,
  issueCertificate,
  listCertificates,
  readableCertificate,
  revokeCertificate,
} from './certificates.service';

/** Mounted at /certificates: issued and revoked by the guild office, read by those who may see the apprentice. */
export function certificatesRouter({ sequelize, config }: AppDeps) {
  const router = Router();
  const office = requireRole('admin');

  router.post('/', office, async (req, res) => {
    res.status(201).json(await issueCertificate(sequelize, currentUser(req), parseBody(CertificateCreateInput, req)));
  });

  router.get('/', requireAuth, async (req, res) => {
    const reply: CertificateList = {
      certificates: await listCertificates(currentUser(req), parseQuery(CertificateListQuery, req)),
    };
    res.json(reply);
  });

  router.get('/:id/pdf', requireAuth, async (req, res) => {
    const certificate = await readableCertificate(currentUser(req), idParam(req));
    const doc = await certificatePdf(sequelize, certificate, { guild: config.guildName, appUrl: config.appUrl });
    res.setHeader('Content-Type', 'application/pdf');
    res.setHeader('Content-Disposition', `attachment; filename="certificate-${certificate.code}.pdf"`);
    doc.pipe(res);
  });

  router.post('/:id/revoke', office, async (req, res) => {
    await revokeCertificate(sequelize, currentUser(req), idParam(req), parseBody(ReasonInput, req));
    res.json({ id: idParam(req), revoked: true });
  });

  return router;
}

/** Checks per minute from one client: plenty for anyone reading a certificate, useless for trying codes. */
export const VERIFY_LIMIT = { windowMs: 60 * 1000, limit: 30 } as const;

/** Mounted at /verify: the public check of a certificate's code, without signing in. */
export function verifyRouter({ config }: AppDeps) {
  const router = Router();
  const limit = limiter(
    VERIFY_LIMIT,
    (req) => `verify:${clientOf(req)}`,
    false,
    (wait) => `Too many checks from here. Wait ${wait} and try again.`,
  );
  router.get('/:code', limit, async (req, res) => {
    res.json(await checkCertificate(String(req.params.code), config.guildName));
  });
  return router;
}
