import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { FIRST_SCREEN_FACES, linkManifest, textFontFamilies } from '../../scripts/service-worker.mjs';

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
  it('when the export holds text faces, then index.html preloads the first screen\'s faces in CORS mode, not the others, and not the icon font', () => {
    const dir = fakeExport();
    writeFileSync(path.join(dir, 'assets/assets/fonts/Inter_700Bold.89ab.ttf'), '');
    linkManifest(dir);
    const html = readFileSync(path.join(dir, 'index.html'), 'utf8');
    // crossorigin: fonts are fetched in CORS mode, so a preload without it is not reused (HTML spec, "preload" + fonts).
    expect(FIRST_SCREEN_FACES).toContain('Inter_400Regular');
    expect(html).toContain('<link rel="preload" href="/assets/assets/fonts/Inter_400Regular.0123.ttf" as="font" type="font/ttf" crossorigin />');
    // Bold is declared (@font-face) but not preloaded: a preloaded face is decoded before the bundle runs.
    expect(html).not.toContain('rel="preload" href="/assets/assets/fonts/Inter_700Bold');
    expect(html).toContain('Inter_700Bold.89ab.ttf');
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

  it('when the export holds a text face named in FONT_FILES, then index.html declares it once as @font-face with font-display block, under its FONT_FILES family', () => {
    const dir = fakeExport();
    const families: [string, string][] = [['Inter-Regular', 'Inter_400Regular'], ['Inter-Bold', 'Inter_700Bold']];
    linkManifest(dir, families);
    linkManifest(dir, families);
    const html = readFileSync(path.join(dir, 'index.html'), 'utf8');
    // font-display: block keeps text invisible rather than in a fallback face (CSS Fonts Level 4, font-display).
    expect(html.match(/@font-face/g)).toHaveLength(1);
    expect(html).toContain('@font-face{font-family:"Inter-Regular";src:url(/assets/assets/fonts/Inter_400Regular.0123.ttf) format("truetype");font-display:block}');
    // No file for Inter-Bold in this export: no rule pointing nowhere.
    expect(html).not.toContain('Inter-Bold');
  });

  it('when constants/theme.ts is read, then every FONT_FILES family is paired with its file stem', () => {
    const source = "export const FONT_FILES = {\n  'Inter-Regular': require('../assets/fonts/Inter_400Regular.ttf'),\n  'Inter-Bold': require('../assets/fonts/Inter_700Bold.ttf'),\n};";
    expect(textFontFamilies(source)).toEqual([
      ['Inter-Regular', 'Inter_400Regular'],
      ['Inter-Bold', 'Inter_700Bold'],
    ]);
    // The real file: the four faces the app sets text in (constants/theme.ts).
    expect(textFontFamilies().map(([family]) => family)).toEqual(['Inter-Regular', 'Inter-Medium', 'Inter-SemiBold', 'Inter-Bold']);
  });
});
