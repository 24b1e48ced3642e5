import { setTimeout as sleep } from 'node:timers/promises';
import Database from 'better-sqlite3';
import type { EntityManager } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import pg from 'pg';
import { WRITE_LOCK_KEY, withWriteLock } from '../../../server/db/write-transaction';
import { User } from '../../../server/users/user.entity';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { onPostgres } from '../../helpers/test-database';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

type Transaction = (work: (manager: EntityManager) => Promise<void>) => Promise<void>;
const locked: Transaction = (work) => withWriteLock(t.ctx, work);
const plain: Transaction = (work) => t.ctx.dataSource.transaction(work);

/** Read a user's name, yield to the event loop (as bcrypt or any await would), then append a mark. */
async function appendMark(mark: string, transaction: Transaction = locked) {
  await transaction(async (manager) => {
    const repo = manager.getRepository(User);
    const user = await repo.findOneByOrFail({ id: t.users.tech.id });
    await sleep(3);
    user.name = `${user.name}${mark}`;
    await repo.save(user);
  });
}

describe('withWriteLock', () => {
  it('when two writers read then write at the same moment, then neither update is lost (20 rounds)', async () => {
    for (let round = 0; round < 20; round++) {
      await t.ctx.dataSource.getRepository(User).update({ id: t.users.tech.id }, { name: 'n' });
      await Promise.all([appendMark('a'), appendMark('b')]);
      const { name } = await t.ctx.dataSource.getRepository(User).findOneByOrFail({ id: t.users.tech.id });
      expect(name.length).toBe(3);
    }
  });

  it('when plain dataSource.transaction() writers race, then they are queued the same way (20 rounds)', async () => {
    for (let round = 0; round < 20; round++) {
      await t.ctx.dataSource.getRepository(User).update({ id: t.users.tech.id }, { name: 'n' });
      await Promise.all([appendMark('a', plain), appendMark('b', locked), appendMark('c', plain)]);
      const { name } = await t.ctx.dataSource.getRepository(User).findOneByOrFail({ id: t.users.tech.id });
      expect(name.length).toBe(4);
    }
  });

  it('when a locked service calls another that locks, then the inner runs inside (no deadlock) and its failure undoes only its own writes', async () => {
    const repo = t.ctx.dataSource.getRepository(User);
    await repo.update({ id: t.users.tech.id }, { name: 'outer' });
    await withWriteLock(t.ctx, async (manager) => {
      await manager.getRepository(User).update({ id: t.users.tech.id }, { name: 'outer-2' });
      await withWriteLock(t.ctx, async (inner) => {
        await inner.getRepository(User).update({ id: t.users.estimator.id }, { name: 'inner-ok' });
      });
      const failed = withWriteLock(t.ctx, async (inner) => {
        await inner.getRepository(User).update({ id: t.users.tech.id }, { name: 'inner-failed' });
        throw new Error('inner refused');
      });
      await expect(failed).rejects.toThrow('inner refused');
      await t.ctx.dataSource.transaction(async (inner) => {
        await inner.getRepository(User).update({ id: t.users.admin.id }, { name: 'plain-inner' });
      });
    });
    expect((await repo.findOneByOrFail({ id: t.users.tech.id })).name).toBe('outer-2');
    expect((await repo.findOneByOrFail({ id: t.users.estimator.id })).name).toBe('inner-ok');
    expect((await repo.findOneByOrFail({ id: t.users.admin.id })).name).toBe('plain-inner');
  });

  it('when the work throws, then its writes are rolled back and the next writer still runs', async () => {
    const repo = t.ctx.dataSource.getRepository(User);
    await repo.update({ id: t.users.tech.id }, { name: 'before' });
    const failing = withWriteLock(t.ctx, async (manager) => {
      await manager.getRepository(User).update({ id: t.users.tech.id }, { name: 'half-done' });
      throw new Error('refused');
    });
    const next = withWriteLock(t.ctx, async (manager) => manager.getRepository(User).findOneByOrFail({ id: t.users.tech.id }));
    await expect(failing).rejects.toThrow('refused');
    expect((await next).name).toBe('before');
    expect((await repo.findOneByOrFail({ id: t.users.tech.id })).name).toBe('before');
  });

  it('when the work returns, then the value comes back and the runner is free for plain saves', async () => {
    const value = await withWriteLock(t.ctx, async () => 42);
    expect(value).toBe(42);
    const repo = t.ctx.dataSource.getRepository(User);
    await repo.update({ id: t.users.tech.id }, { name: 'after' });
    expect((await repo.findOneByOrFail({ id: t.users.tech.id })).name).toBe('after');
  });

  // SQLite only: a second better-sqlite3 connection on the same file; the PostgreSQL form follows.
  it.skipIf(onPostgres)('when another connection (another process) asks for the write lock meanwhile, then it is refused as busy', async () => {
    const other = new Database(t.ctx.config.databasePath, { timeout: 0 });
    try {
      await withWriteLock(t.ctx, async () => {
        expect(() => other.exec('BEGIN IMMEDIATE')).toThrow(/locked|busy/i);
      });
      other.exec('BEGIN IMMEDIATE');
      other.exec('ROLLBACK');
    } finally {
      other.close();
    }
  });

  it.skipIf(!onPostgres)('when another instance asks for the write lock meanwhile, then it waits for the advisory lock (PostgreSQL)', async () => {
    const other = new pg.Client({ connectionString: t.ctx.config.databaseUrl });
    await other.connect();
    try {
      const tryLock = async () => (await other.query<{ got: boolean }>('SELECT pg_try_advisory_lock($1) AS got', [WRITE_LOCK_KEY])).rows[0].got;
      await withWriteLock(t.ctx, async () => {
        expect(await tryLock()).toBe(false);
      });
      expect(await tryLock()).toBe(true);
      await other.query('SELECT pg_advisory_unlock($1)', [WRITE_LOCK_KEY]);
    } finally {
      await other.end();
    }
  });
});
