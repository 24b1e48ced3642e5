import 'reflect-metadata';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import Papa from 'papaparse';
import { openDatabase } from '../server/db/data-source';
import { sqliteHandle } from '../server/db/sqlite-handle';

/**
 * The baseline of import.prices-100k.s in a process of its own, started and timed exactly like
 * bench/import-run.ts (bundled, fresh process, clock started after the database opens): papaparse
 * alone, then better-sqlite3 prepared inserts in one transaction, into the same table and indexes.
 * Prints { seconds } as JSON.
 */
async function main() {
  const [dir, file, name] = process.argv.slice(2);
  const ds = await openDatabase(path.join(dir, name));
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
  console.log(JSON.stringify({ seconds }));
}

void main();
