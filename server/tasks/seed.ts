import 'reflect-metadata';
import { rmSync } from 'node:fs';
import { seedDemoIfEmpty } from '../../seed/demo';
import { openDatabase } from '../db/data-source';
import { loadConfig } from '../env';
import { createLogger } from '../lib/logger';

/** npm run seed: deletes the database at DATABASE_PATH and loads the demo scenario afresh. */
async function main() {
  const config = loadConfig();
  const logger = createLogger(config);
  for (const suffix of ['', '-wal', '-shm']) rmSync(`${config.databasePath}${suffix}`, { force: true });
  const dataSource = await openDatabase(config.databasePath);
  await seedDemoIfEmpty({ dataSource, config, logger });
  await dataSource.destroy();
  console.log(`demo database reset at ${config.databasePath}`);
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
