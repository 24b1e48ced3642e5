import { setTimeout as sleep } from 'node:timers/promises';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { withWriteLock } from '../../../server/db/write-transaction';
import { User } from '../../../server/users/user.entity';
import { createTestApp, type TestApp } from '../../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

/** Read a user's name, yield to the event loop (as bcrypt or any await would), then append a mark. */
async function appendMark(mark: string) {
  await withWriteLock(t.ctx, async (manager) => {
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

  it('when another connection (another process) asks for the write lock meanwhile, then it is refused as busy', async () => {
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
});
