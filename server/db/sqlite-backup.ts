import { chmodSync, mkdirSync, renameSync, rmSync, statSync } from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';

export interface SqliteBackup {
  file: string;
  sizeBytes: number;
}

/** `tandem-2026-12-02T13-05-09Z.sqlite`: sorts by time and has no characters a file system refuses. */
export function backupFileName(at: Date): string {
  return `tandem-${at
    .toISOString()
    .replace(/\.\d{3}Z$/, 'Z')
    .replace(/:/g, '-')}.sqlite`;
}

/**
 * Copies a live SQLite database with SQLite's online backup API (better-sqlite3's `db.backup()`):
 * a consistent snapshot including what sits in the WAL, taken while the server keeps serving. The
 * copy is written under a `.partial` name, checked with `PRAGMA integrity_check`, and only then
 * renamed, so a file with the final name is always a whole, sound backup, in one file. Mode 0600: it holds
 * password hashes.
 */
export async function backupSqlite(databasePath: string, destDir: string, at = new Date()): Promise<SqliteBackup> {
  mkdirSync(destDir, { recursive: true });
  const file = path.join(destDir, backupFileName(at));
  const partial = `${file}.partial`;
  const source = new Database(databasePath, { fileMustExist: true });
  try {
    source.pragma('busy_timeout = 5000');
    await source.backup(partial);
  } catch (err) {
    rmSync(partial, { force: true });
    throw err;
  } finally {
    source.close();
  }
  chmodSync(partial, 0o600);
  const copy = new Database(partial, { fileMustExist: true });
  let integrity: unknown;
  try {
    // The copy inherits WAL mode; a rollback journal makes it one self-contained file (the server
    // turns WAL back on when it opens a restored copy).
    copy.pragma('journal_mode = DELETE');
    integrity = copy.pragma('integrity_check', { simple: true });
  } finally {
    copy.close();
  }
  if (integrity !== 'ok') {
    rmSync(partial, { force: true });
    throw new Error(`backup failed its integrity check (${String(integrity)}); nothing was kept`);
  }
  renameSync(partial, file);
  return { file, sizeBytes: statSync(file).size };
}
