import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { openDatabase } from '../../../server/db/data-source';
import { changeScope, StampedCache } from '../../../server/db/change-watch';
import { dialectOf, type ChangeWatch } from '../../../server/db/dialect';
import { sqliteHandle } from '../../../server/db/sqlite-handle';
import { databaseTarget } from '../../../server/env';
import { User } from '../../../server/users/user.entity';
import { onPostgres } from '../../helpers/test-database';
import { twoInstances } from '../../helpers/two-instances';

// The change stamp is read once per turn of the event loop for every request that asked during it
// (server/db/change-watch.ts, stampThisTurn), never reused from a read made before a request asked.
const two = twoInstances();
let source: DataSource;
let reads = 0;

beforeAll(async () => {
  source = await openDatabase(databaseTarget(two.a.ctx.config));
  // Count the reads of this data source's stamp: wrap the watch its dialect hands out on first use.
  const dialect = dialectOf(source);
  const watchChanges = dialect.watchChanges.bind(dialect);
  vi.spyOn(dialect, 'watchChanges').mockImplementation((ds) => {
    const watch: ChangeWatch = watchChanges(ds);
    const stamp = watch.stamp.bind(watch);
    watch.stamp = () => {
      reads++;
      return stamp();
    };
    return watch;
  });
});
afterAll(async () => {
  vi.restoreAllMocks();
  await source?.destroy();
});

/** Runs `work` the way a route does: inside the per-request scope changeScope opens. */
function inRequest<T>(work: () => Promise<T>): Promise<T> {
  return new Promise<T>((resolve, reject) => changeScope({} as never, {} as never, () => void work().then(resolve, reject)));
}

async function userName(id: number): Promise<string> {
  return (await source.getRepository(User).findOneByOrFail({ id })).name;
}

describe('the change stamp, read once per turn', () => {
  it('when twenty requests ask in one turn, then the stamp is read once and all get the cached row', async () => {
    const names = new StampedCache<number, string>(source);
    const id = two.a.users.tech.id;
    // On PostgreSQL the stamp is null (read through) until the LISTEN connection is up: wait for a cached answer.
    await vi.waitFor(async () => {
      const first = vi.fn(() => userName(id));
      await inRequest(() => names.get(id, first));
      await inRequest(() => names.get(id, first));
      expect(first.mock.calls.length).toBeLessThanOrEqual(1);
    }, { timeout: 3000, interval: 50 });
    reads = 0;
    const load = vi.fn(() => userName(id));
    const answers = await Promise.all(Array.from({ length: 20 }, () => inRequest(() => names.get(id, load))));
    expect(new Set(answers).size).toBe(1);
    expect(load).not.toHaveBeenCalled();
    expect(reads).toBe(1);
  });

  it.skipIf(onPostgres)('when another connection commits right after a turn\'s read served a request, then a request asking next still sees the commit', async () => {
    const names = new StampedCache<number, string>(source);
    const id = two.a.users.tech.id;
    const raw = sqliteHandle(two.a.ctx.dataSource.manager)!;
    const rename = (name: string) => raw.prepare('UPDATE "users" SET "name" = ? WHERE "id" = ?').run(name, id);
    rename('Before');
    expect(await inRequest(() => names.get(id, () => userName(id)))).toBe('Before');
    // The commit lands in the same turn, after that read: the next request must not be given it.
    rename('After');
    expect(await inRequest(() => names.get(id, () => userName(id)))).toBe('After');
  });
});
