import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { runBenchEntry } from './bench-server';
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


/**
 * Baseline: bare papaparse + prepared inserts (bench/import-baseline-run.ts), in a fresh bundled process like the
 * import itself: run in this process its later rounds had a warm JIT the import's own process never has.
 */
async function baseline(dir: string, file: string, round: number): Promise<number> {
  const { seconds } = await runBenchEntry<{ seconds: number }>('import-baseline-run.ts', [dir, file, `baseline-${round}.sqlite`]);
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

/** The real import in a process of its own, so its peak RSS is the import's alone (bench/import-run.ts, bundled). */
export function realImport(dir: string, file: string, databaseUrl?: string): Promise<{ seconds: number; cpuSeconds: number; peakRssMb: number; rows: number }> {
  return runBenchEntry('import-run.ts', [dir, file, ...(databaseUrl ? [databaseUrl] : [])]);
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
        note: `median of ${IMPORT_ROUNDS} alternating rounds, each side in a fresh process (import ${list(reals.map((r) => r.seconds))} s; bare papaparse + prepared inserts ${list(bases)} s); target ratio ≤ 1.5 (issue 8)`,
      },
      { id: 'import.prices-100k.peak-rss-mb', value: round(Math.max(...reals.map((r) => r.peakRssMb)), 1), unit: 'MB', note: 'highest peak RSS of a process running only the import (sampled every 10 ms); target < 350' },
    ];
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
