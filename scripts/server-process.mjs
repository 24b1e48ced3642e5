// Starts a TypeScript entry of the server in this Node process's image (tsx with the server's
// tsconfig, so TypeORM's legacy decorators compile), or a bundle of one, forwarding signals and the exit code.
import { spawn } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

export function runTs(entry, args = [], extraEnv = {}) {
  return forward(['--import', 'tsx', path.join(root, entry), ...args], { TSX_TSCONFIG_PATH: path.join(root, 'server/tsconfig.json'), ...extraEnv });
}

/** Runs a bundled server (scripts/bundle-server.mjs) in plain Node, forwarding signals and the exit code. */
export function runBundle(file, args = [], extraEnv = {}) {
  return forward([file, ...args], extraEnv);
}

function forward(nodeArgs, extraEnv) {
  const child = spawn(process.execPath, nodeArgs, { cwd: root, stdio: 'inherit', env: { ...process.env, ...extraEnv } });
  for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => child.kill(signal));
  child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
  return child;
}
