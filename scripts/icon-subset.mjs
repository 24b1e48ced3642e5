// The app draws MaterialCommunityIcons through Paper; the full glyph map (~7,000 names, 217 KB of
// JSON) would ship whole. metro.config.js swaps it for assets/fonts/material-community-glyphs.json,
// which holds only the names that appear as string literals in our sources and in Paper's own code
// (its chevrons, close, check, menu-down…). Run `node scripts/icon-subset.mjs` after adding an icon;
// tests/app/icon-subset.test.ts fails while a used name is missing.
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
export const FULL_GLYPH_MAP = 'node_modules/@expo/vector-icons/build/vendor/react-native-vector-icons/glyphmaps/MaterialCommunityIcons.json';
export const SUBSET_GLYPH_MAP = 'assets/fonts/material-community-glyphs.json';
/** Where icon names are written: our screens and helpers, and the Paper components that draw icons by name. */
export const ICON_SOURCES = ['app', 'components', 'constants', 'hooks', 'node_modules/react-native-paper/lib/module'];

function* sourceFiles(dir) {
  if (!existsSync(dir)) return;
  for (const name of readdirSync(dir).sort()) {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) yield* sourceFiles(full);
    else if (/\.(tsx?|jsx?|mjs)$/.test(name) && !name.endsWith('.d.ts')) yield full;
  }
}

/** Every quoted string in the sources that names a glyph of `glyphMap` (a superset of the icons drawn). */
export function usedIconNames(glyphMap, root = ROOT) {
  const used = new Set();
  for (const dir of ICON_SOURCES) {
    for (const file of sourceFiles(path.join(root, dir))) {
      for (const [, name] of readFileSync(file, 'utf8').matchAll(/['"`]([a-z0-9]+(?:-[a-z0-9]+)*)['"`]/g)) {
        if (Object.hasOwn(glyphMap, name)) used.add(name);
      }
    }
  }
  return [...used].sort();
}

export function readGlyphMap(file, root = ROOT) {
  return JSON.parse(readFileSync(path.join(root, file), 'utf8'));
}

/** Writes the subset map; returns how many glyphs it keeps. */
export function writeIconSubset(root = ROOT) {
  const full = readGlyphMap(FULL_GLYPH_MAP, root);
  const names = usedIconNames(full, root);
  const subset = Object.fromEntries(names.map((name) => [name, full[name]]));
  writeFileSync(path.join(root, SUBSET_GLYPH_MAP), `${JSON.stringify(subset, null, 0)}\n`);
  return names.length;
}

if (process.argv[1] && fileURLToPath(import.meta.url) === path.resolve(process.argv[1])) {
  console.log(`${SUBSET_GLYPH_MAP}: ${writeIconSubset()} glyphs`);
}
