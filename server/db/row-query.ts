import type { EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';

/** What selectRows reads: columns (entity property names), one equality, an order. */
export interface RowQuery<T extends ObjectLiteral> {
  columns: (keyof T & string)[];
  where: [keyof T & string, unknown];
  orderBy?: [keyof T & string, 'ASC' | 'DESC'][];
  limit?: number;
}

/** The SQL of a RowQuery with `placeholder` for its one value (column names as the entity maps them). */
export function rowQuerySql<T extends ObjectLiteral>(
  manager: EntityManager,
  entity: EntityTarget<T>,
  query: RowQuery<T>,
  placeholder: string,
): string {
  const metadata = manager.connection.getMetadata(entity);
  const column = (name: string) => {
    const found = metadata.findColumnWithPropertyName(name);
    if (!found) throw new Error(`${metadata.name} has no column ${name}`);
    return `"${found.databaseName}"`;
  };
  const order = query.orderBy?.length ? ` ORDER BY ${query.orderBy.map(([c, d]) => `${column(c)} ${d}`).join(', ')}` : '';
  const limit = query.limit ? ` LIMIT ${Math.trunc(query.limit)}` : '';
  return `SELECT ${query.columns.map(column).join(', ')} FROM "${metadata.tableName}" WHERE ${column(query.where[0])} = ${placeholder}${order}${limit}`;
}

/** One raw row as the entity's values (JSON columns parsed, booleans and numbers as the driver maps them). */
export function hydrateRow<T extends ObjectLiteral>(manager: EntityManager, entity: EntityTarget<T>, raw: Record<string, unknown>): T {
  const metadata = manager.connection.getMetadata(entity);
  const driver = manager.connection.driver;
  const row = metadata.create() as Record<string, unknown>;
  for (const column of metadata.columns) {
    if (column.databaseName in raw) row[column.propertyName] = driver.prepareHydratedValue(raw[column.databaseName], column);
  }
  return row as T;
}
