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
 * Another database slots in as another `WriteLockStrategy` (PostgreSQL: SERIALIZABLE or
 * `SELECT … FOR UPDATE` inside `work`).
 */
export async function withWriteLock<T>(ctx: { dataSource: DataSource }, work: (manager: EntityManager) => Promise<T>): Promise<T> {
  return strategyFor(ctx.dataSource)(ctx.dataSource, work);
}

type WriteLockStrategy = <T>(dataSource: DataSource, work: (manager: EntityManager) => Promise<T>) => Promise<T>;

function strategyFor(dataSource: DataSource): WriteLockStrategy {
  return dataSource.options.type === 'better-sqlite3' || dataSource.options.type === 'sqlite' ? sqliteImmediate : serializable;
}

/** Databases with real per-connection transactions: let the database serialise the writers. */
const serializable: WriteLockStrategy = (dataSource, work) => dataSource.transaction('SERIALIZABLE', work);

// The tail of each DataSource's queue of writers: a writer waits for the one before it to finish.
const queues = new WeakMap<DataSource, Promise<unknown>>();

const sqliteImmediate: WriteLockStrategy = async (dataSource, work) => {
  const previous = queues.get(dataSource) ?? Promise.resolve();
  let release!: () => void;
  const mine = new Promise<void>((resolve) => (release = resolve));
  queues.set(dataSource, mine);
  await previous.catch(() => undefined);
  try {
    return await runImmediate(dataSource, work);
  } finally {
    if (queues.get(dataSource) === mine) queues.delete(dataSource);
    release();
  }
};

/** TypeORM's bookkeeping (its flags decide whether save() opens its own transaction) kept in step by hand. */
interface RunnerFlags {
  isTransactionActive: boolean;
  transactionDepth: number;
}

const PLAIN_TRANSACTION_WAIT_MS = 10_000;

async function runImmediate<T>(dataSource: DataSource, work: (manager: EntityManager) => Promise<T>): Promise<T> {
  const runner = dataSource.createQueryRunner();
  const flags = runner as unknown as RunnerFlags;
  // A plain TypeORM transaction elsewhere (a repository save outside this helper) holds the shared
  // connection: starting ours now would fail ("cannot start a transaction within a transaction").
  await waitUntilIdle(runner);
  await runner.query('BEGIN IMMEDIATE TRANSACTION');
  flags.isTransactionActive = true;
  flags.transactionDepth = 1;
  try {
    const result = await work(runner.manager);
    await runner.commitTransaction();
    return result;
  } catch (err) {
    await rollbackQuietly(runner, flags);
    throw err;
  }
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
