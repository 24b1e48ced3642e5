// A throwaway PostgreSQL cluster for tests and benches: initdb in a temp dir as an unprivileged
// user, started on a free loopback port, stopped and removed afterwards. Used by
// scripts/with-postgres.mjs, the api-pg vitest project and the PostgreSQL benches.
import { execFileSync, spawn } from 'node:child_process';
import { chownSync, existsSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';

/** Where Debian (or PG_BIN) keeps initdb/pg_ctl/postgres; null when PostgreSQL is not installed. */
export function postgresBinDir() {
  const candidates = [];
  if (process.env.PG_BIN) candidates.push(process.env.PG_BIN);
  const debian = '/usr/lib/postgresql';
  if (existsSync(debian)) {
    const versions = readdirSync(debian)
      .filter((v) => /^[0-9]+$/.test(v))
      .sort((a, b) => Number(b) - Number(a));
    candidates.push(...versions.map((v) => path.join(debian, v, 'bin')));
  }
  try {
    candidates.push(execFileSync('pg_config', ['--bindir'], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'ignore'] }).trim());
  } catch {
    // no pg_config on PATH
  }
  return candidates.find((dir) => existsSync(path.join(dir, 'initdb')) && existsSync(path.join(dir, 'pg_ctl'))) ?? null;
}

function freePort() {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.unref();
    server.on('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });
}

/**
 * PostgreSQL refuses to run as root: as root, the cluster runs as TANDEM_PG_USER (default `nobody`,
 * which every Debian has); otherwise as the current user.
 */
function clusterUser() {
  if (typeof process.getuid !== 'function' || process.getuid() !== 0) return null;
  const name = process.env.TANDEM_PG_USER || 'nobody';
  const uid = Number(execFileSync('id', ['-u', name], { encoding: 'utf8' }).trim());
  const gid = Number(execFileSync('id', ['-g', name], { encoding: 'utf8' }).trim());
  return { name, uid, gid };
}

function run(bin, args, user, { quiet = true } = {}) {
  return new Promise((resolve, reject) => {
    const child = spawn(bin, args, {
      stdio: quiet ? ['ignore', 'pipe', 'pipe'] : 'inherit',
      env: { ...process.env, LC_ALL: 'C', LANG: 'C' },
      ...(user ? { uid: user.uid, gid: user.gid } : {}),
      cwd: os.tmpdir(),
    });
    let output = '';
    child.stdout?.on('data', (d) => (output += d));
    child.stderr?.on('data', (d) => (output += d));
    child.on('error', reject);
    child.on('exit', (code) => (code === 0 ? resolve(output) : reject(new Error(`${path.basename(bin)} exited ${code}:\n${output}`))));
  });
}

/**
 * Starts a temp cluster and returns `{ url, stop }`. `durable: false` (tests) turns fsync off, which
 * only matters for a crash of the machine; benches keep PostgreSQL's defaults.
 */
export async function startCluster({ durable = false, maxConnections = 200 } = {}) {
  const bin = postgresBinDir();
  if (!bin) throw new Error('PostgreSQL is not installed (no initdb found; set PG_BIN or install Debian’s postgresql)');
  const user = clusterUser();
  // The temp dir's parents must be reachable by the cluster's user: /tmp, not a private TMPDIR.
  const base = user ? '/tmp' : os.tmpdir();
  const dir = mkdtempSync(path.join(base, 'tandem-pg-'));
  const dataDir = path.join(dir, 'data');
  if (user) chownSync(dir, user.uid, user.gid);
  const port = await freePort();
  try {
    await run(path.join(bin, 'initdb'), ['-D', dataDir, '-U', 'tandem', '--auth=trust', '--encoding=UTF8', '--no-instructions', '-N'], user);
    const settings = [
      `listen_addresses = '127.0.0.1'`,
      `port = ${port}`,
      `unix_socket_directories = '${dir}'`,
      `max_connections = ${maxConnections}`,
      `shared_buffers = '128MB'`,
      ...(durable ? [] : ['fsync = off', 'synchronous_commit = off', 'full_page_writes = off']),
    ];
    writeFileSync(path.join(dataDir, 'postgresql.auto.conf'), `${settings.join('\n')}\n`);
    if (user) chownSync(path.join(dataDir, 'postgresql.auto.conf'), user.uid, user.gid);
    await run(path.join(bin, 'pg_ctl'), ['-D', dataDir, '-l', path.join(dir, 'server.log'), '-w', '-t', '60', 'start'], user);
  } catch (err) {
    rmSync(dir, { recursive: true, force: true });
    throw err;
  }
  let stopped = false;
  const stop = async () => {
    if (stopped) return;
    stopped = true;
    try {
      await run(path.join(bin, 'pg_ctl'), ['-D', dataDir, '-m', 'fast', '-w', 'stop'], user);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  };
  // The maintenance database `postgres` always exists; tests and benches create their own databases in it.
  return { url: `postgres://tandem@127.0.0.1:${port}/postgres`, port, dir, stop };
}
