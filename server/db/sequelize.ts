import path from 'node:path';
import { Sequelize, Transaction } from 'sequelize';
import sqlite3 from 'sqlite3';
import { queueWrites } from './write-queue';

export const DB_FILE = 'tickwright.sqlite';
/** Only another process (a seed or a script run beside the server) can make a connection wait this long. */
const BUSY_TIMEOUT_MS = 5000;

/** One SQLite file per data folder: WAL so readers never wait for the writer, foreign keys enforced. */
export async function openDatabase(dataDir: string): Promise<Sequelize> {
  const sequelize = new Sequelize({
    dialect: 'sqlite',
    dialectModule: sqlite3,
    storage: path.join(dataDir, DB_FILE),
    logging: false,
    // Take the write lock when a transaction begins: a transaction that reads and then writes cannot be granted the
    // lock later (SQLite answers SQLITE_BUSY at once to avoid a deadlock), whereas waiting at BEGIN is safe.
    transactionType: Transaction.TYPES.IMMEDIATE,
  });
  queueWrites(sequelize, BUSY_TIMEOUT_MS);
  await sequelize.query('PRAGMA journal_mode = WAL;');
  return sequelize;
}
