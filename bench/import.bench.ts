import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import Papa from 'papaparse';
import { openDatabase } from '../server/db/data-source';
import { sqliteHandle } from '../server/db/sqlite-handle';
import { round, type Measure } from './measure';

const ROWS = 100_000;

/** A distributor-style price file: quoted descriptions, "$1,234.50" prices, a few effective dates. */
export function priceCsv(rows: number): string {
  const lines = ['model,price,effective_from,description'];
  for (let i = 0; i < rows; i++) {
    const dollars = 100 + ((i * 7919) % 500000) / 100;
    const price = `"$${dollars.toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 })}"`;
    lines.push(`BX-${String(i).padStart(6, '0')}-K,${price},2025-0${1 + (i % 9)}-01,"Bench part ${i}, generated"`);
  }
  return `${lines.join('\n')}\n`;
}


/** Baseline: papaparse alone, then better-sqlite3 prepared inserts in one transaction (same table and indexes). */
async function baseline(dir: string, file: string, round: number): Promise<number> {
  const ds = await openDatabase(path.join(dir, `baseline-${round}.sqlite`));
  const db = sqliteHandle(ds.manager) as unknown as { prepare(sql: string): { run(...a: unknown[]): unknown }; transaction(fn: () => void): () => void };
  db.prepare("INSERT INTO distributors (name) VALUES ('Baseline')").run();
  const started = performance.now();
  const parsed = Papa.parse<Record<string, string>>(readFileSync(file, 'utf8'), { header: true, skipEmptyLines: true });
  const insert = db.prepare(
    'INSERT INTO price_entries (distributorId, model, normalizedModel, priceCents, currency, effectiveFrom, description, importId) VALUES (1, ?, ?, ?, ?, ?, ?, NULL)',
  );
  db.transaction(() => {
    for (const r of parsed.data) {
      const cents = Math.round(Number(r.price.replace(/[$,]/g, '')) * 100);
      insert.run(r.model, r.model, cents, 'USD', r.effective_from, r.description);
    }
  })();
  const seconds = (performance.now() - started) / 1000;
  await ds.destroy();
  return seconds;
}

/** A fresh SQLite file for the next real import into `dir` (import-run writes real.sqlite). */
export function clearRealImport(dir: string): void {
  for (const suffix of ['', '-wal', '-shm']) rmSync(path.join(dir, `real.sqlite${suffix}`), { force: true });
}

/** Rounds of each import: one run alone swings by a third on a shared 2-core machine, so medians are reported. */
export const IMPORT_ROUNDS = 3;

/** The middle value of a small list. */
export function median(values: number[]): number {
  const sorted = [...values].sort((x, y) => x - y);
  return sorted[Math.floor(sorted.length / 2)];
}

// bench/import-run.ts bundled once per bench process, the way `npm start` runs the server (scripts/bundle-server.mjs):
// under tsx every cross-module call goes through a getter, which would bill the import for a cost it does not ship with.
let importRunBundle: Promise<string> | undefined;
function bundledImportRun(root: string): Promise<string> {
  importRunBundle ??= import(pathToFileURL(path.join(root, 'scripts/bundle-server.mjs')).href).then(
    (m: { bundleServer(entry: string, outfile: string): Promise<string> }) => m.bundleServer('bench/import-run.ts', 'build/bench/import-run.cjs'),
  );
  return importRunBundle;
}

/** The real import in a process of its own, so its peak RSS is the import's alone (bench/import-run.ts, bundled). */
export async function realImport(dir: string, file: string, databaseUrl?: string): Promise<{ seconds: number; cpuSeconds: number; peakRssMb: number; rows: number }> {
  const root = path.resolve(__dirname, '..');
  const bundle = await bundledImportRun(root);
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [bundle, dir, file, ...(databaseUrl ? [databaseUrl] : [])], { cwd: root, stdio: ['ignore', 'pipe', 'inherit'] });
    let out = '';
    child.stdout.on('data', (chunk) => (out += chunk));
    child.on('exit', (code) => (code === 0 ? resolve(JSON.parse(out.trim().split('\n').pop()!)) : reject(new Error(`import run exited with ${code}`))));
  });
}

export async function run(): Promise<Measure[]> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'tandem-bench-import-'));
  try {
    const file = path.join(dir, 'prices.csv');
    writeFileSync(file, priceCsv(ROWS));
    // Alternating rounds, so a burst of other work on the machine weighs on both sides alike.
    const bases: number[] = [];
    const reals: { seconds: number; peakRssMb: number; rows: number }[] = [];
    for (let i = 0; i < IMPORT_ROUNDS; i++) {
      bases.push(await baseline(dir, file, i));
      clearRealImport(dir);
      const real = await realImport(dir, file);
      if (real.rows !== ROWS) throw new Error(`import inserted ${real.rows} of ${ROWS} rows`);
      reals.push(real);
    }
    const base = median(bases);
    const seconds = median(reals.map((r) => r.seconds));
    const list = (xs: number[]) => xs.map((x) => round(x, 2)).join(', ');
    return [
      {
        id: 'import.prices-100k.s',
        value: round(seconds, 3),
        unit: 's',
        baseline: round(base, 3),
        ratio: round(seconds / base, 2),
        note: `median of ${IMPORT_ROUNDS} alternating rounds (import ${list(reals.map((r) => r.seconds))} s; bare papaparse + prepared inserts ${list(bases)} s); target ratio ≤ 1.5 (issue 8)`,
      },
      { id: 'import.prices-100k.peak-rss-mb', value: round(Math.max(...reals.map((r) => r.peakRssMb)), 1), unit: 'MB', note: 'highest peak RSS of a process running only the import (sampled every 10 ms); target < 350' },
    ];
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
