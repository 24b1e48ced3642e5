import type { EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';
import type { DatabaseDialect, UserRow } from './dialect';
import { rowQuerySql } from './row-query';
import { listenerConfig, PostgresChangeListener } from './postgres-change-listener';

const quote = (name: string) => `"${name}"`;

/** The SQL types of an entity's columns, as PostgreSQL names them (for casting array parameters). */
function columnTypes<T extends ObjectLiteral>(manager: EntityManager, entity: EntityTarget<T>, names: string[]): string[] {
  const metadata = manager.connection.getMetadata(entity);
  return names.map((name) => {
    const column = metadata.findColumnWithPropertyName(name);
    if (!column) throw new Error(`${metadata.name} has no column ${name}`);
    return manager.connection.driver.normalizeType(column);
  });
}

/** Row-major parameter rows as one array per column (what unnest takes). */
function byColumn(rows: unknown[][], width: number): unknown[][] {
  const columns: unknown[][] = [];
  for (let c = 0; c < width; c++) columns.push(new Array(rows.length));
  for (let r = 0; r < rows.length; r++) {
    const row = rows[r];
    for (let c = 0; c < width; c++) columns[c][r] = row[c];
  }
  return columns;
}

const NEEDS_ESCAPE = /["\\]/;

/**
 * A column's values as PostgreSQL's array text (`{"a","b \"c\"",NULL,3}`), built here rather than
 * by pg when the statement is sent: the caller can build the next batch's while PostgreSQL still runs
 * this one. Values other than strings, numbers, booleans and null go to pg as they are.
 */
function arrayText(values: unknown[]): unknown {
  const parts = new Array<string>(values.length);
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v === null || v === undefined) parts[i] = 'NULL';
    else if (typeof v === 'string') parts[i] = NEEDS_ESCAPE.test(v) ? `"${v.replace(/["\\]/g, '\\$&')}"` : `"${v}"`;
    else if (typeof v === 'number' || typeof v === 'boolean') parts[i] = String(v);
    else return values;
  }
  return `{${parts.join(',')}}`;
}

/** Whether every row holds the same value in this column (an import's own id, its distributor…). */
function isConstant(values: unknown[]): boolean {
  for (let i = 1; i < values.length; i++) if (values[i] !== values[0]) return false;
  return true;
}

/**
 * PostgreSQL: the rows of a call go in as ONE statement whatever their number, with one array
 * parameter per column (INSERT … SELECT FROM unnest(…), UPDATE … FROM unnest(…)): a short statement
 * PostgreSQL parses and plans once, instead of a VALUES list of thousands of parameters. A column
 * with one value in every row (the import's id) goes as a single parameter. One round trip on the
 * manager's own connection (so inside its transaction); the arrays are built when the call is made,
 * so a caller that does not wait for one call before the next overlaps its work with PostgreSQL's.
 */
export const postgresDialect: DatabaseDialect = {
  name: 'postgres',
  writesInOwnProcess: true,

  async userById(dataSource, id) {
    const rows = (await dataSource.query('SELECT "id", "email", "name", "role", "active" FROM "users" WHERE "id" = $1', [id])) as UserRow[];
    return rows[0] ?? null;
  },

  async insertRows(manager, entity, columns, rows) {
    if (rows.length === 0) return;
    const table = manager.connection.getMetadata(entity).tableName;
    const types = columnTypes(manager, entity, columns);
    const values = byColumn(rows, columns.length);
    const params: unknown[] = [];
    const arrays: { name: string; sql: string }[] = [];
    const select = columns.map((column, i) => {
      // At least one column stays an array: it is what gives the statement its rows.
      if (rows.length > 1 && (arrays.length > 0 || i < columns.length - 1) && isConstant(values[i])) {
        params.push(values[i][0]);
        return `$${params.length}::${types[i]}`;
      }
      params.push(arrayText(values[i]));
      arrays.push({ name: quote(column), sql: `$${params.length}::${types[i]}[]` });
      return `u.${quote(column)}`;
    });
    const from = `unnest(${arrays.map((a) => a.sql).join(', ')}) AS u(${arrays.map((a) => a.name).join(', ')})`;
    await manager.query(`INSERT INTO ${quote(table)} (${columns.map(quote).join(', ')}) SELECT ${select.join(', ')} FROM ${from}`, params);
  },

  async updateRowsById(manager, entity, columns, rows, keepWhenNull = []) {
    if (rows.length === 0) return;
    const table = manager.connection.getMetadata(entity).tableName;
    const all = ['id', ...columns];
    const types = columnTypes(manager, entity, all);
    const sets = columns.map((c) => (keepWhenNull.includes(c) ? `${quote(c)} = COALESCE(v.${quote(c)}, t.${quote(c)})` : `${quote(c)} = v.${quote(c)}`));
    const from = `unnest(${types.map((t, i) => `$${i + 1}::${t}[]`).join(', ')}) AS v(${all.map(quote).join(', ')})`;
    await manager.query(`UPDATE ${quote(table)} AS t SET ${sets.join(', ')} FROM ${from} WHERE t."id" = v."id"`, byColumn(rows, all.length).map(arrayText));
  },

  async catalogVersions(dataSource) {
    const rows = (await dataSource.query('SELECT "kind", "version" FROM "catalog_versions"')) as { kind: string; version: number }[];
    return new Map(rows.map((r) => [r.kind, r.version]));
  },

  async hasRow(manager, entity, id) {
    const table = manager.connection.getMetadata(entity).tableName;
    return ((await manager.query(`SELECT 1 FROM ${quote(table)} WHERE "id" = $1`, [id])) as unknown[]).length > 0;
  },

  async selectRows(manager, entity, query) {
    return (await manager.query(rowQuerySql(manager, entity, query, '$1'), [query.where[1]])) as Record<string, unknown>[];
  },

  async insertRowReturningId(manager, entity, columns, values) {
    const table = manager.connection.getMetadata(entity).tableName;
    const rows = (await manager.query(
      `INSERT INTO ${quote(table)} (${columns.map(quote).join(', ')}) VALUES (${columns.map((_, i) => `$${i + 1}`).join(', ')}) RETURNING "id"`,
      values,
    )) as { id: number }[];
    return Number(rows[0].id);
  },

  /** LISTEN on a dedicated connection for the NOTIFY the watched tables' triggers send at commit. */
  watchChanges(dataSource) {
    return new PostgresChangeListener(listenerConfig(dataSource));
  },
};
