import type { DataSource, EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';
import { postgresDialect } from './postgres-dialect';
import type { RowQuery } from './row-query';
import { sqliteDialect } from './sqlite-dialect';

/** The user fields the per-request auth check reads. */
export interface UserRow {
  id: number;
  email: string;
  name: string;
  role: string;
  active: boolean;
}

/**
 * The few hot paths that each database does its own fastest way (issue 13). Services call these and
 * never branch on the database; everything else goes through TypeORM, which speaks both.
 */
export interface DatabaseDialect {
  readonly name: 'sqlite' | 'postgres';
  /**
   * Whether statements run in the database's own process (PostgreSQL), so this one can validate the rest
   * of a file while the part before it is written; SQLite writes on this thread, nothing to overlap.
   */
  readonly writesInOwnProcess: boolean;
  /** One user by id: read on every authenticated request, so no query builder. */
  userById(dataSource: DataSource, id: number): Promise<UserRow | null>;
  /** Many rows into one table inside the manager's transaction (a prepared statement / one unnest INSERT). */
  insertRows<T extends ObjectLiteral>(manager: EntityManager, entity: EntityTarget<T>, columns: (keyof T & string)[], rows: unknown[][]): Promise<void>;
  /**
   * Updates rows by id: each row is `[id, ...values of columns]`; a column in `keepWhenNull` keeps its
   * stored value when the new one is null.
   */
  updateRowsById<T extends ObjectLiteral>(
    manager: EntityManager,
    entity: EntityTarget<T>,
    columns: (keyof T & string)[],
    rows: unknown[][],
    keepWhenNull?: (keyof T & string)[],
  ): Promise<void>;
  /** Every catalog kind's version counter (catalog_versions); cached while the change watch stays put. */
  catalogVersions(dataSource: DataSource): Promise<Map<string, number>>;
  /** Whether the entity's table has a row with this id (a prepared read: one per record save). */
  hasRow<T extends ObjectLiteral>(manager: EntityManager, entity: EntityTarget<T>, id: number): Promise<boolean>;
  /**
   * The raw rows of the entity's table whose `where` column equals the value, in the given order (a
   * prepared read with the value bound, where TypeORM would write it into the SQL); `hydrateRow` turns
   * one into the entity's values.
   */
  selectRows<T extends ObjectLiteral>(manager: EntityManager, entity: EntityTarget<T>, query: RowQuery<T>): Promise<Record<string, unknown>[]>;
  /** Inserts one row inside the manager's transaction and returns its generated id. */
  insertRowReturningId<T extends ObjectLiteral>(manager: EntityManager, entity: EntityTarget<T>, columns: (keyof T & string)[], values: unknown[]): Promise<number>;
  /** Tells when `users` or `catalog_versions` may have changed, here or on another instance (server/db/change-watch.ts). */
  watchChanges(dataSource: DataSource): ChangeWatch;
}

/** A value that moves whenever the watched tables may have changed; null while the database can not tell. */
export type ChangeStamp = string | number;

export interface ChangeWatch {
  /** Now, without a query: the current stamp, or null (read through to the database). */
  stamp(): ChangeStamp | null;
  /** Resolves once changes already sent to this process have been taken in (undefined: nothing to wait for). */
  settle(): Promise<void> | undefined;
  /** Resolves once this instance has heard of a commit it just made (or gave up waiting). */
  echo(): Promise<void>;
  close(): Promise<void>;
}

/** The dialect of the database behind a data source or manager. */
export function dialectOf(source: DataSource | EntityManager): DatabaseDialect {
  const dataSource = 'connection' in source ? source.connection : source;
  return dataSource.options.type === 'postgres' ? postgresDialect : sqliteDialect;
}
