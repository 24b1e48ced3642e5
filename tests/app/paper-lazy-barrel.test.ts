import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { BARRELS, PAPER_DIR, paperExports, ROOT, shimSource } from '../../scripts/paper-lazy-barrel.mjs';

// metro.config.js resolves 'react-native-paper' to this shim on the web; it must stay in step with Paper's index.
const PAPER_CJS = path.join(ROOT, 'node_modules/react-native-paper/lib/commonjs');

/** Names a CommonJS file of Paper's own build exports (its Babel output: defineProperty getters and `exports.X =`). */
function cjsNames(file: string): string[] {
  const source = readFileSync(file, 'utf8');
  const names = new Set<string>();
  for (const [, name] of source.matchAll(/Object\.defineProperty\(exports, "(\w+)"/g)) names.add(name);
  for (const [, name] of source.matchAll(/^exports\.(\w+) = (?!void 0)/gm)) names.add(name);
  names.delete('__esModule');
  return [...names];
}

describe('Paper lazy barrel (metro-shims/react-native-paper-lazy.js)', () => {
  it('when the committed shims are compared with what the script writes for the installed Paper and react-native-web, then they are the same', () => {
    // Fix: node scripts/paper-lazy-barrel.mjs
    for (const barrel of BARRELS) expect(readFileSync(path.join(ROOT, barrel.shim), 'utf8')).toBe(shimSource(ROOT, barrel));
  });

  it("when react-native-web's CommonJS build of its index is read, then the web shim exports the same names", () => {
    // Source: react-native-web's dist/cjs/index.js (its own Babel output of the same index).
    const expected = cjsNames(path.join(ROOT, 'node_modules/react-native-web/dist/cjs/index.js')).sort();
    expect(paperExports(ROOT, BARRELS[1].dir).map(([name]) => name).sort()).toEqual(expected);
  });

  it("when compared with Paper's own CommonJS build of its index, then the shim exports the same names, each once", () => {
    // Source: react-native-paper's lib/commonjs/index.js (its `export *` of styles/themes expands to that file's names).
    const expected = [...cjsNames(path.join(PAPER_CJS, 'index.js')), ...cjsNames(path.join(PAPER_CJS, 'styles/themes/index.js'))].sort();
    const names = paperExports().map(([name]) => name);
    expect(new Set(names).size).toBe(names.length);
    expect([...names].sort()).toEqual([...new Set(expected)].sort());
  });

  it('when a name is loaded, then its module file exists and declares that export', () => {
    for (const [name, file, prop] of paperExports()) {
      const full = path.join(ROOT, PAPER_DIR, `${file}.js`);
      expect(existsSync(full), `${name}: ${file}`).toBe(true);
      if (prop && prop !== 'default') expect(readFileSync(full, 'utf8'), `${name} in ${file}`).toMatch(new RegExp(`\\b${prop}\\b`));
      if (prop === 'default') expect(readFileSync(full, 'utf8'), `${name}: default of ${file}`).toMatch(/export default|as default/);
    }
  });

  it('when the sign-in form imports Button and Text, then the shim does not load DataTable, Menu or BottomNavigation with them', () => {
    // The point of the shim: each getter requires its own module only.
    const lines = shimSource().split('\n');
    const button = lines.find((l) => l.startsWith("lazy('Button'"));
    expect(button).toBe("lazy('Button', () => require('react-native-paper/lib/module/components/Button/Button').default);");
    expect(lines.filter((l) => l.includes('DataTable'))).toEqual([
      "lazy('DataTable', () => require('react-native-paper/lib/module/components/DataTable/DataTable').default);",
    ]);
  });
});
