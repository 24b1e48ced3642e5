import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
// @ts-expect-error -- a plain .mjs script shared with the PostgreSQL benches
import { startCluster } from '../scripts/postgres-cluster.mjs';
import { priceCsv, realImport } from './import.bench';
import { postmasterPid, treeCpuS } from './process-cpu';

/**
 * A local aid, not a bench: the 100k-row price import on SQLite and PostgreSQL, n times, with the
 * PostgreSQL cluster's own CPU time beside the wall clock (on a shared machine wall time is noisy).
 * Usage: node --import tsx bench/import-pair.ts [n] [both|sqlite|pg]
 */
async function main() {
  const n = Number(process.argv[2] ?? 2);
  const which = process.argv[3] ?? 'both';
  const cluster = (await startCluster({ durable: true })) as { url: string; dir: string; stop(): Promise<void> };
  const postmaster = postmasterPid(path.join(cluster.dir, 'data'));
  const dir = mkdtempSync(path.join(os.tmpdir(), 'import-pair-'));
  try {
    const file = path.join(dir, 'prices.csv');
    writeFileSync(file, priceCsv(100_000));
    for (let i = 0; i < n; i++) {
      let s = { seconds: NaN, cpuSeconds: NaN, rows: 0 };
      if (which !== 'pg') {
        for (const suffix of ['', '-wal', '-shm']) rmSync(path.join(dir, `real.sqlite${suffix}`), { force: true });
        s = await realImport(dir, file);
      }
      let p = { seconds: NaN, cpuSeconds: NaN, rows: 0 };
      let pgCpu = NaN;
      if (which !== 'sqlite') {
        const admin = new pg.Client({ connectionString: cluster.url });
        await admin.connect();
        await admin.query(`CREATE DATABASE "import_${i}"`);
        if (process.env.PAIR_LOG_STATEMENTS) {
          await admin.query(`ALTER SYSTEM SET log_min_duration_statement = ${Number(process.env.PAIR_LOG_STATEMENTS)}`);
          await admin.query('SELECT pg_reload_conf()');
        }
        await admin.end();
        const url = new URL(cluster.url);
        url.pathname = `/import_${i}`;
        const before = treeCpuS(postmaster);
        p = await realImport(dir, file, url.toString());
        pgCpu = treeCpuS(postmaster) - before;
      }
      const r = (x: number) => Math.round(x * 100) / 100;
      console.log(JSON.stringify({ sqliteS: r(s.seconds), sqliteCpuS: r(s.cpuSeconds), pgS: r(p.seconds), pgNodeCpuS: r(p.cpuSeconds), pgServerCpuS: r(pgCpu), ratio: r(p.seconds / s.seconds), rows: [s.rows, p.rows] }));
    }
  } finally {
    rmSync(dir, { recursive: true, force: true });
    if (process.env.PAIR_LOG_STATEMENTS) writeFileSync(path.join(os.tmpdir(), 'import-pair-server.log'), readFileSync(path.join(cluster.dir, 'server.log')));
    await cluster.stop();
  }
}

void main();
