import { AsyncLocalStorage } from 'node:async_hooks';
import type { RequestHandler } from 'express';
import type { DataSource, EntityManager, EntitySubscriberInterface, QueryRunner } from 'typeorm';
import { dialectOf, type ChangeStamp, type ChangeWatch } from './dialect';

/** The tables whose rows are cached per process (the signed-in user, the catalog versions). */
const WATCHED = new Set(['users', 'catalog_versions']);

interface Watch {
  db: ChangeWatch;
  /** Moves on this process's own writes, the moment TypeORM reports them (before any notification comes back). */
  local: number;
}

const watches = new WeakMap<DataSource, Watch>();
// Transactions that wrote a watched table: their commit waits for the database's echo.
const touched = new WeakSet<QueryRunner>();

/**
 * The change watch of a data source, started on first use: the dialect's (SQLite counters, PostgreSQL
 * LISTEN/NOTIFY) plus a TypeORM subscriber that moves the local counter at once on this process's writes
 * and commits. Destroying the data source closes it.
 */
function watchOf(dataSource: DataSource): Watch {
  let watch = watches.get(dataSource);
  if (watch) return watch;
  const created: Watch = { db: dialectOf(dataSource).watchChanges(dataSource), local: 0 };
  watch = created;
  watches.set(dataSource, created);
  dataSource.subscribers.push(localWrites(created));
  const destroy = dataSource.destroy.bind(dataSource);
  dataSource.destroy = async () => {
    watches.delete(dataSource);
    await created.db.close();
    return destroy();
  };
  return created;
}

function localWrites(watch: Watch): EntitySubscriberInterface {
  const wrote = (event: { metadata?: { tableName: string }; queryRunner: QueryRunner }) => {
    if (!event.metadata || !WATCHED.has(event.metadata.tableName)) return;
    watch.local++;
    if (event.queryRunner.isTransactionActive) touched.add(event.queryRunner);
    // Outside a transaction the write has committed already: wait for the echo now.
    else return watch.db.echo();
  };
  return {
    afterInsert: wrote,
    afterUpdate: wrote,
    afterRemove: wrote,
    afterSoftRemove: wrote,
    afterRecover: wrote,
    afterTransactionCommit(event) {
      watch.local++;
      if (!touched.has(event.queryRunner)) return;
      touched.delete(event.queryRunner);
      return watch.db.echo();
    },
    afterTransactionRollback(event) {
      watch.local++;
      touched.delete(event.queryRunner);
    },
  };
}

/** Starts watching at once (app start), so the first requests need not read through while PostgreSQL's LISTEN connects. */
export function startChangeWatch(dataSource: DataSource): void {
  if (dataSource.isInitialized) watchOf(dataSource);
}

/** For raw SQL that writes a watched table inside the manager's transaction (TypeORM does not report it). */
export function wroteWatchedTable(manager: EntityManager): void {
  const watch = watchOf(manager.connection);
  watch.local++;
  if (manager.queryRunner?.isTransactionActive) touched.add(manager.queryRunner);
}

/** Moves the local counter: values cached so far are not trusted any more (after a write this process made). */
export function forgetCachedRows(dataSource: DataSource): void {
  watchOf(dataSource).local++;
}

// Per request: what it has looked up once (the stamp per watch; the catalog versions per data source).
const requestScope = new AsyncLocalStorage<Map<object, unknown>>();

/** Opens the per-request memo (mount once, early, on /api). */
export const changeScope: RequestHandler = (_req, _res, next) => requestScope.run(new Map(), next);

/** This request's memo, or undefined outside a request (tasks, benches). */
export function requestMemo(): Map<object, unknown> | undefined {
  return requestScope.getStore();
}

interface StampSeen {
  stamp: ChangeStamp;
  local: number;
}

/**
 * The stamp as this request sees it: looked up once per request (the first cache it asks), then reused
 * while this process has written nothing, since a request must see what committed before it started.
 */
async function stampFor(watch: Watch): Promise<ChangeStamp | null> {
  const memo = requestScope.getStore();
  const seen = memo?.get(watch) as StampSeen | undefined;
  if (seen && seen.local === watch.local) return seen.stamp;
  const settling = watch.db.settle();
  if (settling) await settling;
  const stamp = await stampThisTurn(watch);
  if (memo && stamp !== null) memo.set(watch, { stamp, local: watch.local });
  return stamp;
}

const scheduleAfterIo = setImmediate;
const turnReads = new WeakMap<Watch, Promise<ChangeStamp | null>>();

/**
 * One stamp read per turn of the event loop, shared by every caller that asked before it: the read runs
 * in the turn's check phase, after the I/O it took in, so it is later than the arrival of every request
 * waiting on it and sees whatever committed before any of them came in (never an older read reused).
 * On SQLite that is one pread of the -shm header per turn instead of one per request; and the requests a
 * turn read off the sockets then run their work back to back rather than between socket reads, which
 * measured ~1.35× more checks per second on the bench machine (DEVELOPERS.md, footgun 29).
 */
function stampThisTurn(watch: Watch): Promise<ChangeStamp | null> {
  let read = turnReads.get(watch);
  if (!read) {
    read = new Promise((resolve) => {
      scheduleAfterIo(() => {
        turnReads.delete(watch);
        try {
          resolve(watch.db.stamp());
        } catch {
          // A database closing under the read: null makes every cache read through.
          resolve(null);
        }
      });
    });
    turnReads.set(watch, read);
  }
  return read;
}

/**
 * Values read from the database, kept while nothing that could change them has happened: the dialect's
 * stamp (another instance or process committed) and this process's own writes. When the database can
 * not tell (a SQLite transaction open on the shared connection, PostgreSQL's LISTEN connection down),
 * every get reads through.
 */
export class StampedCache<K, V> {
  private stamp: ChangeStamp | null = null;
  private local = -1;
  private entries = new Map<K, V>();

  constructor(
    private readonly dataSource: DataSource,
    private readonly maxEntries = 10_000,
  ) {}

  async get(key: K, load: () => Promise<V>): Promise<V> {
    const watch = watchOf(this.dataSource);
    const stamp = await stampFor(watch);
    if (stamp === null) return load();
    const local = watch.local;
    if (stamp !== this.stamp || local !== this.local) {
      this.entries.clear();
      this.stamp = stamp;
      this.local = local;
    } else if (this.entries.has(key)) return this.entries.get(key)!;
    const value = await load();
    // Keep it only if nothing moved while it was read: the value may be older than that change.
    if (watch.db.stamp() === stamp && watch.local === local && this.stamp === stamp && this.local === local) {
      if (this.entries.size >= this.maxEntries) this.entries.clear();
      this.entries.set(key, value);
    }
    return value;
  }
}
