import type { EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';
import type { DatabaseDialect, UserRow } from './dialect';

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

/** `unnest($1::integer[], $2::character varying[], …)`: one array parameter per column, however many rows. */
const unnestOf = (types: string[]) => `unnest(${types.map((t, i) => `$${i + 1}::${t}[]`).join(', ')})`;

/**
 * PostgreSQL: the rows of a call go in as ONE statement whatever their number, with one array
 * parameter per column (INSERT … SELECT FROM unnest(…), UPDATE … FROM unnest(…)): a short statement
 * PostgreSQL parses and plans once, instead of a VALUES list of thousands of parameters. One round
 * trip on the manager's own connection (so inside its transaction).
 */
export const postgresDialect: DatabaseDialect = {
  name: 'postgres',

  async userById(dataSource, id) {
    const rows = (await dataSource.query('SELECT "id", "email", "name", "role", "active" FROM "users" WHERE "id" = $1', [id])) as UserRow[];
    return rows[0] ?? null;
  },

  async insertRows(manager, entity, columns, rows) {
    if (rows.length === 0) return;
    const table = manager.connection.getMetadata(entity).tableName;
    const names = columns.map(quote).join(', ');
    await manager.query(`INSERT INTO ${quote(table)} (${names}) SELECT * FROM ${unnestOf(columnTypes(manager, entity, columns))}`, byColumn(rows, columns.length));
  },

  async updateRowsById(manager, entity, columns, rows, keepWhenNull = []) {
    if (rows.length === 0) return;
    const table = manager.connection.getMetadata(entity).tableName;
    const all = ['id', ...columns];
    const sets = columns.map((c) => (keepWhenNull.includes(c) ? `${quote(c)} = COALESCE(v.${quote(c)}, t.${quote(c)})` : `${quote(c)} = v.${quote(c)}`));
    await manager.query(
      `UPDATE ${quote(table)} AS t SET ${sets.join(', ')} FROM ${unnestOf(columnTypes(manager, entity, all))} AS v(${all.map(quote).join(', ')}) WHERE t."id" = v."id"`,
      byColumn(rows, all.length),
    );
  },

  async catalogVersions(dataSource) {
    const rows = (await dataSource.query('SELECT "kind", "version" FROM "catalog_versions"')) as { kind: string; version: number }[];
    return new Map(rows.map((r) => [r.kind, r.version]));
  },
};
