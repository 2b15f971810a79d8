import path from 'node:path';
import { Sequelize, Transaction } from 'sequelize';
import sqlite3 from 'sqlite3';

export const DB_FILE = 'tickwright.sqlite';
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
    retry: { max: 5, match: [/SQLITE_BUSY/] },
  });
  waitWhenBusy(sequelize);
  await sequelize.query('PRAGMA journal_mode = WAL;');
  await sequelize.query('PRAGMA synchronous = NORMAL;');
  return sequelize;
}

/**
 * Sequelize opens a separate SQLite connection for each transaction (and turns foreign keys on for each). Every one
 * of them also needs a busy timeout, or a writer that meets another's lock fails at once instead of waiting its turn.
 */
function waitWhenBusy(sequelize: Sequelize) {
  const manager = sequelize.connectionManager as unknown as {
    getConnection(options?: unknown): Promise<sqlite3.Database>;
  };
  const open = manager.getConnection.bind(manager);
  manager.getConnection = async (options) => {
    const connection = await open(options);
    connection.configure('busyTimeout', BUSY_TIMEOUT_MS);
    return connection;
  };
}
