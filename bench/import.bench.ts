import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
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
async function baseline(dir: string, file: string): Promise<number> {
  const ds = await openDatabase(path.join(dir, 'baseline.sqlite'));
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

/** The real import in a process of its own, so its peak RSS is the import's alone (bench/import-run.ts). */
export function realImport(dir: string, file: string, databaseUrl?: string): Promise<{ seconds: number; cpuSeconds: number; peakRssMb: number; rows: number }> {
  const root = path.resolve(__dirname, '..');
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ['--import', 'tsx', path.join(__dirname, 'import-run.ts'), dir, file, ...(databaseUrl ? [databaseUrl] : [])], {
      cwd: root,
      env: { ...process.env, TSX_TSCONFIG_PATH: path.join(root, 'server/tsconfig.json') },
      stdio: ['ignore', 'pipe', 'inherit'],
    });
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
    const base = await baseline(dir, file);
    const real = await realImport(dir, file);
    if (real.rows !== ROWS) throw new Error(`import inserted ${real.rows} of ${ROWS} rows`);
    return [
      { id: 'import.prices-100k.s', value: round(real.seconds, 3), unit: 's', baseline: round(base, 3), ratio: round(real.seconds / base, 2), note: 'target ratio ≤ 1.5 (issue 8)' },
      { id: 'import.prices-100k.peak-rss-mb', value: round(real.peakRssMb, 1), unit: 'MB', note: 'peak RSS of a process running only the import (sampled every 10 ms); target < 350' },
    ];
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
