import path from 'node:path';
import { Sequelize } from 'sequelize';
import sqlite3 from 'sqlite3';

export const DB_FILE = 'tickwright.sqlite';

/** One SQLite file per data folder: WAL so readers never wait for the writer, foreign keys enforced. */
export async function openDatabase(dataDir: string): Promise<Sequelize> {
  const sequelize = new Sequelize({
    dialect: 'sqlite',
    dialectModule: sqlite3,
    storage: path.join(dataDir, DB_FILE),
    logging: false,
    // SQLite has one writer; a single pooled connection makes transactions serialise instead of failing busy.
    pool: { max: 1, min: 1, idle: 60_000 },
    retry: { max: 5, match: [/SQLITE_BUSY/] },
  });
  await sequelize.query('PRAGMA journal_mode = WAL;');
  await sequelize.query('PRAGMA foreign_keys = ON;');
  await sequelize.query('PRAGMA busy_timeout = 5000;');
  await sequelize.query('PRAGMA synchronous = NORMAL;');
  return sequelize;
}
