import { cpSync, existsSync, mkdirSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import path from 'node:path';

/**
 * Exports bench/skeleton (the bare stack, see its README) for the web into build/bench/skeleton/dist and
 * returns that folder. The copy links the repository's node_modules, so the skeleton runs the same package
 * versions as the app. Rebuilt only when its sources or the lock change (an export takes ~30 s).
 */
const root = path.resolve(__dirname, '..');
const work = path.join(root, 'build/bench/skeleton');
const dist = path.join(work, 'dist');
const stamp = path.join(work, '.build-stamp');

export async function buildSkeleton(): Promise<string> {
  // @ts-expect-error plain ESM script without types
  const { expoExport, inputsHash } = (await import('../scripts/build-web.mjs')) as {
    expoExport(projectDir: string, outDir?: string, stdio?: unknown): void;
    inputsHash(base: string, inputs: string[]): string;
  };
  const hash = inputsHash(root, ['bench/skeleton', 'package-lock.json']);
  if (existsSync(stamp) && readFileSync(stamp, 'utf8') === hash && existsSync(path.join(dist, 'index.html'))) return dist;
  rmSync(work, { recursive: true, force: true });
  mkdirSync(work, { recursive: true });
  cpSync(path.join(__dirname, 'skeleton'), work, { recursive: true });
  symlinkSync(path.join(root, 'node_modules'), path.join(work, 'node_modules'), 'dir');
  expoExport(work, 'dist', ['ignore', 'ignore', 'inherit']);
  writeFileSync(stamp, hash);
  return dist;
}
