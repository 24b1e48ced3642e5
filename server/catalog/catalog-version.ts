import type { DataSource, EntityManager } from 'typeorm';
import { forgetCachedRows, requestMemo, StampedCache, wroteWatchedTable } from '../db/change-watch';
import { dialectOf } from '../db/dialect';

/**
 * Counts a commit or revert of one catalog kind, inside the caller's transaction: it becomes visible
 * to every server instance exactly when the rows do. The upsert is the same SQL on SQLite and PostgreSQL.
 */
export async function bumpCatalogVersion(manager: EntityManager, kind: string): Promise<void> {
  const [sql, params] = manager.connection.driver.escapeQueryWithParameters(
    'INSERT INTO "catalog_versions" ("kind", "version") VALUES (:kind, 1) ' +
      'ON CONFLICT ("kind") DO UPDATE SET "version" = "catalog_versions"."version" + 1',
    { kind },
    {},
  );
  await manager.query(sql, params);
  // Raw SQL: TypeORM does not report it, so tell the change watch (its commit then waits for the echo).
  wroteWatchedTable(manager);
}

// The versions themselves, kept until catalog_versions may have changed (server/db/change-watch.ts).
const versionCaches = new WeakMap<DataSource, StampedCache<'all', Map<string, number>>>();

function readVersions(dataSource: DataSource): Promise<Map<string, number>> {
  let cache = versionCaches.get(dataSource);
  if (!cache) versionCaches.set(dataSource, (cache = new StampedCache(dataSource)));
  return cache.get('all', () => dialectOf(dataSource).catalogVersions(dataSource));
}

// One look per request (the request memo of server/db/change-watch.ts), shared by every kind it looks
// at (a check reads four).
// Outside a request (tasks, benches): concurrent callers share the read in flight, nothing more.
const inFlight = new WeakMap<DataSource, Promise<Map<string, number>>>();

/**
 * Every kind's version as the database has it now: looked up once per request (from memory while no
 * change was signalled), so a request that starts after another instance's import committed sees that import.
 */
export function catalogVersions(dataSource: DataSource): Promise<Map<string, number>> {
  const memo = requestMemo() as Map<DataSource, Promise<Map<string, number>>> | undefined;
  const known = memo?.get(dataSource) ?? (memo ? undefined : inFlight.get(dataSource));
  if (known) return known;
  const read = readVersions(dataSource);
  if (memo) memo.set(dataSource, read);
  else {
    inFlight.set(dataSource, read);
    const forget = () => inFlight.get(dataSource) === read && inFlight.delete(dataSource);
    read.then(forget, forget);
  }
  return read;
}

/** Drops the versions read so far in this request and in flight (after this process wrote the catalog). */
export function forgetCatalogVersions(dataSource: DataSource): void {
  requestMemo()?.delete(dataSource);
  inFlight.delete(dataSource);
  forgetCachedRows(dataSource);
}
