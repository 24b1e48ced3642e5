import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { createInterface } from 'node:readline';
import { pathToFileURL } from 'node:url';

/**
 * Starts a bench server script (bench/<file>) in a process of its own, bundled with esbuild the way
 * `npm start` runs the server (scripts/bundle-server.mjs), and waits for the one JSON line it prints
 * when it is ready (port, tokens, fixtures).
 */
export async function startBenchServer<T>(file: string): Promise<{ child: ChildProcess; info: T }> {
  const root = path.resolve(__dirname, '..');
  const { bundleServer } = (await import(pathToFileURL(path.join(root, 'scripts/bundle-server.mjs')).href)) as {
    bundleServer(entry: string, outfile: string): Promise<string>;
  };
  const bundle = await bundleServer(`bench/${file}`, `build/bench/${file.replace(/\.ts$/, '.cjs')}`);
  const child = spawn(process.execPath, [bundle], { cwd: root, env: process.env, stdio: ['ignore', 'pipe', 'inherit'] });
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
