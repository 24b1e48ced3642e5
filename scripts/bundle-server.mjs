// Bundles a TypeScript entry of the server (server/index.ts, a bench server) into one CommonJS file
// under build/ with esbuild, packages left as require()s. Under tsx every cross-module call goes
// through a getter; a bundle calls directly, which makes a check about twice as fast (DEVELOPERS.md
// footgun 12). esbuild comes with tsx, a runtime dependency, so a production install has it.
import { build } from 'esbuild';
import path from 'node:path';
import { root } from './server-process.mjs';

/** Bundles `entry` (relative to the repository) to `outfile` (relative too); returns its absolute path. */
export async function bundleServer(entry, outfile) {
  const out = path.join(root, outfile);
  await build({
    entryPoints: [path.join(root, entry)],
    outfile: out,
    bundle: true,
    platform: 'node',
    format: 'cjs',
    target: 'node20',
    // node_modules stay external: native better-sqlite3, and packages that read their own files.
    packages: 'external',
    // The server's tsconfig: legacy decorators for TypeORM, as under tsx (footgun 1).
    tsconfig: path.join(root, 'server/tsconfig.json'),
    // TypeORM records migrations by class name: keep names exactly as tsx runs them.
    keepNames: true,
    sourcemap: 'linked',
    logLevel: 'warning',
  });
  return out;
}
