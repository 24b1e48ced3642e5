import { closeSync, openSync, readSync } from 'node:fs';
import type { DataSource, EntityManager } from 'typeorm';
import type { DatabaseDialect, UserRow } from './dialect';
import { rowQuerySql } from './row-query';
import { sqliteHandle, type RawSqlite } from './sqlite-handle';

type Statement = ReturnType<RawSqlite['prepare']> & { all(...params: unknown[]): unknown[] };

// Statements prepared once per connection (SQLite has one per DataSource).
const prepared = new WeakMap<RawSqlite, Map<string, Statement>>();

function statement(raw: RawSqlite, sql: string): Statement {
  let bySql = prepared.get(raw);
  if (!bySql) prepared.set(raw, (bySql = new Map()));
  let found = bySql.get(sql);
  if (!found) bySql.set(sql, (found = raw.prepare(sql) as Statement));
  return found;
}

function handleOf(manager: EntityManager): RawSqlite {
  const raw = sqliteHandle(manager);
  if (!raw) throw new Error('sqlite dialect used on a data source that is not better-sqlite3');
  return raw;
}

const quote = (name: string) => `"${name}"`;

/**
 * Rows per multi-row INSERT (25 and 50 measured alike, 10 and 124 slower), and the bound parameters
 * SQLite takes in one statement at the least (999 before 3.32).
 */
const ROWS_PER_INSERT = 25;
const MAX_PARAMETERS = 999;

/**
 * SQLite through better-sqlite3's own prepared statements: one connection, so they run inside the
 * transaction the manager holds, at a few microseconds a row (100k price rows well under a second).
 */
export const sqliteDialect: DatabaseDialect = {
  name: 'sqlite',
  writesInOwnProcess: false,

  async userById(dataSource: DataSource, id: number): Promise<UserRow | null> {
    const raw = handleOf(dataSource.manager);
    const row = statement(raw, 'SELECT "id", "email", "name", "role", "active" FROM "users" WHERE "id" = ?').get(id) as (Omit<UserRow, 'active'> & { active: number }) | undefined;
    return row ? { ...row, active: row.active === 1 } : null;
  },

  async insertRows(manager, entity, columns, rows) {
    if (rows.length === 0) return;
    const table = manager.connection.getMetadata(entity).tableName;
    const raw = handleOf(manager);
    const valuesOf = (count: number) => Array.from({ length: count }, () => `(${columns.map(() => '?').join(', ')})`).join(', ');
    const insertOf = (count: number) => statement(raw, `INSERT INTO ${quote(table)} (${columns.map(quote).join(', ')}) VALUES ${valuesOf(count)}`);
    // Many rows a statement: one call into SQLite per ROWS_PER_INSERT rows, not one per row (100k price
    // rows took about 330 ms one at a time here, 200 ms this way); the rest one at a time.
    const perInsert = Math.max(1, Math.min(ROWS_PER_INSERT, Math.floor(MAX_PARAMETERS / columns.length)));
    let i = 0;
    if (rows.length >= perInsert) {
      const many = insertOf(perInsert);
      const params: unknown[] = new Array(perInsert * columns.length);
      for (; i + perInsert <= rows.length; i += perInsert) {
        let p = 0;
        for (let r = i; r < i + perInsert; r++) for (const value of rows[r]) params[p++] = value;
        // A row of the wrong width would shift every value after it into the wrong column.
        if (p !== params.length) throw new Error(`insertRows: rows ${i}-${i + perInsert - 1} do not each have ${columns.length} values`);
        many.run(params);
      }
    }
    if (i < rows.length) {
      const one = insertOf(1);
      for (; i < rows.length; i++) one.run(rows[i]);
    }
  },

  async updateRowsById(manager, entity, columns, rows, keepWhenNull = []) {
    if (rows.length === 0) return;
    const table = manager.connection.getMetadata(entity).tableName;
    const sets = columns.map((c) => (keepWhenNull.includes(c) ? `${quote(c)} = COALESCE(?, ${quote(c)})` : `${quote(c)} = ?`));
    const update = statement(handleOf(manager), `UPDATE ${quote(table)} SET ${sets.join(', ')} WHERE "id" = ?`);
    for (const [id, ...values] of rows) update.run(...values, id);
  },

  async catalogVersions(dataSource) {
    const rows = statement(handleOf(dataSource.manager), 'SELECT "kind", "version" FROM "catalog_versions"').all() as { kind: string; version: number }[];
    return new Map(rows.map((r) => [r.kind, r.version]));
  },

  async hasRow(manager, entity, id) {
    const table = manager.connection.getMetadata(entity).tableName;
    return statement(handleOf(manager), `SELECT 1 FROM ${quote(table)} WHERE "id" = ?`).get(id) !== undefined;
  },

  async selectRows(manager, entity, query) {
    return statement(handleOf(manager), rowQuerySql(manager, entity, query, '?')).all(query.where[1]) as Record<string, unknown>[];
  },

  async insertRowReturningId(manager, entity, columns, values) {
    const table = manager.connection.getMetadata(entity).tableName;
    const insert = statement(handleOf(manager), `INSERT INTO ${quote(table)} (${columns.map(quote).join(', ')}) VALUES (${columns.map(() => '?').join(', ')})`);
    return Number((insert.run(...values) as { lastInsertRowid: number | bigint }).lastInsertRowid);
  },

  /**
   * Commits by this connection and by any other process on the file both rewrite the WAL-index header
   * in the `-shm` file (its change counter), so 96 bytes read from it tell whether anything committed:
   * one pread, cheaper than any statement (each one starts a read transaction; measured under load:
   * ~8 µs against ~14 µs for `PRAGMA data_version` and ~20 µs for the user row).
   * Without a usable `-shm` (not WAL, a header being rewritten) it asks SQLite: `data_version` moves on
   * other connections' commits, `total_changes()` on this one's. While a transaction is open on the
   * shared connection its uncommitted rows are visible to every request, so nothing is trusted then.
   */
  watchChanges(dataSource) {
    const raw = handleOf(dataSource.manager) as RawSqlite & { inTransaction: boolean };
    const counters = statement(raw, 'SELECT total_changes() AS "c", "data_version" AS "v" FROM pragma_data_version');
    const shm = openWalIndex(String((dataSource.options as { database?: unknown }).database ?? ''));
    return {
      stamp() {
        if (raw.inTransaction) return null;
        const fromShm = shm?.header();
        if (fromShm) return fromShm;
        const { c, v } = counters.get() as { c: number; v: number };
        return `${c}.${v}`;
      },
      settle: () => undefined,
      echo: () => Promise.resolve(),
      close: async () => shm?.close(),
    };
  },
};

/**
 * The WAL-index header (https://www.sqlite.org/walformat.html, "WAL-Index Header Format"): two copies of
 * 48 bytes at the start of `<db>-shm`, rewritten at every commit with a counter (`iChange`) that moves.
 * A header is trusted only when both copies agree and `isInit` is set; otherwise null (ask SQLite).
 */
function openWalIndex(databasePath: string): { header(): string | null; close(): void } | null {
  if (!databasePath || databasePath === ':memory:') return null;
  let fd: number;
  try {
    fd = openSync(`${databasePath}-shm`, 'r');
  } catch {
    return null;
  }
  const buf = Buffer.alloc(96);
  let open = true;
  return {
    header() {
      if (!open || readSync(fd, buf, 0, 96, 0) !== 96) return null;
      if (buf[12] !== 1 || buf.compare(buf, 0, 48, 48, 96) !== 0) return null;
      return buf.toString('latin1', 0, 48);
    },
    close() {
      if (open) closeSync(fd);
      open = false;
    },
  };
}
