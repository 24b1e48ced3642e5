import 'reflect-metadata';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import pg from 'pg';
import { DataSource } from 'typeorm';
import { entities } from './entities';
import { migrations } from './migrations';
import { lockPlainTransactions } from './write-transaction';

/** True when the target is a PostgreSQL URL rather than a SQLite file path. */
export function isPostgresUrl(target: string): boolean {
  return /^postgres(ql)?:\/\//i.test(target);
}

/**
 * The data source for a SQLite file path (WAL, foreign keys on) or a `postgres://` URL. Migrations
 * run at start (openDatabase); no synchronize.
 */
export function createDataSource(target: string): DataSource {
  const dataSource = isPostgresUrl(target) ? postgresDataSource(target) : sqliteDataSource(target);
  lockPlainTransactions(dataSource);
  return dataSource;
}

const SQLITE_STATEMENT_CACHE = 2000;

function sqliteDataSource(databasePath: string): DataSource {
  if (databasePath !== ':memory:') mkdirSync(path.dirname(databasePath), { recursive: true });
  return new DataSource({
    type: 'better-sqlite3',
    database: databasePath,
    enableWAL: databasePath !== ':memory:',
    entities,
    migrations,
    synchronize: false,
    migrationsRun: false,
    // TypeORM writes the ids of a query into its SQL on SQLite, so each record's reads are statements of
    // their own: 100 (the default) is less than 20 techs editing their records use, and every miss
    // prepares the statement again (a third of a record save's time). Statements are small.
    statementCacheSize: SQLITE_STATEMENT_CACHE,
    prepareDatabase: (db: { pragma(sql: string): unknown }) => {
      db.pragma('foreign_keys = ON');
      db.pragma('busy_timeout = 5000');
    },
  });
}

// COUNT(*) and SUM() come back from PostgreSQL as int8, which pg hands over as strings; our counts
// stay far below 2^53, so read them as numbers like SQLite does.
pg.types.setTypeParser(pg.types.builtins.INT8, (value: string) => Number(value));

/** Connections per instance: a request holds one only for its statements (the write lock queues in process first). */
const POSTGRES_POOL_SIZE = 10;

function postgresDataSource(url: string): DataSource {
  return new DataSource({
    type: 'postgres',
    url,
    entities,
    migrations,
    synchronize: false,
    migrationsRun: false,
    extra: { max: POSTGRES_POOL_SIZE },
  });
}

/** Opens the database (a SQLite file path or a PostgreSQL URL) and brings its schema up to date. */
export async function openDatabase(target: string): Promise<DataSource> {
  const dataSource = createDataSource(target);
  await dataSource.initialize();
  if (dataSource.options.type === 'postgres') await migrateAlone(dataSource);
  else await dataSource.runMigrations({ transaction: 'each' });
  return dataSource;
}

// Any constant; every instance uses the same one.
const MIGRATION_LOCK_KEY = 0x54616e6d6967;

/**
 * Several instances starting at once on one PostgreSQL database would each run the pending migrations
 * (TypeORM takes no lock): the first holds a session advisory lock while it migrates, the others wait
 * and then find nothing left to do.
 */
async function migrateAlone(dataSource: DataSource): Promise<void> {
  const runner = dataSource.createQueryRunner();
  await runner.connect();
  try {
    await runner.query('SELECT pg_advisory_lock($1)', [MIGRATION_LOCK_KEY]);
    await dataSource.runMigrations({ transaction: 'each' });
  } finally {
    await runner.query('SELECT pg_advisory_unlock($1)', [MIGRATION_LOCK_KEY]).catch(() => undefined);
    await runner.release();
  }
}
