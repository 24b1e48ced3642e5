import type { EntityManager } from 'typeorm';

/** The slice of better-sqlite3's Database that hot paths use (bulk writes, per-request lookups). */
export interface RawSqlite {
  prepare(sql: string): RawStatement;
}

interface RawStatement {
  run(...params: unknown[]): unknown;
  get(...params: unknown[]): unknown;
  all(...params: unknown[]): unknown[];
  /** Rows as their first column's value. */
  pluck(): RawStatement;
}

/**
 * The raw better-sqlite3 connection behind a manager, or null on another driver. SQLite has one
 * connection, so statements prepared on it run inside the manager's open transaction.
 */
export function sqliteHandle(manager: EntityManager): RawSqlite | null {
  const driver = manager.connection.driver as unknown as { options: { type: string }; databaseConnection?: RawSqlite };
  return driver.options.type === 'better-sqlite3' && driver.databaseConnection ? driver.databaseConnection : null;
}
