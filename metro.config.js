// Metro for the web export: Expo's defaults plus seven aliases that keep the main bundle small.
// Each one is a footgun entry in DEVELOPERS.md ("Bundle aliases").
const fs = require('node:fs');
const path = require('node:path');
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);
const here = (file) => path.join(__dirname, file);

/** zod's barrel of every locale → English only (zod's classic, mini and core entries all re-export it). */
const ZOD_LOCALES = `${path.sep}node_modules${path.sep}zod${path.sep}v4${path.sep}`;
/** Paper's icon font glyph map (~7,000 names) → the names the app and Paper use (scripts/icon-subset.mjs). */
const MCI_GLYPHS = 'glyphmaps/MaterialCommunityIcons.json';
/**
 * npm keeps three copies of TanStack's query-core (react-query's 5.108, the persister's 5.104.x) and two of
 * the persist-client core: one of each is enough, and one QueryClient class is what the providers expect.
 */
/** Paper's barrel evaluates every component it re-exports; the shim loads each on first use (scripts/paper-lazy-barrel.mjs). */
const PAPER_BARREL = 'react-native-paper';
const PAPER_LAZY = here('metro-shims/react-native-paper-lazy.js');
/**
 * react-native-web's index (what `react-native` is on the web) has the same problem: the same kind of shim.
 * babel-preset-expo's web plugin (babel-plugin-react-native-web) rewrites a bare `require('react-native')`,
 * in node_modules too (expo-router's build is CommonJS), to `react-native-web/dist/index` before Metro
 * resolves it: without that name here expo-router kept the whole index (Animated, FlatList…) on the boot path.
 */
const RNW_BARRELS = new Set(['react-native', 'react-native-web', 'react-native-web/dist/index', 'react-native-web/dist/index.js']);
const RNW_LAZY = here('metro-shims/react-native-web-lazy.js');
/** react-native-web's Animated loads its FlatList/SectionList/ScrollView/Image wrappers up front: the same kind of shim. */
const RNW_ANIMATED = '../../vendor/react-native/Animated/Animated';
const RNW_ANIMATED_FROM = `react-native-web${path.sep}dist${path.sep}exports${path.sep}Animated${path.sep}`;
const RNW_ANIMATED_LAZY = here('metro-shims/react-native-web-animated-lazy.js');
/**
 * expo-router's ExpoRoot sets react-native-screens' feature flags (native-only experiments) through the package's
 * index, which evaluates Screen, ScreenStack, SearchBar… and Animated on the web at boot: on the web it gets the
 * flags module alone (the same singleton the index re-exports).
 */
const SCREENS_FLAGS_FROM = `expo-router${path.sep}build${path.sep}screensFeatureFlags.js`;
const SCREENS_FLAGS = here('node_modules/react-native-screens/lib/module/flags.js');
const SINGLE_COPY = {
  '@tanstack/query-core': here('node_modules/@tanstack/react-query/package.json'),
  '@tanstack/query-persist-client-core': here('node_modules/@tanstack/react-query-persist-client/package.json'),
};

config.resolver.resolveRequest = (context, moduleName, platform) => {
  if (moduleName === '../locales/index.js' && context.originModulePath.includes(ZOD_LOCALES)) {
    return { type: 'sourceFile', filePath: here('metro-shims/zod-locales-en.js') };
  }
  if (moduleName.endsWith(MCI_GLYPHS)) {
    return { type: 'sourceFile', filePath: here('assets/fonts/material-community-glyphs.json') };
  }
  if (moduleName === PAPER_BARREL) return { type: 'sourceFile', filePath: PAPER_LAZY };
  if (platform === 'web' && RNW_BARRELS.has(moduleName)) return { type: 'sourceFile', filePath: RNW_LAZY };
  if (platform === 'web' && moduleName === 'react-native-screens' && context.originModulePath.endsWith(SCREENS_FLAGS_FROM)) {
    return { type: 'sourceFile', filePath: SCREENS_FLAGS };
  }
  if (moduleName === RNW_ANIMATED && context.originModulePath.includes(RNW_ANIMATED_FROM)) {
    return { type: 'sourceFile', filePath: RNW_ANIMATED_LAZY };
  }
  const singleFrom = SINGLE_COPY[moduleName];
  if (singleFrom) return context.resolveRequest({ ...context, originModulePath: singleFrom }, moduleName, platform);
  return context.resolveRequest(context, moduleName, platform);
};

module.exports = config;

// Defer each import to its first use: boot evaluates only what the sign-in screen touches. Not for the
// check screen and the engine (components/check/, shared/): deferred there, the rules and refrigerant tables
// would be evaluated on the first tap on Check (budget 300 ms) instead of when the screen opens.
const EAGER_DIRS = ['components/check', 'shared'];
function* sourceFiles(dir) {
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) yield* sourceFiles(full);
    else if (/\.(tsx?|jsx?)$/.test(entry.name)) yield full;
  }
}
const blockList = Object.fromEntries(EAGER_DIRS.flatMap((dir) => [...sourceFiles(here(dir))]).map((file) => [file, true]));
const getTransformOptions = config.transformer.getTransformOptions;
config.transformer.getTransformOptions = async (...args) => {
  const options = await getTransformOptions(...args);
  return { ...options, transform: { ...options.transform, inlineRequires: { blockList } } };
};
