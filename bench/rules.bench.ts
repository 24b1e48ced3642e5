import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { build } from 'esbuild';
import type { Measure } from './measure';

/**
 * The rules engine's throughput, measured on the engine bundled into one module (as Metro ships it to
 * the phone) rather than through the dev-time TypeScript loader, whose per-import getters cost ~40%.
 */
export async function run(): Promise<Measure[]> {
  const bundled = await build({
    entryPoints: [path.join(__dirname, 'rules-workload.ts')],
    bundle: true,
    format: 'esm',
    platform: 'node',
    write: false,
    logLevel: 'silent',
  });
  const dir = mkdtempSync(path.join(os.tmpdir(), 'tandem-rules-bench-'));
  try {
    const file = path.join(dir, 'rules-workload.mjs');
    writeFileSync(file, bundled.outputFiles[0].text);
    const workload = (await import(pathToFileURL(file).href)) as { measureRules(): Measure[] };
    return workload.measureRules();
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
