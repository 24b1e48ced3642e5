import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { linkManifest } from '../../scripts/service-worker.mjs';

/** An export folder shaped like expo's: index.html, our text faces and the icon font elsewhere. */
function fakeExport(): string {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'web-export-'));
  mkdirSync(path.join(dir, 'assets/assets/fonts'), { recursive: true });
  mkdirSync(path.join(dir, 'assets/node_modules/icons'), { recursive: true });
  writeFileSync(path.join(dir, 'assets/assets/fonts/Inter_400Regular.0123.ttf'), '');
  writeFileSync(path.join(dir, 'assets/node_modules/icons/MaterialCommunityIcons.4567.ttf'), '');
  writeFileSync(path.join(dir, 'index.html'), '<html><head><title>T</title></head><body></body></html>');
  return dir;
}

describe('index.html after the web export', () => {
  it('when the export holds text faces, then index.html preloads each one in CORS mode, and not the icon font', () => {
    const dir = fakeExport();
    linkManifest(dir);
    const html = readFileSync(path.join(dir, 'index.html'), 'utf8');
    // crossorigin: fonts are fetched in CORS mode, so a preload without it is not reused (HTML spec, "preload" + fonts).
    expect(html).toContain('<link rel="preload" href="/assets/assets/fonts/Inter_400Regular.0123.ttf" as="font" type="font/ttf" crossorigin />');
    expect(html).not.toContain('MaterialCommunityIcons');
  });

  it('when the tags are added twice over the same file, then each appears once', () => {
    const dir = fakeExport();
    linkManifest(dir);
    linkManifest(dir);
    const html = readFileSync(path.join(dir, 'index.html'), 'utf8');
    expect(html.match(/rel="preload"/g)).toHaveLength(1);
    expect(html.match(/rel="manifest"/g)).toHaveLength(1);
  });
});
