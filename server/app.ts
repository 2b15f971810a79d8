import compression from 'compression';
import express from 'express';
import helmet from 'helmet';
import type { Sequelize } from 'sequelize';
import type { Config } from './config/env';
import { accountRouter } from './features/auth/account.router';
import { auditRouter } from './features/audit/audit.router';
import { logEntriesRouter } from './features/bench-log/log-entries.router';
import { authRouter } from './features/auth/auth.router';
import { devMailRouter } from './features/auth/dev-mail.router';
import { originCheck } from './features/auth/origin-check';
import { sessionMiddleware } from './features/auth/session';
import { calculationsRouter } from './features/calculations/calculations.router';
import { classesRouter } from './features/classes/classes.router';
import { invitationsRouter } from './features/classes/invitations.router';
import { contentImagesRouter } from './features/courses/content-images.router';
import { coursesRouter, lessonsRouter } from './features/courses/courses.router';
import { searchRouter } from './features/courses/search.router';
import { healthRouter } from './features/health/health.router';
import { usersRouter } from './features/users/users.router';
import { notificationsRouter } from './features/notifications/notifications.router';
import { outboxRouter } from './features/outbox/outbox.router';
import { reviewsRouter } from './features/reviews/reviews.router';
import { submissionsRouter } from './features/submissions/submissions.router';
import { uploadsRouter } from './features/uploads/uploads.router';
import { clientFiles } from './lib/client-files';
import { certificatesRouter, verifyRouter } from './features/record/certificates.router';
import { apprenticesRouter, signOffsRouter } from './features/record/record.router';
import { apiNotFound, errorHandler } from './lib/error-handler';
import { httpLogger, type Logger } from './lib/logger';
import { rejectBadAddress, rejectBadBody } from './lib/text-guard';

export interface AppDeps {
  sequelize: Sequelize;
  config: Config;
  logger: Logger;
  /** Folder of the built client; when absent (tests, `npm run dev`) only the API is served. */
  clientDir?: string;
  /** Inbox page of the local fake mail service when it was started (no SMTP_URL), shown to the admin. */
  devMailInbox?: string | null;
}

/** Builds the Express app without listening, so tests drive it directly with supertest. */
export function createApp(deps: AppDeps) {
  const { sequelize, config, logger } = deps;
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(httpLogger(logger));
  // Replies made on the fly (API JSON, index.html) above 1 KB; built files come precompressed (lib/client-files.ts).
  app.use(compression());
  app.use(rejectBadAddress);
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          baseUri: ["'self'"],
          formAction: ["'self'"],
        },
      },
    }),
  );

  const api = express.Router();
  api.use(express.json({ limit: '1mb' }));
  api.use(rejectBadBody);
  api.use('/health', healthRouter(sequelize));
  api.use(sessionMiddleware(sequelize, config).handlers);
  api.use(originCheck(config.appUrl));
  api.use('/auth', authRouter({ appUrl: config.appUrl }));
  // Feature routers are mounted here, one line each.
  api.use('/courses', coursesRouter(sequelize));
  api.use('/lessons', lessonsRouter());
  api.use('/search', searchRouter(sequelize));
  api.use('/content', contentImagesRouter());
  api.use('/calculations', calculationsRouter());
  api.use('/account', accountRouter());
  api.use('/users', usersRouter());
  api.use('/dev-mail', devMailRouter(deps.devMailInbox ?? null));
  api.use('/classes', classesRouter(deps));
  api.use('/invitations', invitationsRouter(deps));
  api.use('/audit', auditRouter());
  api.use('/uploads', uploadsRouter(deps));
  api.use('/submissions', submissionsRouter(deps));
  api.use(reviewsRouter(deps));
  api.use('/notifications', notificationsRouter());
  api.use('/outbox', outboxRouter());
  api.use('/log-entries', logEntriesRouter(deps));
  api.use('/apprentices', apprenticesRouter(deps));
  api.use('/sign-offs', signOffsRouter(deps));
  api.use('/certificates', certificatesRouter(deps));
  api.use('/verify', verifyRouter(deps));
  api.use(apiNotFound);
  app.use('/api', api);

  if (deps.clientDir) {
    app.use(clientFiles(deps.clientDir));
  }
  app.use(errorHandler);
  return app;
}
