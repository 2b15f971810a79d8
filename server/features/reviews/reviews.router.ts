import { Router } from 'express';
import * as z from 'zod/mini';
import { QueryInt } from '@shared/schemas/query';
import { formatScore } from '@shared/grading/score';
import { ReviewInput, ReviewQueueQuery } from '@shared/schemas/review';
import type { AppDeps } from '../../app';
import { idParam, parseBody, parseQuery } from '../../lib/validate';
import { currentUser, requireAuth, requireRole } from '../auth/guards';
import { idempotent } from '../idempotency/idempotent';
import { notify } from '../notifications/notifications.service';
import { paths } from '../submissions/links';
import { queueCount, queueFilters, reviewQueue } from './review-queue.service';
import { createReview, recentReviews } from './reviews.service';

const RecentQuery = z.object({ limit: z._default(QueryInt(1, 50), 10) });

/** Mounted at the API root: it answers /review-queue, /reviews and /submissions/:id/reviews, and nothing else. */
export function reviewsRouter({ sequelize, config }: AppDeps) {
  const router = Router();
  const reviewer = requireRole('mentor', 'admin');

  router.get('/review-queue', reviewer, async (req, res) => {
    res.json(await reviewQueue(sequelize, currentUser(req), parseQuery(ReviewQueueQuery, req)));
  });

  router.get('/review-queue/count', reviewer, async (req, res) => {
    res.json({ count: await queueCount(sequelize, currentUser(req)) });
  });

  router.get('/review-queue/filters', reviewer, async (req, res) => {
    res.json(await queueFilters(sequelize, currentUser(req)));
  });

  router.get('/reviews', requireAuth, async (req, res) => {
    const { limit } = parseQuery(RecentQuery, req);
    res.json({ items: await recentReviews(sequelize, currentUser(req), limit) });
  });

  router.post('/submissions/:id/reviews', reviewer, idempotent, async (req, res) => {
    const mentor = currentUser(req);
    const input = parseBody(ReviewInput, req);
    // The review and the apprentice's notice (with its e-mail in the outbox) are stored together or not at all.
    const submission = await sequelize.transaction(async () => {
      const review = await createReview(sequelize, mentor, idParam(req), input);
      const { submission, version, weightedScore, passMark, pinCount } = review;
      const title = submission.project.title;
      const score = `weighted score ${formatScore(weightedScore)} of 4, pass mark ${formatScore(passMark)}`;
      const pins =
        pinCount === 0 ? '' : ` There ${pinCount === 1 ? 'is 1 pin' : `are ${pinCount} pins`} on your photos.`;
      await notify(
        submission.apprentice.id,
        input.outcome === 'passed'
          ? {
              kind: 'submission-passed',
              title: `“${title}” passed`,
              body: `${mentor.name} reviewed version ${version} of “${title}”: passed, ${score}.${pins}`,
              link: paths.submission(submission.id),
            }
          : {
              kind: 'submission-rework',
              title: `“${title}” needs rework`,
              body: `${mentor.name} reviewed version ${version} of “${title}” and asks for rework (${score}).${pins} Read the scores and notes, then send a new version.`,
              link: paths.submission(submission.id),
            },
        { appUrl: config.appUrl },
      );
      return submission;
    });
    res.status(201).json(submission);
  });

  return router;
}
