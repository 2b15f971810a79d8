import type { QueryInterface, Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import * as m0001 from './migrations/0001-core';
import * as m0002 from './migrations/0002-password-resets';
import * as m0003 from './migrations/0003-lesson-progress';
import * as m0004 from './migrations/0004-calculations';
import * as m0005 from './migrations/0005-submissions';
import * as m0006 from './migrations/0006-bench-log';
import * as m0007 from './migrations/0007-invitations-audit';
import * as m0008 from './migrations/0008-outbox';
import * as m0009 from './migrations/0009-idempotency-keys';
import * as m0010 from './migrations/0010-apprentice-record';

export type Migration = {
  up: (ctx: { context: QueryInterface }) => Promise<void>;
  down: (ctx: { context: QueryInterface }) => Promise<void>;
};

/** Listed here rather than globbed, so the same list works under tsx, vitest and a bundled build. */
const migrations: Record<string, Migration> = {
  '0001-core': m0001,
  '0002-password-resets': m0002,
  '0003-lesson-progress': m0003,
  '0004-calculations': m0004,
  '0005-submissions': m0005,
  '0006-bench-log': m0006,
  '0007-invitations-audit': m0007,
  '0008-outbox': m0008,
  '0009-idempotency-keys': m0009,
  '0010-apprentice-record': m0010,
};

export function createMigrator(sequelize: Sequelize) {
  return new Umzug({
    // Sorted by name, so the order never depends on where a line was added to the list above.
    migrations: Object.entries(migrations)
      .sort(([a], [b]) => a.localeCompare(b))
      .map(([name, m]) => ({ name, up: m.up, down: m.down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'migrations' }),
    logger: undefined,
  });
}

export async function migrate(sequelize: Sequelize): Promise<void> {
  // Foreign keys are switched off while tables are rebuilt, as SQLite requires for ALTER via copy.
  await sequelize.query('PRAGMA foreign_keys = OFF;');
  try {
    await createMigrator(sequelize).up();
  } finally {
    await sequelize.query('PRAGMA foreign_keys = ON;');
  }
}
