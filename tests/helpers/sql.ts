import type { DataSource } from 'typeorm';

/**
 * Raw SQL in a test, on either database: write `?` placeholders and double-quote camelCase names
 * (PostgreSQL folds unquoted names to lower case); on PostgreSQL the placeholders become $1, $2….
 */
export function sql<T = Record<string, unknown>>(dataSource: DataSource, text: string, params: unknown[] = []): Promise<T[]> {
  let n = 0;
  const query = dataSource.options.type === 'postgres' ? text.replace(/\?/g, () => `$${++n}`) : text;
  return dataSource.query(query, params) as Promise<T[]>;
}
