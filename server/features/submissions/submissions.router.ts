import { Router } from 'express';
import { SubmissionCreateInput, SubmissionDraftPatch, SubmissionListQuery } from '@shared/schemas/submission';
import type { AppDeps } from '../../app';
import { idParam, parseBody, parseQuery } from '../../lib/validate';
import { currentUser, requireAuth, requireRole } from '../auth/guards';
import { idempotent } from '../idempotency/idempotent';
import { mentorsOfApprentice } from '../classes/access';
import { notify } from '../notifications/notifications.service';
import { linkOptions } from './linked-records';
import {
  createSubmission,
  getSubmission,
  listSubmissions,
  projectForPiece,
  sendSubmission,
  updateDraft,
} from './submissions.service';
import { paths } from './links';

export function submissionsRouter({ sequelize, config }: AppDeps) {
  const router = Router();
  const apprentice = requireRole('apprentice');

  router.get('/', requireAuth, async (req, res) => {
    res.json(await listSubmissions(currentUser(req), parseQuery(SubmissionListQuery, req)));
  });

  router.get('/link-options', apprentice, async (req, res) => {
    res.json(await linkOptions(sequelize, currentUser(req).id));
  });

  router.get('/projects/:projectId', apprentice, async (req, res) => {
    res.json(await projectForPiece(sequelize, currentUser(req), idParam(req, 'projectId')));
  });

  router.post('/', apprentice, idempotent, async (req, res) => {
    res.status(201).json(await createSubmission(sequelize, currentUser(req), parseBody(SubmissionCreateInput, req)));
  });

  router.get('/:id', requireAuth, async (req, res) => {
    res.json(await getSubmission(sequelize, currentUser(req), idParam(req)));
  });

  router.patch('/:id', apprentice, async (req, res) => {
    res.json(await updateDraft(sequelize, currentUser(req), idParam(req), parseBody(SubmissionDraftPatch, req)));
  });

  router.post('/:id/send', apprentice, async (req, res) => {
    const user = currentUser(req);
    // Sent, and each mentor told (notice plus e-mail in the outbox), in one transaction.
    const submission = await sequelize.transaction(async () => {
      const { submission, version, photoCount } = await sendSubmission(sequelize, user, idParam(req));
      const title = submission.project.title;
      const photos = `${photoCount} photo${photoCount === 1 ? '' : 's'}`;
      for (const mentorId of await mentorsOfApprentice(user.id, submission.project.course.id)) {
        await notify(
          mentorId,
          {
            kind: 'submission-sent',
            title:
              version === 1
                ? `${user.name} sent “${title}” for review`
                : `${user.name} sent version ${version} of “${title}”`,
            body: `${user.name} sent version ${version} of “${title}” (${submission.project.lesson.title}) with ${photos}. It is waiting in your review queue.`,
            link: paths.review(submission.id),
          },
          { appUrl: config.appUrl },
        );
      }
      return submission;
    });
    res.json(submission);
  });

  return router;
}
