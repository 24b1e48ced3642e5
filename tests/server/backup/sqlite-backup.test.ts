import { execFile } from 'node:child_process';
import { copyFileSync, mkdtempSync, readdirSync, rmSync, statSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openDatabase } from '../../../server/db/data-source';
import { backupFileName, backupSqlite } from '../../../server/db/sqlite-backup';
import { JobRow } from '../../../server/jobs/job.entity';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { onPostgres } from '../../helpers/test-database';

const run = promisify(execFile);
const root = path.resolve(__dirname, '../../..');

let t: TestApp;
let backups: string;
beforeAll(async () => {
  t = await createTestApp();
  backups = mkdtempSync(path.join(os.tmpdir(), 'tandem-backups-'));
});
afterAll(async () => {
  await t?.close();
  rmSync(backups, { recursive: true, force: true });
});

const newJob = (customerName: string) =>
  request(t.app)
    .post('/api/jobs')
    .set({ Authorization: `Bearer ${t.tokenFor('tech')}` })
    .send({ customerName, siteAddress: '14 Larkspur Row', state: 'OH' })
    .expect(201);

/** Copies a backup to where a database would live and opens it as the server does (migrations run). */
async function restore(file: string) {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'tandem-restore-'));
  const target = path.join(dir, 'tandem.sqlite');
  copyFileSync(file, target);
  const dataSource = await openDatabase(target);
  return {
    names: async () => (await dataSource.getRepository(JobRow).find({ order: { id: 'ASC' } })).map((j) => j.customerName),
    close: async () => {
      await dataSource.destroy();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

describe.skipIf(onPostgres)('SQLite online backup (SQLite only: PostgreSQL is backed up with pg_dump)', () => {
  it('when the name is made, then it carries the UTC time to the second with no colons', () => {
    expect(backupFileName(new Date('2026-12-02T13:05:09.123Z'))).toBe('tandem-2026-12-02T13-05-09Z.sqlite');
  });

  it('when a backup is taken while the app holds the database open, then restoring it finds the rows written before and not those after', async () => {
    await newJob('Wren Okafor');
    await newJob('Ilse Marchetti');
    const backup = await backupSqlite(t.ctx.config.databasePath, backups, new Date('2026-12-02T13:00:00Z'));
    await newJob('Written After');

    expect(path.basename(backup.file)).toBe('tandem-2026-12-02T13-00-00Z.sqlite');
    expect(backup.sizeBytes).toBe(statSync(backup.file).size);
    // Owner read/write only: the copy holds password hashes.
    expect(statSync(backup.file).mode & 0o777).toBe(0o600);
    // One self-contained file: no .partial left, no -wal or -shm beside it.
    expect(readdirSync(backups).filter((n) => n.startsWith('tandem-'))).toEqual([path.basename(backup.file)]);

    const restored = await restore(backup.file);
    try {
      expect(await restored.names()).toEqual(['Wren Okafor', 'Ilse Marchetti']);
    } finally {
      await restored.close();
    }
  });

  it('when the database file does not exist, then the backup fails and leaves no file behind', async () => {
    const dest = path.join(backups, 'missing');
    await expect(backupSqlite(path.join(backups, 'no-such.sqlite'), dest)).rejects.toThrow();
    expect(readdirSync(dest)).toEqual([]);
  });

  it('when `npm run backup -- <folder>` runs against the app database, then a timestamped backup with the rows appears there', async () => {
    await newJob('Teodor Lindqvist');
    const dest = path.join(backups, 'from-task');
    const { stdout } = await run(process.execPath, ['scripts/run-server-task.mjs', 'backup', dest], {
      cwd: root,
      env: {
        ...process.env,
        DATABASE_PATH: t.ctx.config.databasePath,
        TANDEM_DATA_DIR: t.ctx.config.dataDir,
        TANDEM_JWT_SECRET: 'x'.repeat(32),
      },
      timeout: 60_000,
    });
    const files = readdirSync(dest);
    expect(files).toHaveLength(1);
    expect(files[0]).toMatch(/^tandem-\d{4}-\d{2}-\d{2}T\d{2}-\d{2}-\d{2}Z\.sqlite$/);
    expect(stdout).toContain('integrity ok');
    const restored = await restore(path.join(dest, files[0]));
    try {
      expect(await restored.names()).toContain('Teodor Lindqvist');
    } finally {
      await restored.close();
    }
  });
});
