// The progressive-web-app half of the web build, run over dist/ after `expo export`: links the
// manifest and icons from index.html, then generates dist/sw.js with workbox-build, which precaches
// the export (JS, CSS, fonts including the icon font under assets/node_modules, icons) so the app
// opens with no signal after one visit. The API is never cached: answers must be live or computed
// on the phone, never stale copies.
import { existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { generateSW } from 'workbox-build';

/** Tags the exported index.html needs for installing; the theme colour is constants/theme.ts's primary. */
const HEAD_TAGS = [
  '<link rel="manifest" href="/manifest.webmanifest" />',
  '<meta name="theme-color" content="#23406E" />',
  '<link rel="icon" type="image/png" sizes="48x48" href="/icons/favicon-48.png" />',
  '<link rel="apple-touch-icon" href="/icons/apple-touch-icon.png" />',
];

/** Where the export puts our own assets/fonts (the text faces; the icon font sits under assets/node_modules). */
const TEXT_FONTS_DIR = 'assets/assets/fonts';

/**
 * The faces the sign-in screen (the first screen of a signed-out cold start, what the bench measures) sets text in: Regular (body, fields) and SemiBold
 * (the title, the button). Only these are preloaded. A preloaded face is decoded on the main thread as soon as
 * index.html's @font-face rule meets it, before the bundle runs: preloading all four cost ~200 ms of a 4×-throttled
 * first load, the two unused ones included. The others load when a screen first uses them (the service worker
 * precaches every face). tests/e2e/web-boot.test.ts fails if the sign-in screen starts using a face not listed here.
 */
export const FIRST_SCREEN_FACES = ['Inter_400Regular', 'Inter_600SemiBold'];

/**
 * Preload tags for the first screen's text faces, so they download while the bundle runs: index.html declares
 * every face with font-display: block (fontFaceStyle) and the app does not wait for them
 * (hooks/use-text-fonts.web.ts). `crossorigin` because the browser fetches fonts in CORS mode; a preload without
 * it is fetched twice.
 */
export function fontPreloadTags(outDir, faces = FIRST_SCREEN_FACES) {
  const dir = path.join(outDir, TEXT_FONTS_DIR);
  if (!existsSync(dir)) return [];
  return readdirSync(dir)
    .filter((name) => name.endsWith('.ttf') && faces.some((stem) => name.startsWith(`${stem}.`)))
    .sort()
    .map((name) => `<link rel="preload" href="/${TEXT_FONTS_DIR}/${name}" as="font" type="font/ttf" crossorigin />`);
}

/** constants/theme.ts's FONT_FILES as [family, file stem] pairs ('Inter-Regular' → 'Inter_400Regular'). */
const THEME_FILE = path.join(path.dirname(fileURLToPath(import.meta.url)), '../constants/theme.ts');
export function textFontFamilies(themeSource = readFileSync(THEME_FILE, 'utf8')) {
  return [...themeSource.matchAll(/'([\w-]+)':\s*require\('[^']*\/fonts\/([\w-]+)\.ttf'\)/g)].map((m) => [m[1], m[2]]);
}

/**
 * The text faces as CSS `@font-face` rules (font-display: block), so the web app does not declare them
 * from JavaScript during its first render (hooks/use-text-fonts.web.ts; FontFace + expo-asset cost
 * ~200 ms of a throttled boot). Families are FONT_FILES' names, files the export's hashed copies.
 */
export function fontFaceStyle(outDir, families = textFontFamilies()) {
  const dir = path.join(outDir, TEXT_FONTS_DIR);
  if (!existsSync(dir)) return [];
  const files = readdirSync(dir).filter((name) => name.endsWith('.ttf'));
  const rules = families.flatMap(([family, stem]) => {
    const file = files.find((name) => name.startsWith(`${stem}.`));
    return file ? [`@font-face{font-family:"${family}";src:url(/${TEXT_FONTS_DIR}/${file}) format("truetype");font-display:block}`] : [];
  });
  return rules.length ? [`<style id="text-faces">${rules.join('')}</style>`] : [];
}

/** Adds the manifest/icon/font tags to index.html once (a rebuild over the same file does not repeat them). */
export function linkManifest(outDir, families) {
  const file = path.join(outDir, 'index.html');
  let html = readFileSync(file, 'utf8');
  // Expo writes its own theme-color from app.json; keep one.
  html = html.replace(/<meta name="theme-color"[^>]*>\s*/g, '');
  const missing = [...HEAD_TAGS, ...fontPreloadTags(outDir), ...fontFaceStyle(outDir, families)].filter((tag) => !html.includes(tag));
  if (missing.length) html = html.replace('</head>', `${missing.join('')}</head>`);
  writeFileSync(file, html);
}

/** Generates dist/sw.js; returns how many files and bytes it precaches. */
export async function writeServiceWorker(outDir) {
  const { count, size, warnings } = await generateSW({
    globDirectory: outDir,
    // The icon font lives under assets/node_modules/…: `**` matches it (glob skips no node_modules).
    globPatterns: ['**/*.{js,css,html,ttf,otf,woff,woff2,png,svg,ico,webmanifest}'],
    globIgnores: ['sw.js', 'workbox-*.js', '**/*.map'],
    swDest: path.join(outDir, 'sw.js'),
    mode: 'production',
    sourcemap: false,
    // Expo names bundles entry-<md5>.js and assets name.<md5>.ext: those hashes already bust caches.
    dontCacheBustURLsMatching: /(-[0-9a-f]{32}\.js|\.[0-9a-f]{32}\.[a-z0-9]+)$/,
    // The main bundle is larger than workbox's 2 MB default.
    maximumFileSizeToCacheInBytes: 12 * 1024 * 1024,
    navigateFallback: '/index.html',
    navigateFallbackDenylist: [/^\/api\//, /^\/sw\.js$/],
    cleanupOutdatedCaches: true,
    // A new build takes over at the next navigation; pages already open keep the code they loaded.
    skipWaiting: true,
    clientsClaim: false,
    runtimeCaching: [],
  });
  for (const w of warnings) console.warn(`service worker: ${w}`);
  return { count, size };
}

/** Both steps, in order (index.html changes before its revision is computed). */
export async function finishWebExport(outDir) {
  linkManifest(outDir);
  const { count, size } = await writeServiceWorker(outDir);
  console.log(`service worker: ${count} files precached (${(size / 1024 / 1024).toFixed(1)} MB)`);
}

// Run as `node scripts/service-worker.mjs <dist>` by build-web.mjs, whose buildWeb() stays synchronous.
if (process.argv[1] && fileURLToPath(import.meta.url) === path.resolve(process.argv[1])) {
  finishWebExport(path.resolve(process.argv[2] ?? 'dist')).catch((err) => {
    console.error(err);
    process.exit(1);
  });
}
