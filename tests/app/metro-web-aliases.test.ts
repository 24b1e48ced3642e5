import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

/**
 * metro.config.js's web aliases that keep modules off the boot path (DEVELOPERS.md, "Bundle aliases"). Each is
 * keyed on a module name or an importer path inside a dependency: when a dependency bump renames one, the alias
 * silently stops applying and the boot gets slower with no error, so these tests pin the names.
 */
const ROOT = path.resolve(__dirname, '../..');
const require = createRequire(path.join(ROOT, 'package.json'));
const NM = path.join(ROOT, 'node_modules');

interface Resolution {
  type: string;
  filePath: string;
}
type Resolve = (context: object, moduleName: string, platform: string | null) => Resolution;
const config = require('./metro.config.js') as { resolver: { resolveRequest: Resolve } };

/** Runs the app's resolver for `moduleName` imported from `origin`; names that fall through come back as `default:`. */
function resolve(moduleName: string, origin: string, platform = 'web'): string {
  const context = {
    originModulePath: path.join(NM, origin),
    resolveRequest: (_ctx: object, name: string) => ({ type: 'sourceFile', filePath: `default:${name}` }),
  };
  return config.resolver.resolveRequest(context, moduleName, platform).filePath;
}

describe('web bundle aliases (metro.config.js)', () => {
  it("when expo-router's CommonJS asks for react-native on the web under the name babel rewrites it to, then it gets the lazy index shim", () => {
    // babel-plugin-react-native-web turns a bare require('react-native') into this name before Metro resolves it.
    const plugin = readFileSync(path.join(NM, 'babel-plugin-react-native-web/src/index.js'), 'utf8');
    expect(plugin).toContain('react-native-web/dist/${format}index');
    for (const name of ['react-native', 'react-native-web', 'react-native-web/dist/index']) {
      expect(resolve(name, 'expo-router/build/ExpoRoot.js')).toBe(path.join(ROOT, 'metro-shims/react-native-web-lazy.js'));
    }
  });

  it("when react-native-web's Animated export loads its implementation, then it gets the shim whose list and image wrappers load on first use, with the same six components", () => {
    expect(resolve('../../vendor/react-native/Animated/Animated', 'react-native-web/dist/exports/Animated/index.js')).toBe(
      path.join(ROOT, 'metro-shims/react-native-web-animated-lazy.js'),
    );
    // The original's component imports (react-native-web's vendor/react-native/Animated/Animated.js) vs the shim's.
    const original = readFileSync(path.join(NM, 'react-native-web/dist/vendor/react-native/Animated/Animated.js'), 'utf8');
    const originalNames = [...original.matchAll(/^import (\w+) from '\.\/components\/Animated\1';$/gm)].map((m) => m[1]).sort();
    const shim = readFileSync(path.join(ROOT, 'metro-shims/react-native-web-animated-lazy.js'), 'utf8');
    const shimNames = [...shim.matchAll(/^ {2}(\w+): \(\) => require\('react-native-web\/dist\/vendor\/react-native\/Animated\/components\/Animated\1'\)/gm)]
      .map((m) => m[1])
      .sort();
    expect(originalNames).toEqual(['FlatList', 'Image', 'ScrollView', 'SectionList', 'Text', 'View']);
    expect(shimNames).toEqual(originalNames);
  });

  it("when expo-router sets react-native-screens' feature flags, then on the web it reads the flags module alone, and on native the whole package", () => {
    const from = 'expo-router/build/screensFeatureFlags.js';
    expect(readFileSync(path.join(NM, from), 'utf8')).toContain('require("react-native-screens")');
    expect(resolve('react-native-screens', from)).toBe(path.join(NM, 'react-native-screens/lib/module/flags.js'));
    expect(readFileSync(path.join(NM, 'react-native-screens/lib/module/flags.js'), 'utf8')).toContain('featureFlags');
    expect(resolve('react-native-screens', from, 'ios')).toBe('default:react-native-screens');
    expect(resolve('react-native-screens', 'expo-router/build/layouts/Stack.js')).toBe('default:react-native-screens');
  });
});
