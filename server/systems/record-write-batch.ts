import { AsyncResource } from 'node:async_hooks';
import type { DataSource, EntityManager } from 'typeorm';
import type { AppContext } from '../context';
import { holdsWriteLock, withWriteLock } from '../db/write-transaction';
import { AppError } from '../lib/errors';

/*
 * Group commit for record saves. On SQLite every COMMIT waits for the disk (synchronous=FULL: an
 * fsync of the WAL, 3–8 ms on these machines, with the event loop blocked), which is longer than the
 * rest of a save. Saves that arrive together therefore share one write transaction: each runs its
 * own check-and-write under the lock in a SAVEPOINT, and every one of them is answered only after
 * the shared COMMIT, so a save that was answered is on disk exactly as before. PostgreSQL gains the
 * same way (one commit, one WAL flush, one advisory lock for the batch).
 *
 * A save refused with an AppError (a stale revision, a final record) rolls back its own savepoint
 * and the batch goes on. Any other error (the database itself failing) may have ended the whole
 * transaction, so the batch is rolled back and every other save in it runs again alone: one bad save
 * never fails or half-writes another. Work given here must therefore be safe to run again.
 */

interface Pending {
  work: (manager: EntityManager) => Promise<unknown>;
  resolve: (value: unknown) => void;
  reject: (err: unknown) => void;
}

interface Batcher {
  waiting: Pending[];
  scheduled: boolean;
}

/** At most this many saves share one transaction (a bound on how long one commit keeps others waiting). */
export const MAX_SAVES_PER_COMMIT = 64;

const batchers = new WeakMap<DataSource, Batcher>();

// Flushes run outside any request's async context (its logger, its per-request catalog memo).
const detached = new AsyncResource('tandem.record-write-batch');

/** Runs `work` under the write lock in a transaction it may share with saves that arrive with it. */
export function withBatchedWrite<T>(ctx: AppContext, work: (manager: EntityManager) => Promise<T>): Promise<T> {
  // Called from inside another writer's transaction: join it (a savepoint), never wait for a later batch.
  if (holdsWriteLock(ctx.dataSource)) return withWriteLock(ctx, work);
  let batcher = batchers.get(ctx.dataSource);
  if (!batcher) batchers.set(ctx.dataSource, (batcher = { waiting: [], scheduled: false }));
  return new Promise<T>((resolve, reject) => {
    batcher.waiting.push({ work, resolve: resolve as (value: unknown) => void, reject });
    schedule(ctx, batcher);
  });
}

/**
 * The flush waits one turn of the event loop (setImmediate), so the saves whose requests arrived in
 * the same turn join it; under no load that is the only delay a save sees.
 */
function schedule(ctx: AppContext, batcher: Batcher) {
  if (batcher.scheduled) return;
  batcher.scheduled = true;
  detached.runInAsyncScope(() =>
    setImmediate(() => {
      void flush(ctx, batcher).finally(() => {
        batcher.scheduled = false;
        if (batcher.waiting.length > 0) schedule(ctx, batcher);
      });
    }),
  );
}

type Outcome = { ok: true; value: unknown } | { ok: false; err: unknown };

async function flush(ctx: AppContext, batcher: Batcher): Promise<void> {
  const batch = batcher.waiting.splice(0, MAX_SAVES_PER_COMMIT);
  if (batch.length === 1) return settle(batch[0], () => withWriteLock(ctx, batch[0].work));
  const outcomes: Outcome[] = [];
  const failed: { index: number; err: unknown } = { index: -1, err: undefined };
  try {
    await withWriteLock(ctx, async () => {
      for (const [index, item] of batch.entries()) {
        try {
          // Nested: a SAVEPOINT inside the batch's transaction.
          outcomes.push({ ok: true, value: await withWriteLock(ctx, item.work) });
        } catch (err) {
          if (!(err instanceof AppError)) {
            Object.assign(failed, { index, err });
            throw err;
          }
          outcomes.push({ ok: false, err });
        }
      }
    });
  } catch (err) {
    // Nothing of this batch was committed.
    if (failed.index < 0) {
      // BEGIN or COMMIT failed: every save in it fails and says so (the app keeps it queued).
      for (const item of batch) item.reject(err);
      return;
    }
    // One save broke the transaction: it fails, the others run again, each alone.
    batch[failed.index].reject(failed.err);
    await Promise.all(batch.filter((_, i) => i !== failed.index).map((item) => settle(item, () => withWriteLock(ctx, item.work))));
    return;
  }
  batch.forEach((item, i) => {
    const outcome = outcomes[i];
    if (outcome.ok) item.resolve(outcome.value);
    else item.reject(outcome.err);
  });
}

async function settle(item: Pending, run: () => Promise<unknown>): Promise<void> {
  try {
    item.resolve(await run());
  } catch (err) {
    item.reject(err);
  }
}
