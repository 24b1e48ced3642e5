import type { DataSource, EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';
import { postgresDialect } from './postgres-dialect';
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
  /** Every catalog kind's version counter (catalog_versions), read once per request. */
  catalogVersions(dataSource: DataSource): Promise<Map<string, number>>;
}

/** The dialect of the database behind a data source or manager. */
export function dialectOf(source: DataSource | EntityManager): DatabaseDialect {
  const dataSource = 'connection' in source ? source.connection : source;
  return dataSource.options.type === 'postgres' ? postgresDialect : sqliteDialect;
}
