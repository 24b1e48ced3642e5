import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { createInterface } from 'node:readline';

/**
 * Starts a bench server script (bench/<file>) in a process of its own, under tsx with the server's
 * tsconfig, and waits for the one JSON line it prints when it is ready (port, tokens, fixtures).
 */
export async function startBenchServer<T>(file: string, env: Record<string, string> = {}): Promise<{ child: ChildProcess; info: T }> {
  const root = path.resolve(__dirname, '..');
  const child = spawn(process.execPath, ['--import', 'tsx', path.join(__dirname, file)], {
    cwd: root,
    env: { ...process.env, TSX_TSCONFIG_PATH: path.join(root, 'server/tsconfig.json'), ...env },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
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
