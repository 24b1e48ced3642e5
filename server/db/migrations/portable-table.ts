import type { QueryRunner, Table } from 'typeorm';

/**
 * The one column type our migrations write that SQLite and PostgreSQL spell differently: a date and
 * time is `datetime` on SQLite (TypeORM stores text) and `timestamp` on PostgreSQL. Migrations declare
 * `datetime` and create their tables through this, so one file runs on both.
 */
export function dateTimeType(queryRunner: QueryRunner): 'datetime' | 'timestamp' {
  return queryRunner.connection.driver.options.type === 'postgres' ? 'timestamp' : 'datetime';
}

/** A copy of the table with its `datetime` columns in the running database's spelling. */
export function portableTable(queryRunner: QueryRunner, table: Table): Table {
  const copy = table.clone();
  const type = dateTimeType(queryRunner);
  for (const column of copy.columns) if (column.type === 'datetime') column.type = type;
  return copy;
}
