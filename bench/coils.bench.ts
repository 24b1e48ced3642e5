import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { PerformanceObserver } from 'node:perf_hooks';
import pino from 'pino';
import { runChecks } from '../shared/rules/engine';
import { kindIndex } from '../server/catalog/catalog-index';
import { toSpec } from '../server/catalog/catalog-specs';
import type { IndoorCoil } from '../server/catalog/indoor-coil.entity';
import { resolvePairing } from '../server/checks/checks.service';
import { compatibleCoils } from '../server/coils/coils.service';
import type { CoilsQuery } from '../shared/schemas/coils';
import type { AppContext } from '../server/context';
import { openDatabase } from '../server/db/data-source';
import type { AppConfig } from '../server/env';
import { uploadImport } from '../server/imports/imports.service';
import { loadRuleContext } from '../server/settings/settings.service';
import { percentile, round, type Measure } from './measure';

const COILS = 50_000;
const REFRIGERANTS = ['R-410A', 'R-32', 'R-454B', 'R-22'];
const TONS = [1.5, 2, 2.5, 3, 3.5, 4, 5];
const CONFIGS = ['upflow', 'downflow', 'horizontal', 'multi-position'];

/** A generated 50k-coil file (invented models): each coil listed for one refrigerant, a 0.5–1 ton range. */
function coilsCsv(): string {
  const lines = ['model,configuration,cased,material,min_tons,max_tons,refrigerants,metering_type,metering_refrigerant,metering_bidirectional,width_in'];
  for (let i = 0; i < COILS; i++) {
    const min = TONS[i % TONS.length];
    const ref = REFRIGERANTS[Math.floor(i / 7) % 4];
    lines.push(`BC-${String(i).padStart(5, '0')},${CONFIGS[i % 4]},${i % 3 ? 'yes' : 'no'},${i % 5 ? 'aluminum' : 'copper'},${min},${min + (i % 2 ? 1 : 0.5)},${ref},txv,${ref},yes,${[14, 17.5, 21, 24.5][i % 4]}`);
  }
  return `${lines.join('\n')}\n`;
}

function outdoorsCsv(): string {
  const lines = ['model,system_type,refrigerant,nominal_tons,metering_required,seer2,eer2,hspf2'];
  REFRIGERANTS.forEach((ref, r) => TONS.forEach((t) => lines.push(`BO-${r}-${t * 12},heat-pump,${ref},${t},txv,15,12,7.8`)));
  return `${lines.join('\n')}\n`;
}

/** Every 10th coil priced (so the price pick runs on a realistic share). */
function pricesCsv(): string {
  const lines = ['model,price,effective_from'];
  for (let i = 0; i < COILS; i += 10) lines.push(`BC-${String(i).padStart(5, '0')},${400 + (i % 300)}.00,2025-01-01`);
  return `${lines.join('\n')}\n`;
}

interface QueryRun {
  query: CoilsQuery;
  ms: number;
  total: number;
  gcMs: number;
}

/** Garbage-collection pause time (ms) since the last take, from the gc performance entries. */
function gcPauses() {
  let pending = 0;
  const observer = new PerformanceObserver((list) => {
    for (const entry of list.getEntries()) pending += entry.duration;
  });
  observer.observe({ entryTypes: ['gc'] });
  return {
    take() {
      for (const entry of observer.takeRecords()) pending += entry.duration;
      const ms = pending;
      pending = 0;
      return ms;
    },
    stop: () => observer.disconnect(),
  };
}

/**
 * Per-query timing by parameter set (printed, not measured): the first search of an outdoor unit works
 * out its context, the ones after reuse it; the slowest queries with their size and GC pauses.
 */
function printBreakdown(runs: QueryRun[]): void {
  const seen = new Set<number>();
  const sets = new Map<string, number[]>();
  for (const r of runs) {
    const kind = `${r.query.q ? 'q+configuration' : 'outdoor only'}, ${seen.has(r.query.outdoorUnitId) ? 'context reused' : 'first for its outdoor unit'}`;
    seen.add(r.query.outdoorUnitId);
    sets.set(kind, [...(sets.get(kind) ?? []), r.ms]);
  }
  console.log('\n  coils: per-query timing by parameter set (ms)');
  for (const [kind, ms] of sets) console.log(`    ${kind.padEnd(48)} n=${String(ms.length).padStart(3)}  p50 ${percentile(ms, 50).toFixed(1).padStart(6)}  p95 ${percentile(ms, 95).toFixed(1).padStart(6)}  max ${Math.max(...ms).toFixed(1).padStart(6)}`);
  console.log(`    GC pauses during the timed queries: ${runs.reduce((s, r) => s + r.gcMs, 0).toFixed(1)} ms in total`);
  console.log('  slowest queries:');
  for (const r of [...runs].sort((a, b) => b.ms - a.ms).slice(0, 5)) {
    console.log(`    ${r.ms.toFixed(1).padStart(7)} ms  total ${String(r.total).padStart(5)}  gc ${r.gcMs.toFixed(1).padStart(5)} ms  ${JSON.stringify(r.query)}`);
  }
}

export async function run(): Promise<Measure[]> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'tandem-bench-coils-'));
  try {
    const ds = await openDatabase(path.join(dir, 'coils.sqlite'));
    const ctx: AppContext = { dataSource: ds, config: { logLevel: 'silent' } as AppConfig, logger: pino({ level: 'silent' }) };
    const load = (kind: 'indoor-coils' | 'outdoor-units' | 'prices', csv: string, distributor?: string) =>
      uploadImport(ctx, { buffer: Buffer.from(csv), fileName: `${kind}.csv`, kind, distributor, dryRun: false, userId: null });
    await load('indoor-coils', coilsCsv());
    await load('outdoor-units', outdoorsCsv());
    await load('prices', pricesCsv(), 'Bench Supply');
    const outdoorIds = (await kindIndex(ds, 'outdoor-units')).rows.map((r) => r.id);
    await compatibleCoils(ctx, { outdoorUnitId: outdoorIds[0], limit: 50 }); // builds the indexes once

    const queries = outdoorIds.flatMap((id, i) => [{ outdoorUnitId: id, limit: 50 }, { outdoorUnitId: id, limit: 50, q: `BC-0${i}`, configuration: 'upflow' as const }]);
    const times: number[] = [];
    const runs: QueryRun[] = [];
    const gc = gcPauses();
    for (const query of queries) {
      const started = performance.now();
      const answer = await compatibleCoils(ctx, query);
      const ms = performance.now() - started;
      times.push(ms);
      // GC entries arrive in a later task: let them in (outside the timed part) before reading them.
      await new Promise((resolve) => setImmediate(resolve));
      runs.push({ query, ms, total: answer.total, gcMs: gc.take() });
    }
    gc.stop();
    printBreakdown(runs);

    // Baseline: the same engine over every coil in the catalog, no narrowing (a few outdoor units: it is slow).
    const coils = (await kindIndex(ds, 'indoor-coils')).rows as unknown as IndoorCoil[];
    const context = await loadRuleContext(ctx);
    const baseline: number[] = [];
    for (const id of outdoorIds.slice(0, 6)) {
      const started = performance.now();
      const base = await resolvePairing(ctx, { scope: 'component-replacement', outdoor: { id } });
      let passing = 0;
      for (const coil of coils) {
        if (runChecks({ ...base, indoorCoil: { spec: toSpec('indoor-coils', coil), kept: false, id: coil.id } }, context).verdict !== 'incompatible') passing++;
      }
      baseline.push(performance.now() - started);
      if (passing < 0) throw new Error("unreachable");
    }
    await ds.destroy();
    const p95 = percentile(times, 95);
    const baseP95 = percentile(baseline, 95);
    const note = `${times.length} requests through compatibleCoils over ${COILS.toLocaleString('en-US')} coils, indexes built once`;
    return [
      { id: 'coils.compatible-50k.p95-ms', value: round(p95, 2), unit: 'ms', baseline: round(baseP95, 2), ratio: round(baseP95 / p95, 1), note: `${note}; target < 50` },
      { id: 'coils.compatible-50k.median-ms', value: round(percentile(times, 50), 2), unit: 'ms', note },
      { id: 'coils.compatible-50k.baseline-p95-ms', value: round(baseP95, 2), unit: 'ms', note: `the engine over every coil, no narrowing (${baseline.length} outdoor units)` },
      { id: 'coils.compatible-50k.speedup', value: round(baseP95 / p95, 1), unit: 'x', note: 'baseline p95 / narrowed p95; target >= 10' },
    ];
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
