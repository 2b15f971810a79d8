import path from 'node:path';
import { existsSync } from 'node:fs';
import { createApp } from './app';
import { openAndMigrate } from './boot';
import { loadConfigOrExit } from './config/env';
import { seedDemo } from './demo/seed';
import { startDevMailServer } from './lib/dev-mail';
import { createLogger } from './lib/logger';
import { createMailer } from './lib/mailer';
import { createOutboxWorker } from './features/outbox/outbox-worker';
import { forgetOldKeys } from './features/idempotency/idempotent';

const CLIENT_DIR = path.resolve(import.meta.dirname, '..', 'dist');

const config = loadConfigOrExit();
const logger = createLogger(config);
const { sequelize, isNew } = await openAndMigrate(config, logger);
if (isNew) {
  await seedDemo(sequelize);
  logger.info('New database: demo data loaded (see README for the demo sign-ins).');
}
const inbox = await startDevMailServer(config).catch((err: Error) => {
  logger.warn(`Local fake mail service did not start (${err.message}); e-mail will fail until SMTP_URL is set.`);
  return null;
});
const mailer = createMailer(config);
// Whatever was still queued when the server last stopped goes out now.
const outbox = createOutboxWorker({ mailer, logger });
outbox.start();
// Idempotency keys are kept a day; clearing them hourly keeps the table small.
setInterval(
  () => forgetOldKeys().catch((err: Error) => logger.warn({ err }, 'old idempotency keys not cleared')),
  3600_000,
).unref();
const app = createApp({
  sequelize,
  config,
  logger,
  devMailInbox: inbox,
  clientDir: existsSync(path.join(CLIENT_DIR, 'index.html')) ? CLIENT_DIR : undefined,
});
const server = app.listen(config.port, () => {
  const port = (server.address() as { port: number }).port;
  console.log(`Tickwright is running at http://localhost:${port}`);
  if (inbox) console.log(`Outgoing mail (development) is caught at ${inbox}`);
});
server.on('error', (err) => {
  console.error(`Tickwright cannot listen on port ${config.port}: ${err.message}`);
  process.exit(1);
});
for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.on(signal, () => {
    outbox.stop();
    server.close(() => sequelize.close().then(() => process.exit(0)));
  });
}
