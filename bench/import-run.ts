import 'reflect-metadata';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import pino from 'pino';
import type { AppContext } from '../server/context';
import { openDatabase } from '../server/db/data-source';
import type { AppConfig } from '../server/env';
import { uploadImport } from '../server/imports/imports.service';

/**
 * One price import end to end through the service (parse, validate, plan, upsert in one
 * transaction), in its own process, on SQLite or PostgreSQL; prints { seconds, cpuSeconds, peakRssMb, rows } as JSON.
 */
async function main() {
  // A third argument runs it on that (empty) PostgreSQL database instead of a temp SQLite file.
  const [dir, file, databaseUrl] = process.argv.slice(2);
  const ds = await openDatabase(databaseUrl ?? path.join(dir, 'real.sqlite'));
  const config = { databasePath: path.join(dir, 'real.sqlite'), dataDir: dir, jwtSecret: 'x'.repeat(32), webDir: dir, logLevel: 'silent', signInLimit: 10, port: 0, demo: false } as AppConfig;
  const ctx: AppContext = { dataSource: ds, config, logger: pino({ level: 'silent' }) };
  let peak = process.memoryUsage().rss;
  const sampler = setInterval(() => {
    peak = Math.max(peak, process.memoryUsage().rss);
  }, 10);
  const started = performance.now();
  const cpuBefore = process.cpuUsage();
  const view = await uploadImport(ctx, { buffer: readFileSync(file), fileName: 'bench.csv', kind: 'prices', distributor: 'Bench Supply', dryRun: false, userId: null });
  const seconds = (performance.now() - started) / 1000;
  const cpu = process.cpuUsage(cpuBefore);
  clearInterval(sampler);
  peak = Math.max(peak, process.memoryUsage().rss);
  await ds.destroy();
  // CPU time beside the wall clock: on a shared machine it is the steadier of the two.
  console.log(JSON.stringify({ seconds, cpuSeconds: (cpu.user + cpu.system) / 1e6, peakRssMb: peak / 1024 / 1024, rows: view.counts.inserted }));
}

void main();
