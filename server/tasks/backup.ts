import path from 'node:path';
import { backupSqlite } from '../db/sqlite-backup';
import { loadConfig } from '../env';

/**
 * npm run backup [-- <folder>]: an online copy of the SQLite database at DATABASE_PATH into
 * <folder> (default <data dir>/backups) under a timestamped name. Safe while the server runs.
 */
async function main() {
  const config = loadConfig();
  if (config.databaseUrl) throw new Error('DATABASE_URL selects PostgreSQL: back it up with pg_dump (README, "Backups"); npm run backup copies the SQLite file only');
  if (config.databasePath === ':memory:') throw new Error('DATABASE_PATH is :memory:; there is nothing on disk to back up');
  const destDir = path.resolve(process.argv[2] ?? path.join(config.dataDir, 'backups'));
  const backup = await backupSqlite(config.databasePath, destDir);
  console.log(`backup written: ${backup.file} (${backup.sizeBytes} bytes, integrity ok)`);
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
