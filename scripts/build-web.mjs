// Builds the web export into dist/ only when the app's sources changed since the last build
// (the export is deterministic for the same lock and flags, so a hash of the inputs is a safe key).
import { createHash } from 'node:crypto';
import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const outDir = path.join(root, 'dist');
const stampFile = path.join(outDir, '.build-stamp');
// The service worker is part of the build: its script and the public/ files it precaches are inputs too.
const INPUTS = [
  'app',
  'components',
  'hooks',
  'constants',
  'shared',
  'assets',
  'public',
  'app.json',
  'metro.config.js',
  'metro-shims',
  'babel.config.js',
  'package-lock.json',
  'tsconfig.json',
  'scripts/build-web.mjs',
  'scripts/service-worker.mjs',
];

function* files(base, entry) {
  const full = path.join(base, entry);
  if (!existsSync(full)) return;
  if (statSync(full).isFile()) {
    yield entry;
    return;
  }
  for (const name of readdirSync(full).sort()) yield* files(base, path.join(entry, name));
}

/** A hash of the named files and folders under `base` (paths and contents): the key a rebuild is skipped on. */
export function inputsHash(base, inputs) {
  const hash = createHash('sha256');
  for (const input of inputs) {
    for (const file of files(base, input)) {
      hash.update(file);
      hash.update(readFileSync(path.join(base, file)));
    }
  }
  return hash.digest('hex');
}

export function sourceHash() {
  return inputsHash(root, INPUTS);
}

/** `expo export --platform web` of the project in `projectDir` into its `outDir` (offline, no telemetry). */
export function expoExport(projectDir, outDir = 'dist', stdio = 'inherit') {
  const result = spawnSync(process.execPath, [path.join(root, 'node_modules/expo/bin/cli'), 'export', '--platform', 'web', '--output-dir', outDir], {
    cwd: projectDir,
    stdio,
    env: { ...process.env, EXPO_OFFLINE: '1', EXPO_NO_TELEMETRY: '1', CI: '1' },
  });
  if (result.status !== 0) throw new Error(`expo export failed with exit code ${result.status}`);
}

export function buildWeb({ force = false } = {}) {
  const hash = sourceHash();
  if (!force && existsSync(stampFile) && readFileSync(stampFile, 'utf8') === hash && existsSync(path.join(outDir, 'index.html'))) {
    console.log('web app is up to date (dist/)');
    return;
  }
  console.log('building the web app (expo export --platform web)…');
  const started = Date.now();
  expoExport(root);
  // Manifest links and dist/sw.js (workbox-build is async; a child process keeps buildWeb synchronous).
  const sw = spawnSync(process.execPath, [path.join(root, 'scripts/service-worker.mjs'), outDir], { cwd: root, stdio: 'inherit' });
  if (sw.status !== 0) throw new Error(`service worker generation failed with exit code ${sw.status}`);
  writeFileSync(stampFile, hash);
  console.log(`web app built in ${((Date.now() - started) / 1000).toFixed(1)} s`);
}

if (process.argv[1] && fileURLToPath(import.meta.url) === path.resolve(process.argv[1])) {
  try {
    buildWeb({ force: process.argv.includes('--force') });
  } catch (err) {
    console.error(err.message);
    process.exit(1);
  }
}
