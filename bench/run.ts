import 'reflect-metadata';
import { readdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import type { BenchRun, Measure } from './measure';

/**
 * npm run bench: runs every bench/*.bench.ts (or those named on the command line), prints a table,
 * and writes bench/results.json ({ measures: [...] }, DESIGN.md §8). `--soak` runs the long
 * bench/*.soak.ts instead (e.g. fifty kill -9 rounds).
 */
async function main() {
  const args = process.argv.slice(2);
  const suffix = args.includes('--soak') ? '.soak.ts' : '.bench.ts';
  const only = args.filter((a) => a !== '--soak');
  const files = readdirSync(__dirname)
    .filter((f) => f.endsWith(suffix))
    .filter((f) => only.length === 0 || only.some((o) => f.includes(o)))
    .sort();
  const measures: Measure[] = [];
  for (const file of files) {
    const started = Date.now();
    process.stdout.write(`• ${file} … `);
    try {
      const mod = (await import(path.join(__dirname, file))) as { run: BenchRun };
      const result = await mod.run();
      measures.push(...result);
      console.log(`${((Date.now() - started) / 1000).toFixed(1)} s`);
    } catch (err) {
      console.log('failed');
      console.error(err);
      process.exitCode = 1;
    }
  }
  console.log('');
  console.table(
    measures.map((m) => ({ id: m.id, value: m.value, unit: m.unit, baseline: m.baseline ?? '', ratio: m.ratio ?? '', note: m.note ?? '' })),
  );
  writeFileSync(path.join(__dirname, 'results.json'), `${JSON.stringify({ measures }, null, 2)}\n`);
  console.log(`wrote bench/results.json (${measures.length} measures)`);
}

void main();
