/**
 * Kill -9 during a large price commit, then restart: the fault suite (tests/server/imports) runs a
 * few rounds, the soak (`npm run bench -- --soak`) many. The server runs as its own process on a
 * temp database and a free port: server/index.ts bundled once with esbuild (the server's tsconfig,
 * packages left external), because a tsx start takes seconds per restart on a busy machine and the
 * suite restarts it after every kill. tsx emits no decorator metadata either, so both run the same code.
 */
import 'reflect-metadata';
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { createInterface } from 'node:readline';
import Database from 'better-sqlite3';
import bcrypt from 'bcryptjs';
import { build } from 'esbuild';
import { signToken } from '../server/auth/tokens';
import { openDatabase } from '../server/db/data-source';
import { User } from '../server/users/user.entity';

const ROOT = path.resolve(__dirname, '..');

export interface KillRound {
  /** Milliseconds after the upload was sent that the server was killed. */
  killAfterMs: number;
  /** Whether the upload answered before the kill. */
  answered: boolean;
  integrity: string;
  /** Committed imports whose rows are not all there, or rows of imports that are not committed. */
  partial: string[];
}

export interface KillReport {
  rounds: KillRound[];
  committed: number;
  absent: number;
}

interface Running {
  child: ChildProcess;
  port: number;
}

/** Bundles server/index.ts under node_modules/.cache (so its packages resolve from the project). */
async function bundleServer(): Promise<string> {
  const outfile = path.join(ROOT, 'node_modules/.cache/tandem-kill', `server-${process.pid}.cjs`);
  await build({ entryPoints: [path.join(ROOT, 'server/index.ts')], bundle: true, platform: 'node', format: 'cjs', packages: 'external', tsconfig: path.join(ROOT, 'server/tsconfig.json'), outfile, logLevel: 'warning' });
  return outfile;
}

/** Starts the bundled server on a free port and resolves once it listens. */
function startServer(entry: string, env: NodeJS.ProcessEnv): Promise<Running> {
  const child = spawn(process.execPath, [entry], { cwd: ROOT, env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error('server did not start within 60 s')), 60_000);
    createInterface({ input: child.stdout! }).on('line', (line) => {
      const port = /listening on http:\/\/localhost:(\d+)/.exec(line)?.[1];
      if (port) {
        clearTimeout(timer);
        resolve({ child, port: Number(port) });
      }
    });
    child.stderr!.resume();
    child.once('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`server exited with ${code} before listening`));
    });
  });
}

function killHard(child: ChildProcess): Promise<void> {
  return new Promise((resolve) => {
    if (child.exitCode !== null || child.signalCode !== null) return resolve();
    child.once('exit', () => resolve());
    child.kill('SIGKILL');
  });
}

/** A price file of `rows` rows, all new for its effective date. */
function priceFile(rows: number, round: number): Blob {
  const day = new Date(Date.UTC(2021, 0, 1) + round * 86_400_000).toISOString().slice(0, 10);
  const lines = ['model,price,effective_from,description'];
  for (let i = 0; i < rows; i++) lines.push(`KX-${i},"$${(10 + i / 100).toFixed(2)}",${day},"Kill round ${round} part ${i}"`);
  return new Blob([`${lines.join('\n')}\n`], { type: 'text/csv' });
}

/** Integrity and the whole-or-absent rule, read straight from the file the killed server left. */
function inspect(databasePath: string): { integrity: string; partial: string[]; committed: number } {
  const db = new Database(databasePath, { readonly: true });
  try {
    const integrity = (db.pragma('integrity_check') as { integrity_check: string }[]).map((r) => r.integrity_check).join('; ');
    const imports = db.prepare("SELECT id, status, inserted FROM imports WHERE kind = 'prices'").all() as { id: number; status: string; inserted: number }[];
    const rowsOf = db.prepare('SELECT COUNT(*) AS n FROM price_entries WHERE importId = ?');
    const partial: string[] = [];
    for (const i of imports) {
      const n = (rowsOf.get(i.id) as { n: number }).n;
      const expected = i.status === 'committed' ? i.inserted : 0;
      if (n !== expected) partial.push(`import ${i.id} (${i.status}) has ${n} of ${expected} rows`);
    }
    const orphans = (db.prepare('SELECT COUNT(*) AS n FROM price_entries WHERE importId IS NOT NULL AND importId NOT IN (SELECT id FROM imports)').get() as { n: number }).n;
    if (orphans > 0) partial.push(`${orphans} price rows of no import`);
    return { integrity, partial, committed: imports.filter((i) => i.status === 'committed').length };
  } finally {
    db.close();
  }
}

/** Runs `rounds` kill-and-restart rounds of a `rows`-row price commit; kills land at random moments up to `maxKillMs`. */
export async function killDuringCommits(rounds: number, rows: number, maxKillMs: number, random: () => number = Math.random): Promise<KillReport> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'tandem-kill-'));
  const databasePath = path.join(dir, 'kill.sqlite');
  const secret = 'kill-suite-secret-'.padEnd(48, 'x');
  const env = { PORT: '0', DATABASE_PATH: databasePath, TANDEM_DATA_DIR: dir, TANDEM_JWT_SECRET: secret, TANDEM_WEB_DIR: path.join(dir, 'web'), TANDEM_LOG_LEVEL: 'info', TANDEM_DEMO: '0' };
  const setup = await openDatabase(databasePath);
  const admin = await setup.getRepository(User).save({ email: 'kill-admin@test.invalid', name: 'Kill admin', role: 'admin', passwordHash: await bcrypt.hash('unused-password', 4), active: true });
  await setup.destroy();
  const token = signToken(secret, { userId: admin.id, role: 'admin' });
  const report: KillReport = { rounds: [], committed: 0, absent: 0 };
  const entry = await bundleServer();
  let server = await startServer(entry, env);
  try {
    for (let round = 0; round < rounds; round++) {
      const form = new FormData();
      form.append('kind', 'prices');
      form.append('distributor', 'Kill Supply');
      form.append('dryRun', 'false');
      form.append('file', priceFile(rows, round), 'kill.csv');
      let answered = false;
      const sent = fetch(`http://127.0.0.1:${server.port}/api/imports`, { method: 'POST', headers: { Authorization: `Bearer ${token}` }, body: form })
        .then(async (res) => {
          await res.arrayBuffer();
          answered = true;
        })
        .catch(() => undefined);
      const killAfterMs = Math.round(random() * maxKillMs);
      await new Promise((resolve) => setTimeout(resolve, killAfterMs));
      await killHard(server.child);
      await sent;
      // Restart on the file the killed process left (migrations and WAL recovery run at start).
      server = await startServer(entry, env);
      const found = inspect(databasePath);
      report.rounds.push({ killAfterMs, answered, integrity: found.integrity, partial: found.partial });
    }
    const final = inspect(databasePath);
    report.committed = final.committed;
    report.absent = rounds - final.committed;
  } finally {
    await killHard(server.child);
    rmSync(dir, { recursive: true, force: true });
    rmSync(entry, { force: true });
  }
  return report;
}
