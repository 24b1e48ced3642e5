import type { EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';
import type { DatabaseDialect, UserRow } from './dialect';
import { rowQuerySql } from './row-query';
import { listenerConfig, PostgresChangeListener } from './postgres-change-listener';

// PostgreSQL takes at most 65535 parameters a statement; stay well under it.
const MAX_PARAMS = 30_000;
const MAX_ROWS = 2_000;

const quote = (name: string) => `"${name}"`;

function rowsPerStatement(columnCount: number): number {
  return Math.max(1, Math.min(MAX_ROWS, Math.floor(MAX_PARAMS / columnCount)));
}

function* batches<T>(items: T[], size: number): Generator<T[]> {
  for (let i = 0; i < items.length; i += size) yield items.slice(i, i + size);
}

/** `($1, $2), ($3, $4)…` for rows of `width` values; `cast` adds each column's type to the first row. */
function valuesList(rowCount: number, width: number, cast?: string[]): string {
  const out: string[] = [];
  for (let r = 0; r < rowCount; r++) {
    const cells: string[] = [];
    for (let c = 0; c < width; c++) cells.push(`$${r * width + c + 1}${r === 0 && cast ? `::${cast[c]}` : ''}`);
    out.push(`(${cells.join(', ')})`);
  }
  return out.join(', ');
}

/** The SQL types of an entity's columns, as PostgreSQL names them (for casting VALUES lists). */
function columnTypes<T extends ObjectLiteral>(manager: EntityManager, entity: EntityTarget<T>, names: string[]): string[] {
  const metadata = manager.connection.getMetadata(entity);
  return names.map((name) => {
    const column = metadata.findColumnWithPropertyName(name);
    if (!column) throw new Error(`${metadata.name} has no column ${name}`);
    return manager.connection.driver.normalizeType(column);
  });
}

/**
 * PostgreSQL: rows go in as multi-row INSERT/UPDATE … FROM (VALUES …) statements of up to 2,000 rows,
 * one round trip each, on the manager's own connection (so inside its transaction).
 */
export const postgresDialect: DatabaseDialect = {
  name: 'postgres',

  async userById(dataSource, id) {
    const rows = (await dataSource.query('SELECT "id", "email", "name", "role", "active" FROM "users" WHERE "id" = $1', [id])) as UserRow[];
    return rows[0] ?? null;
  },

  async insertRows(manager, entity, columns, rows) {
    const table = manager.connection.getMetadata(entity).tableName;
    const head = `INSERT INTO ${quote(table)} (${columns.map(quote).join(', ')}) VALUES `;
    for (const batch of batches(rows, rowsPerStatement(columns.length))) {
      await manager.query(head + valuesList(batch.length, columns.length), batch.flat());
    }
  },

  async updateRowsById(manager, entity, columns, rows, keepWhenNull = []) {
    const table = manager.connection.getMetadata(entity).tableName;
    const casts = columnTypes(manager, entity, ['id', ...columns]);
    const sets = columns.map((c) => (keepWhenNull.includes(c) ? `${quote(c)} = COALESCE(v.${quote(c)}, t.${quote(c)})` : `${quote(c)} = v.${quote(c)}`));
    const names = ['id', ...columns].map(quote).join(', ');
    for (const batch of batches(rows, rowsPerStatement(columns.length + 1))) {
      await manager.query(
        `UPDATE ${quote(table)} AS t SET ${sets.join(', ')} FROM (VALUES ${valuesList(batch.length, columns.length + 1, casts)}) AS v(${names}) WHERE t."id" = v."id"`,
        batch.flat(),
      );
    }
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
      `INSERT INTO ${quote(table)} (${columns.map(quote).join(', ')}) VALUES ${valuesList(1, columns.length)} RETURNING "id"`,
      values,
    )) as { id: number }[];
    return Number(rows[0].id);
  },

  /** LISTEN on a dedicated connection for the NOTIFY the watched tables' triggers send at commit. */
  watchChanges(dataSource) {
    return new PostgresChangeListener(listenerConfig(dataSource));
  },
};
