import 'reflect-metadata';
import { rmSync } from 'node:fs';
import { seedDemoIfEmpty } from '../../seed/demo';
import { openDatabase } from '../db/data-source';
import { databaseLabel, databaseTarget, loadConfig } from '../env';
import { createLogger } from '../lib/logger';

/**
 * npm run seed: deletes the SQLite database at DATABASE_PATH and loads the demo scenario afresh. On
 * PostgreSQL (DATABASE_URL) it never drops anything: it seeds only a database with no users yet.
 */
async function main() {
  const config = loadConfig();
  const logger = createLogger(config);
  if (!config.databaseUrl) for (const suffix of ['', '-wal', '-shm']) rmSync(`${config.databasePath}${suffix}`, { force: true });
  const dataSource = await openDatabase(databaseTarget(config));
  const seeded = await seedDemoIfEmpty({ dataSource, config, logger });
  await dataSource.destroy();
  console.log(seeded ? `demo data loaded into ${databaseLabel(config)}` : `${databaseLabel(config)} already has users: nothing seeded`);
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
