import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pino from 'pino';
import { listCatalog } from '../server/catalog/catalog.service';
import type { AppContext } from '../server/context';
import { openDatabase } from '../server/db/data-source';
import type { AppConfig } from '../server/env';
import { uploadImport } from '../server/imports/imports.service';
import { percentile, round, type Measure } from './measure';

const ITEMS = 50_000;
const REFRIGERANTS = ['R-410A', 'R-32', 'R-454B', 'R-22'];
const BRANDS = ['Quillon', 'Tarrow', 'Vessany', 'Marlowe Air', 'Ostrel'];

/** A generated 50k-row outdoor-unit file (invented brands and models). */
function catalogCsv(): string {
  const lines = ['model,brand,description,system_type,refrigerant,nominal_tons'];
  for (let i = 0; i < ITEMS; i++) {
    const tons = [1.5, 2, 2.5, 3, 3.5, 4, 5][i % 7];
    const brand = BRANDS[i % BRANDS.length];
    const type = i % 2 ? 'heat-pump' : 'ac';
    lines.push(`${brand.slice(0, 2).toUpperCase()}${type === 'ac' ? 'A' : 'H'}-${String(i).padStart(5, '0')}-${tons * 12},${brand},"${tons}-ton ${type === 'ac' ? 'air conditioner' : 'heat pump'} series ${i % 97}",${type},${REFRIGERANTS[i % 4]},${tons}`);
  }
  return `${lines.join('\n')}\n`;
}

const QUERIES = ['QUA-00042-36', 'TAH-12345', 'vessany', 'marlowe air heat pump', 'OSA-4', 'series 42', 'quilon', 'tarow heat', '49999', 'heat pump 3-ton', 'VEH-2', 'MAA-0777', 'ostrel air conditioner', 'QUH-01', 'air conditoner'];

export async function run(): Promise<Measure[]> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'tandem-bench-search-'));
  try {
    const ds = await openDatabase(path.join(dir, 'search.sqlite'));
    const ctx: AppContext = { dataSource: ds, config: { logLevel: 'silent' } as AppConfig, logger: pino({ level: 'silent' }) };
    await uploadImport(ctx, { buffer: Buffer.from(catalogCsv()), fileName: 'bench.csv', kind: 'outdoor-units', dryRun: false, userId: null });
    await listCatalog(ctx, 'outdoor-units', { q: 'warm', page: 1, pageSize: 20 }); // builds the index once
    const times: number[] = [];
    for (let round_ = 0; round_ < 4; round_++) {
      for (const q of QUERIES) {
        const started = performance.now();
        await listCatalog(ctx, 'outdoor-units', { q, page: 1, pageSize: 20, ...(round_ % 2 ? { refrigerant: 'R-32' } : {}) });
        times.push(performance.now() - started);
      }
    }
    await ds.destroy();
    const note = `${times.length} queries over ${ITEMS.toLocaleString('en-US')} items through listCatalog (fuse.js), index built once`;
    return [
      { id: 'search.catalog-50k.p95-ms', value: round(percentile(times, 95), 2), unit: 'ms', note: `${note}; target < 25` },
      { id: 'search.catalog-50k.median-ms', value: round(percentile(times, 50), 2), unit: 'ms', note },
    ];
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
