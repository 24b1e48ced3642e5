import { AsyncLocalStorage } from 'node:async_hooks';
import type { DataSource, EntityManager, QueryRunner } from 'typeorm';
import { AppError } from '../lib/errors';

/**
 * One write transaction that holds the database's write lock from its first statement, so an
 * invariant check and the write it guards can not interleave with another request's (Issue 8).
 *
 * SQLite (better-sqlite3): TypeORM shares ONE connection and ONE query runner across the process,
 * and its `transaction()` issues a deferred BEGIN — a second request's transaction then nests as a
 * SAVEPOINT inside the first and both pass their checks. So writers queue on an in-process lock per
 * DataSource, then run `BEGIN IMMEDIATE` (which also locks out other processes, e.g. a CLI task).
 *
 * PostgreSQL: writers queue the same way in process (so at most one pooled connection per instance
 * waits), then take one transaction-scoped advisory lock that every instance shares, so the same
 * invariants hold across several server instances on one database (issue 13).
 */
export async function withWriteLock<T>(ctx: { dataSource: DataSource }, work: (manager: EntityManager) => Promise<T>): Promise<T> {
  return strategyFor(ctx.dataSource)(ctx.dataSource, work);
}

type WriteLockStrategy = <T>(dataSource: DataSource, work: (manager: EntityManager) => Promise<T>) => Promise<T>;

function strategyFor(dataSource: DataSource): WriteLockStrategy {
  return dataSource.options.type === 'postgres' ? postgresAdvisory : sqliteImmediate;
}

// The tail of each DataSource's queue of writers: a writer waits for the one before it to finish.
const queues = new WeakMap<DataSource, Promise<unknown>>();
// The manager of the write transaction the current async call chain holds, so a nested call
// (a service that locks, called from another that already does) runs inside it instead of deadlocking.
// `open` turns false at commit/rollback: a callback started inside the work that runs later is not nested.
const held = new AsyncLocalStorage<{ dataSource: DataSource; manager: EntityManager; open: boolean }>();

/** True when the current async call chain already holds this DataSource's write transaction (a nested call). */
export function holdsWriteLock(dataSource: DataSource): boolean {
  const outer = held.getStore();
  return outer?.open === true && outer.dataSource === dataSource;
}

/** Runs `begin` once the writers queued before it on this DataSource are done; nested calls become savepoints. */
const queued =
  (begin: WriteLockStrategy): WriteLockStrategy =>
  async (dataSource, work) => {
    const outer = held.getStore();
    // Nested: a SAVEPOINT inside the transaction already held (its failure undoes only its own writes).
    if (outer?.open && outer.dataSource === dataSource) return outer.manager.transaction(work);
    return inQueue(dataSource, () => begin(dataSource, work));
  };

async function inQueue<T>(dataSource: DataSource, run: () => Promise<T>): Promise<T> {
  const previous = queues.get(dataSource) ?? Promise.resolve();
  let release!: () => void;
  const mine = new Promise<void>((resolve) => (release = resolve));
  queues.set(dataSource, mine);
  await previous.catch(() => undefined);
  try {
    return await run();
  } finally {
    if (queues.get(dataSource) === mine) queues.delete(dataSource);
    release();
  }
}

/** TypeORM's bookkeeping (its flags decide whether save() opens its own transaction) kept in step by hand. */
interface RunnerFlags {
  isTransactionActive: boolean;
  transactionDepth: number;
}

const PLAIN_TRANSACTION_WAIT_MS = 10_000;

const sqliteImmediate: WriteLockStrategy = queued(runImmediate);
const postgresAdvisory: WriteLockStrategy = queued(runAdvisory);

async function runImmediate<T>(dataSource: DataSource, work: (manager: EntityManager) => Promise<T>): Promise<T> {
  const runner = dataSource.createQueryRunner();
  const flags = runner as unknown as RunnerFlags;
  // A plain TypeORM transaction elsewhere (a repository save outside this helper) holds the shared
  // connection: starting ours now would fail ("cannot start a transaction within a transaction").
  await waitUntilIdle(runner);
  await runner.query('BEGIN IMMEDIATE TRANSACTION');
  flags.isTransactionActive = true;
  flags.transactionDepth = 1;
  const store = { dataSource, manager: runner.manager, open: true };
  try {
    const result = await held.run(store, () => work(runner.manager));
    store.open = false;
    await runner.commitTransaction();
    return result;
  } catch (err) {
    store.open = false;
    await rollbackQuietly(runner, flags);
    throw err;
  }
}

// Any constant works; every instance must use the same one ("Tandem" in ASCII).
export const WRITE_LOCK_KEY = 0x54616e64656d;

async function runAdvisory<T>(dataSource: DataSource, work: (manager: EntityManager) => Promise<T>): Promise<T> {
  const runner = dataSource.createQueryRunner();
  await runner.connect();
  const store = { dataSource, manager: runner.manager, open: true };
  try {
    await runner.startTransaction();
    await runner.query('SELECT pg_advisory_xact_lock($1)', [WRITE_LOCK_KEY]);
    const result = await held.run(store, () => work(runner.manager));
    store.open = false;
    await runner.commitTransaction();
    return result;
  } catch (err) {
    store.open = false;
    if (runner.isTransactionActive) await runner.rollbackTransaction().catch(() => undefined);
    throw err;
  } finally {
    await runner.release();
  }
}

/**
 * Sends the DataSource's own `transaction()` (and so every plain `dataSource.transaction(...)` in
 * the code) through the same queue and lock, so a writer that was not converted can not nest inside
 * another's transaction (SQLite) or skip the lock its invariant checks rely on (PostgreSQL). Called
 * once where the DataSource is created.
 */
export function lockPlainTransactions(dataSource: DataSource): void {
  const strategy = strategyFor(dataSource);
  const manager = dataSource.manager;
  manager.transaction = ((isolationOrWork: unknown, maybeWork?: unknown) => {
    const work = (typeof isolationOrWork === 'function' ? isolationOrWork : maybeWork) as (m: EntityManager) => Promise<unknown>;
    return strategy(dataSource, work);
  }) as EntityManager['transaction'];
}

async function waitUntilIdle(runner: QueryRunner) {
  const startMs = Date.now();
  while (runner.isTransactionActive) {
    if (Date.now() - startMs > PLAIN_TRANSACTION_WAIT_MS) {
      throw new AppError('busy', 'The server is busy saving other changes. Try again in a moment.', 503);
    }
    await new Promise((resolve) => setTimeout(resolve, 2));
  }
}

async function rollbackQuietly(runner: QueryRunner, flags: RunnerFlags) {
  try {
    await runner.rollbackTransaction();
  } catch {
    // SQLite may already have rolled back (e.g. after SQLITE_FULL); leave the runner usable.
    flags.isTransactionActive = false;
    flags.transactionDepth = 0;
  }
}
