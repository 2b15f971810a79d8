import { existsSync } from 'node:fs';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import type { Config } from './config/env';
import { initModels } from './db/models';
import { createMigrator, migrate } from './db/migrator';
import { DB_FILE, openDatabase } from './db/sequelize';
import { syncContent } from './features/courses/content-sync';
import { sweepOrphanFiles } from './features/uploads/uploads.service';
import type { Logger } from './lib/logger';

export const CONTENT_DIR = path.resolve(import.meta.dirname, '..', 'content');

/**
 * Opens the database, migrates it, syncs content/ and clears photo files an interrupted upload left behind. Reports
 * whether the database was new (no migration had ever run), the only case in which `npm start` loads the demo data.
 */
export async function openAndMigrate(
  config: Config,
  logger?: Logger,
): Promise<{ sequelize: Sequelize; isNew: boolean }> {
  const fileExisted = existsSync(path.join(config.dataDir, DB_FILE));
  const sequelize = await openDatabase(config.dataDir);
  initModels(sequelize);
  const isNew = !fileExisted || (await createMigrator(sequelize).executed()).length === 0;
  await migrate(sequelize);
  await syncContent(sequelize, CONTENT_DIR, logger);
  const orphans = await sweepOrphanFiles(config.dataDir);
  if (orphans > 0) logger?.info(`Removed ${orphans} photo files left behind by an interrupted upload.`);
  return { sequelize, isNew };
}
