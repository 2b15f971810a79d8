import { AsyncLocalStorage } from 'node:async_hooks';
import { Mutex } from 'async-mutex';
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type sqlite3 from 'sqlite3';

/**
 * SQLite lets one connection write at a time. Left to itself, every waiting writer sleeps inside one of libuv's four
 * worker threads (busy timeout) while the writer holding the lock may have no thread left to finish on: a burst of
 * writes froze the whole server. So writers wait here instead, in the event loop, on one in-process lock:
 *
 * - every transaction (`sequelize.transaction(async (t) => …)`, or Sequelize's own) runs while holding the lock, on one long-lived
 *   writer connection (no file opened per transaction);
 * - a write outside any transaction (a session saved, a row updated on its own) holds the lock for that statement;
 * - reads never take the lock: in WAL mode they read the last committed state on the default connection.
 *
 * A query made inside a transaction's callback without `{ transaction }` joins that transaction rather than waiting
 * for a lock its own caller holds.
 */
export function queueWrites(sequelize: Sequelize, busyTimeoutMs: number): void {
  const lock = new Mutex();
  const current = new AsyncLocalStorage<Transaction>();
  oneWriterFewReaders(sequelize, busyTimeoutMs);

  const begin = sequelize.transaction.bind(sequelize) as (options: unknown, run?: unknown) => Promise<Transaction>;
  sequelize.transaction = (async (
    optionsOrRun?: { transaction?: Transaction } | ((t: Transaction) => Promise<unknown>),
    maybeRun?: (t: Transaction) => Promise<unknown>,
  ) => {
    const run = typeof optionsOrRun === 'function' ? optionsOrRun : maybeRun;
    const options = typeof optionsOrRun === 'function' ? {} : (optionsOrRun ?? {});
    const outer = options.transaction ?? current.getStore();
    // Inside a transaction, a nested one is a savepoint on the same connection, under the lock already held.
    if (outer) return begin({ ...options, transaction: outer }, run);
    if (run) return lock.runExclusive(() => begin(options, (t: Transaction) => current.run(t, () => run(t))));
    // Unmanaged (Sequelize's own findOrCreate): the lock is held until the transaction commits or rolls back.
    const release = once(await lock.acquire());
    try {
      const t = await begin(options);
      for (const end of ['commit', 'rollback'] as const) {
        const finish = t[end].bind(t);
        t[end] = () => finish().finally(release);
      }
      return t;
    } catch (err) {
      release();
      throw err;
    }
  }) as Sequelize['transaction'];

  const query = sequelize.query.bind(sequelize) as (sql: unknown, options?: QueryOptions) => Promise<unknown>;
  sequelize.query = ((sql: unknown, options?: QueryOptions) => {
    const joined = options?.transaction ?? current.getStore();
    if (joined) return query(sql, { ...options, transaction: joined });
    if (isRead(sql, options)) return query(sql, options);
    return lock.runExclusive(() => query(sql, options));
  }) as Sequelize['query'];
}

function once(fn: () => void) {
  let done = false;
  return () => {
    if (!done) fn();
    done = true;
  };
}

interface QueryOptions {
  type?: string;
  transaction?: Transaction | null;
}

const READ_TYPES = new Set<string>([
  QueryTypes.SELECT,
  QueryTypes.SHOWTABLES,
  QueryTypes.SHOWINDEXES,
  QueryTypes.DESCRIBE,
  QueryTypes.FOREIGNKEYS,
]);

function isRead(sql: unknown, options?: QueryOptions): boolean {
  if (options?.type && READ_TYPES.has(options.type)) return true;
  const text = typeof sql === 'string' ? sql : ((sql as { query?: string })?.query ?? '');
  return /^\s*(SELECT|WITH)\b/i.test(text) && !/\b(INSERT|UPDATE|DELETE|REPLACE)\b/i.test(text);
}

type Manager = {
  connections: Record<string, sqlite3.Database>;
  getConnection(options?: { uuid?: string }): Promise<sqlite3.Database>;
  releaseConnection(connection: sqlite3.Database): void;
  destroyConnection(connection: sqlite3.Database): Promise<void>;
};

/**
 * Sequelize opens a new SQLite connection for every transaction. With transactions queued one at a time, a single
 * writer connection serves them all. Everything else is spread over a few reader connections: one connection runs
 * one statement at a time, so a single shared one would make every signed-in request queue behind every other.
 * All of them wait (briefly) when another process holds the lock.
 */
const READERS = 3;

function oneWriterFewReaders(sequelize: Sequelize, busyTimeoutMs: number) {
  const manager = sequelize.connectionManager as unknown as Manager;
  const open = manager.getConnection.bind(manager);
  const release = manager.releaseConnection.bind(manager);
  const configured = new WeakSet<sqlite3.Database>();
  const WRITER = 'writer';

  let turn = 0;
  manager.getConnection = async (options) => {
    turn = (turn + 1) % READERS;
    const uuid = options?.uuid && options.uuid !== 'default' ? WRITER : `reader-${turn}`;
    const connection = await open({ ...options, uuid });
    if (!configured.has(connection)) {
      connection.configure('busyTimeout', busyTimeoutMs);
      // Per connection: with WAL, a commit is durable at the next checkpoint, which is safe against crashes.
      connection.run('PRAGMA synchronous = NORMAL');
      configured.add(connection);
    }
    return connection;
  };
  manager.releaseConnection = (connection) => {
    if (connection === manager.connections[WRITER]) return;
    release(connection);
  };
  // After a failed commit Sequelize throws the connection away; the next transaction opens a fresh writer.
  manager.destroyConnection = async (connection) => {
    if (connection === manager.connections[WRITER]) delete manager.connections[WRITER];
    await new Promise<void>((resolve) => connection.close(() => resolve()));
  };
}
