import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { createInterface } from 'node:readline';
import { pathToFileURL } from 'node:url';

const root = path.resolve(__dirname, '..');
const bundles = new Map<string, Promise<string>>();

/**
 * bench/<file> bundled with esbuild into build/bench, the way `npm start` runs the server (scripts/bundle-server.mjs),
 * once per bench process: under tsx every cross-module call goes through a getter, a cost the shipped server does not have.
 */
export function bundleBenchEntry(file: string): Promise<string> {
  let bundle = bundles.get(file);
  if (!bundle) {
    bundle = import(pathToFileURL(path.join(root, 'scripts/bundle-server.mjs')).href).then((m: { bundleServer(entry: string, outfile: string): Promise<string> }) =>
      m.bundleServer(`bench/${file}`, `build/bench/${file.replace(/\.ts$/, '.cjs')}`),
    );
    bundles.set(file, bundle);
  }
  return bundle;
}

/** Runs bench/<file> (bundled) to its end in a fresh process and returns the JSON of its last line of output. */
export async function runBenchEntry<T>(file: string, args: string[]): Promise<T> {
  const bundle = await bundleBenchEntry(file);
  return new Promise<T>((resolve, reject) => {
    const child = spawn(process.execPath, [bundle, ...args], { cwd: root, stdio: ['ignore', 'pipe', 'inherit'] });
    let out = '';
    child.stdout!.on('data', (chunk) => (out += chunk));
    child.on('exit', (code) => (code === 0 ? resolve(JSON.parse(out.trim().split('\n').pop()!) as T) : reject(new Error(`${file} exited with ${code}`))));
  });
}

/**
 * Starts a bench server script (bench/<file>) in a process of its own, bundled with esbuild the way
 * `npm start` runs the server (scripts/bundle-server.mjs), and waits for the one JSON line it prints
 * when it is ready (port, tokens, fixtures).
 */
export async function startBenchServer<T>(file: string, env: Record<string, string> = {}): Promise<{ child: ChildProcess; info: T }> {
  const bundle = await bundleBenchEntry(file);
  const child = spawn(process.execPath, [bundle], { cwd: root, env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'inherit'] });
  try {
    const line = await new Promise<string>((resolve, reject) => {
      createInterface({ input: child.stdout! }).once('line', resolve);
      child.once('exit', (code) => reject(new Error(`bench server exited with ${code}`)));
    });
    return { child, info: JSON.parse(line) as T };
  } catch (err) {
    child.kill('SIGTERM');
    throw err;
  }
}
