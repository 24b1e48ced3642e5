import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { FULL_GLYPH_MAP, readGlyphMap, SUBSET_GLYPH_MAP, usedIconNames } from '../../scripts/icon-subset.mjs';

// The glyph map the web bundle ships instead of @expo/vector-icons' full one (metro.config.js).
const full = readGlyphMap(FULL_GLYPH_MAP);
const subset = readGlyphMap(SUBSET_GLYPH_MAP);

describe('icon glyph subset', () => {
  it('when an icon name is written in app/, components/, constants/, hooks/ or Paper, then the subset has it', () => {
    const missing = usedIconNames(full).filter((name) => !(name in subset));
    // Fix: node scripts/icon-subset.mjs
    expect(missing).toEqual([]);
  });

  it('when the subset maps a name, then it is the code point of the full map (@expo/vector-icons glyph map)', () => {
    for (const [name, codePoint] of Object.entries(subset)) expect([name, codePoint]).toEqual([name, full[name]]);
  });

  it('when checked against what the app draws, then the icons of the tabs, the sign-in form and Paper menus are in it', () => {
    // Names from constants/navigation.ts and Paper's own components (lib/module: TextInput, Menu, Checkbox).
    for (const name of ['clipboard-check-outline', 'gauge', 'briefcase-outline', 'menu-down', 'chevron-left', 'close', 'check']) {
      expect(subset).toHaveProperty([name]);
    }
  });

  it('when a source quotes a glyph name or other words, then the scanner keeps only the glyph names', () => {
    const root = mkdtempSync(path.join(os.tmpdir(), 'icons-'));
    mkdirSync(path.join(root, 'components'));
    writeFileSync(path.join(root, 'components/x.tsx'), `<Button icon="account" /> <Icon source={'bell-outline'} /> const s = "not-an-icon";`);
    expect(usedIconNames({ account: 1, 'bell-outline': 2, unused: 3 }, root)).toEqual(['account', 'bell-outline']);
  });
});
