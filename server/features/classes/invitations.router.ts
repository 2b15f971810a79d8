import { Router } from 'express';
import { rateLimit } from 'express-rate-limit';
import multer from 'multer';
import {
  AcceptInvitationInput,
  InvitationListQuery,
  InviteInput,
  RosterImportInput,
  type RosterPreviewReply,
} from '@shared/schemas/invitation';
import type { Config } from '../../config/env';
import { AppError } from '../../lib/app-error';
import { idParam, parseBody, parseQuery } from '../../lib/validate';
import { currentUser, requireRole } from '../auth/guards';
import { requireHttpsForSignIn } from '../auth/secure-sign-in';
import { startSignedInSession } from '../auth/session';
import { acceptInvitation, previewInvitation } from './invitation-accept.service';
import {
  inviteToClass,
  listPendingInvitations,
  previewInvites,
  resendInvitation,
  revokeInvitation,
} from './invitations.service';
import { parseRosterCsv } from './roster-csv';

export interface InvitationDeps {
  config: Config;
}

const LINK_WINDOW_MS = 15 * 60 * 1000;

const mailDeps = (deps: InvitationDeps) => ({ appUrl: deps.config.appUrl });

// A roster of 200 people is a few kilobytes; anything near this limit is not a roster.
const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: 256 * 1024, files: 1 } }).single('file');
const TEXT_TYPES = new Set([
  'text/csv',
  'text/plain',
  'application/csv',
  'text/x-csv',
  'application/vnd.ms-excel',
  'application/octet-stream',
  '',
]);

/** Mounted inside the classes router: invitations and roster files for one class, admin only. */
export function classInvitationsRouter(deps: InvitationDeps) {
  const router = Router();
  const admin = requireRole('admin');
  const classId = (req: Parameters<typeof idParam>[0]) => {
    const id = idParam(req);
    if (id < 0) throw AppError.notFound('That class');
    return id;
  };

  router.post('/:id/invitations', admin, async (req, res) => {
    const id = classId(req);
    const { emails } = parseBody(InviteInput, req);
    const invitees = emails.map((email) => ({ email, name: null }));
    res.json({ results: await inviteToClass(id, invitees, currentUser(req), mailDeps(deps), 'e-mail') });
  });

  router.post('/:id/roster/preview', admin, upload, async (req, res) => {
    const id = classId(req);
    if (!req.file) throw AppError.badRequest('Choose a CSV file to upload (field "file").');
    if (!TEXT_TYPES.has(req.file.mimetype)) {
      throw new AppError(
        'NOT_A_CSV',
        'That file is not a CSV roster (a spreadsheet saved as CSV is). Nothing was imported.',
        415,
      );
    }
    const rows = await previewInvites(id, parseRosterCsv(req.file.buffer));
    const okCount = rows.filter((r) => r.ok).length;
    const reply: RosterPreviewReply = { rows, okCount, problemCount: rows.length - okCount };
    res.json(reply);
  });

  router.post('/:id/roster/import', admin, async (req, res) => {
    const id = classId(req);
    const { rows } = parseBody(RosterImportInput, req);
    res.json({ results: await inviteToClass(id, rows, currentUser(req), mailDeps(deps), 'roster file') });
  });

  return router;
}

/** Mounted at /invitations: the admin's pending list and actions, and the two public routes behind a link. */
export function invitationsRouter(deps: InvitationDeps) {
  const router = Router();
  const admin = requireRole('admin');
  // Tokens are unguessable; this stops a script from trying. Only failed look-ups count, so a class accepting from
  // one school network is never held up, and bcrypt runs at most once per genuine invitation.
  const linkLimit = rateLimit({
    windowMs: LINK_WINDOW_MS,
    limit: 30,
    skipSuccessfulRequests: true,
    standardHeaders: false,
    legacyHeaders: false,
    handler: (_req, res, next) => {
      res.setHeader('Retry-After', String(LINK_WINDOW_MS / 1000));
      next(
        new AppError('TOO_MANY_ATTEMPTS', 'Too many tries with invitation links. Wait 15 minutes and try again.', 429),
      );
    },
  });

  router.get('/', admin, async (req, res) => {
    res.json({ invitations: await listPendingInvitations(parseQuery(InvitationListQuery, req).classId) });
  });

  router.post('/:id/resend', admin, async (req, res) => {
    res.json(await resendInvitation(idParam(req), currentUser(req), mailDeps(deps)));
  });

  router.post('/:id/revoke', admin, async (req, res) => {
    await revokeInvitation(idParam(req), currentUser(req));
    res.status(204).end();
  });

  router.get('/:token', linkLimit, async (req, res) => {
    res.json(await previewInvitation(String(req.params.token)));
  });

  router.post('/:token/accept', requireHttpsForSignIn(deps.config.appUrl), linkLimit, async (req, res) => {
    const input = parseBody(AcceptInvitationInput, req);
    const user = await acceptInvitation(String(req.params.token), input);
    await startSignedInSession(req, user);
    res.status(201).json({ user });
  });

  return router;
}
