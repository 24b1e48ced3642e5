import 'reflect-metadata';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { DataSource } from 'typeorm';
import { entities } from './entities';
import { migrations } from './migrations';
import { lockPlainTransactions } from './write-transaction';

/** The SQLite data source (WAL, foreign keys on). Migrations run at start; no synchronize. */
export function createDataSource(databasePath: string): DataSource {
  if (databasePath !== ':memory:') mkdirSync(path.dirname(databasePath), { recursive: true });
  const dataSource = new DataSource({
    type: 'better-sqlite3',
    database: databasePath,
    enableWAL: databasePath !== ':memory:',
    entities,
    migrations,
    synchronize: false,
    migrationsRun: false,
    prepareDatabase: (db: { pragma(sql: string): unknown }) => {
      db.pragma('foreign_keys = ON');
      db.pragma('busy_timeout = 5000');
    },
  });
  lockPlainTransactions(dataSource);
  return dataSource;
}

/** Opens the database and brings its schema up to date. */
export async function openDatabase(databasePath: string): Promise<DataSource> {
  const dataSource = createDataSource(databasePath);
  await dataSource.initialize();
  await dataSource.runMigrations({ transaction: 'each' });
  return dataSource;
}
