import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { cpSync, existsSync, mkdirSync, readFileSync, readdirSync, rmSync, statSync, symlinkSync, writeFileSync } from 'node:fs';
import path from 'node:path';

/**
 * Exports bench/skeleton (the bare stack, see its README) for the web into build/bench/skeleton/dist and
 * returns that folder. The copy links the repository's node_modules, so the skeleton runs the same package
 * versions as the app. Rebuilt only when its sources or the lock change (an export takes ~30 s).
 */
const root = path.resolve(__dirname, '..');
const source = path.join(__dirname, 'skeleton');
const work = path.join(root, 'build/bench/skeleton');
const dist = path.join(work, 'dist');
const stamp = path.join(work, '.build-stamp');

function sourceFiles(dir: string): string[] {
  return readdirSync(dir)
    .sort()
    .flatMap((name) => {
      const full = path.join(dir, name);
      return statSync(full).isDirectory() ? sourceFiles(full) : [full];
    });
}

function inputsHash(): string {
  const hash = createHash('sha256');
  for (const file of [...sourceFiles(source), path.join(root, 'package-lock.json')]) {
    hash.update(path.relative(root, file));
    hash.update(readFileSync(file));
  }
  return hash.digest('hex');
}

export function buildSkeleton(): string {
  const hash = inputsHash();
  if (existsSync(stamp) && readFileSync(stamp, 'utf8') === hash && existsSync(path.join(dist, 'index.html'))) return dist;
  rmSync(work, { recursive: true, force: true });
  mkdirSync(work, { recursive: true });
  cpSync(source, work, { recursive: true });
  symlinkSync(path.join(root, 'node_modules'), path.join(work, 'node_modules'), 'dir');
  const result = spawnSync(
    process.execPath,
    [path.join(root, 'node_modules/expo/bin/cli'), 'export', '--platform', 'web', '--output-dir', 'dist'],
    {
      cwd: work,
      stdio: ['ignore', 'ignore', 'inherit'],
      env: { ...process.env, EXPO_OFFLINE: '1', EXPO_NO_TELEMETRY: '1', CI: '1' },
    },
  );
  if (result.status !== 0) throw new Error(`skeleton export failed with exit code ${result.status}`);
  writeFileSync(stamp, hash);
  return dist;
}
