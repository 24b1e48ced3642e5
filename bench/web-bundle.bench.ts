import { readFileSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import type { Measure } from './measure';
import { round } from './measure';

/**
 * Size of the JavaScript the exported index.html loads before the first screen, gzip (level 9, as a CDN
 * would serve it). With async routes (app.json) the export is split: Expo's runtime chunk, a `__common`
 * chunk of modules two or more screens share, the entry, and one chunk per screen fetched later. Every
 * script tag of index.html counts (the entry alone would hide the common chunk); screen chunks do not.
 */
const SKELETON_GZIP_KB = 546; // STACK.md: bare expo-router + react-native-web + Paper + react-query + zod skeleton.

export async function run(): Promise<Measure[]> {
  // @ts-expect-error plain ESM script without types
  const { buildWeb } = await import('../scripts/build-web.mjs');
  buildWeb();
  const dist = path.resolve(__dirname, '../dist');
  const html = readFileSync(path.join(dist, 'index.html'), 'utf8');
  const scripts = [...html.matchAll(/<script[^>]*\bsrc="([^"]+)"/g)].map(([, src]) => src);
  if (!scripts.some((src) => /\/entry-[0-9a-f]+\.js$/.test(src))) throw new Error('no entry bundle in dist/index.html');
  let rawBytes = 0;
  let gzipBytes = 0;
  for (const src of scripts) {
    const raw = readFileSync(path.join(dist, src));
    rawBytes += raw.length;
    gzipBytes += gzipSync(raw, { level: 9 }).length;
  }
  const gzipKb = gzipBytes / 1024;
  return [
    {
      id: 'web.bundle-main-gzip-kb',
      value: round(gzipKb, 1),
      unit: 'KB',
      // The skeleton is not rebuilt in this run, so no ratio field (ratios are same-run only); the note compares.
      note: `${scripts.length} scripts loaded by index.html at boot, raw ${round(rawBytes / 1024, 0)} KB; ${round(gzipKb / SKELETON_GZIP_KB, 2)}× the ${SKELETON_GZIP_KB} KB bare skeleton of STACK.md (target ≤ 1.3×)`,
    },
  ];
}
