import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import type { Measure } from './measure';
import { round } from './measure';

/** Size of the exported main web bundle, gzip (level 9, as a CDN would serve it). */
const SKELETON_GZIP_KB = 546; // STACK.md: bare expo-router + react-native-web + Paper + react-query + zod skeleton.

export async function run(): Promise<Measure[]> {
  // @ts-expect-error plain ESM script without types
  const { buildWeb } = await import('../scripts/build-web.mjs');
  buildWeb();
  const dir = path.resolve(__dirname, '../dist/_expo/static/js/web');
  const entry = readdirSync(dir).find((f) => f.startsWith('entry-') && f.endsWith('.js'));
  if (!entry) throw new Error('no entry bundle in dist/_expo/static/js/web');
  const raw = readFileSync(path.join(dir, entry));
  const gzipKb = gzipSync(raw, { level: 9 }).length / 1024;
  return [
    {
      id: 'web.bundle-main-gzip-kb',
      value: round(gzipKb, 1),
      unit: 'KB',
      // The skeleton is not rebuilt in this run, so no ratio field (ratios are same-run only); the note compares.
      note: `raw ${round(raw.length / 1024, 0)} KB; ${round(gzipKb / SKELETON_GZIP_KB, 2)}× the ${SKELETON_GZIP_KB} KB bare skeleton of STACK.md (target ≤ 1.3×)`,
    },
  ];
}
