import type { ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
// autocannon ships no types here; the options and result fields used are documented in its README.
// eslint-disable-next-line @typescript-eslint/ban-ts-comment
// @ts-ignore
import autocannon from 'autocannon';
// @ts-expect-error -- a plain .mjs script shared with scripts/with-postgres.mjs and the api-pg tests
import { postgresBinDir, startCluster } from '../scripts/postgres-cluster.mjs';
import { startBenchServer } from './bench-server';
import { clearRealImport, IMPORT_ROUNDS, median, priceCsv, realImport } from './import.bench';
import { round, type Measure } from './measure';
import { coresDuring, describeCores, machineCpuS, postmasterPid, processCpuS, selfCpuS, treeCpuS, type CpuReaders } from './process-cpu';

/**
 * Issue 13: the same API on SQLite and on PostgreSQL in one run — checks/s and catalog searches/s on
 * one SQLite server, one PostgreSQL server, and two server processes sharing one PostgreSQL — and the
 * 100k-row price import on PostgreSQL beside SQLite. Starts its own throwaway cluster (PostgreSQL's
 * default durability settings) through scripts/postgres-cluster.mjs; without PostgreSQL it is skipped.
 */

const CONNECTIONS = 50;
const DURATION_S = 10;
const IMPORT_ROWS = 100_000;

interface ServerInfo {
  /** The server process's pid (set by the bench, not printed by the server). */
  pid?: number;
  port: number;
  token: string;
  body: unknown;
  jwtSecret: string;
}

interface Load {
  name: 'checks' | 'search';
  path: string;
  method: 'GET' | 'POST';
}
const LOADS: Load[] = [
  { name: 'checks', path: '/api/checks', method: 'POST' },
  // A catalog search as the Check screen's part picker sends it (fuse.js over the in-memory index).
  { name: 'search', path: '/api/catalog/outdoor-units?q=BX-HP&pageSize=20', method: 'GET' },
];

interface LoadResult {
  rps: number;
  failed: number;
  /** Cores each process kept busy during the measured run (see cpuReaders). */
  cores: Record<string, number>;
}

/**
 * Who used the machine's two cores during a run: each server, the PostgreSQL cluster (postmaster and
 * backends), this process (autocannon, the load generator) and everything else on the machine. Shown
 * beside the rates so a reader can tell a server-bound run from one the load generator or a neighbour capped.
 */
function cpuReaders(servers: ServerInfo[], postgresPid: number | null): CpuReaders {
  const readers: CpuReaders = {};
  servers.forEach((s, i) => (readers[servers.length > 1 ? `server ${i + 1}` : 'server'] = () => processCpuS(s.pid!)));
  if (postgresPid !== null) readers.postgres = () => treeCpuS(postgresPid);
  readers['load generator'] = selfCpuS;
  readers.machine = machineCpuS;
  return readers;
}

/** The machine's total minus the processes named: what other work on the box took. */
function withRest(cores: Record<string, number>): Record<string, number> {
  const { machine, ...named } = cores;
  const rest = machine - Object.values(named).reduce((sum, v) => sum + v, 0);
  return { ...named, 'rest of machine': Math.max(0, rest) };
}

/** Requests per second of one load spread over the servers (the connections split between them). */
async function rps(servers: ServerInfo[], load: Load, durationS = DURATION_S): Promise<{ rps: number; failed: number }> {
  const runs = servers.map(
    (s) =>
      autocannon({
        url: `http://127.0.0.1:${s.port}${load.path}`,
        method: load.method,
        headers: { Authorization: `Bearer ${s.token}`, 'Content-Type': 'application/json' },
        ...(load.method === 'POST' ? { body: JSON.stringify(s.body) } : {}),
        connections: Math.ceil(CONNECTIONS / servers.length),
        duration: durationS,
      }) as Promise<{ requests: { average: number }; non2xx: number; errors: number }>,
  );
  const results = await Promise.all(runs);
  return { rps: results.reduce((sum, r) => sum + r.requests.average, 0), failed: results.reduce((sum, r) => sum + r.non2xx + r.errors, 0) };
}

/** Every load against these servers, each after a short warm-up, with each process's CPU during the measured run. */
async function measureAll(servers: ServerInfo[], postgresPid: number | null = null): Promise<Record<Load['name'], LoadResult>> {
  const out = {} as Record<Load['name'], LoadResult>;
  for (const load of LOADS) {
    await rps(servers, load, 3);
    const { result, cores } = await coresDuring(cpuReaders(servers, postgresPid), () => rps(servers, load));
    out[load.name] = { ...result, cores: withRest(cores) };
  }
  return out;
}

async function createDatabase(serverUrl: string, name: string): Promise<string> {
  const admin = new pg.Client({ connectionString: serverUrl });
  await admin.connect();
  try {
    await admin.query(`CREATE DATABASE "${name}"`);
  } finally {
    await admin.end();
  }
  const url = new URL(serverUrl);
  url.pathname = `/${name}`;
  return url.toString();
}

export async function run(): Promise<Measure[]> {
  if (!postgresBinDir()) {
    console.log('skipped: no PostgreSQL');
    return [];
  }
  const children: ChildProcess[] = [];
  const start = async (env: Record<string, string> = {}) => {
    const { child, info } = await startBenchServer<ServerInfo>('checks-server.ts', env);
    children.push(child);
    return { ...info, pid: child.pid };
  };
  const stopAll = () => {
    for (const child of children.splice(0)) child.kill('SIGTERM');
  };
  const cluster = (await startCluster({ durable: true })) as { url: string; dir: string; stop(): Promise<void> };
  const postgresPid = postmasterPid(path.join(cluster.dir, 'data'));
  const dir = mkdtempSync(path.join(os.tmpdir(), 'tandem-bench-databases-'));
  try {
    const sqlite = await measureAll([await start()]);
    stopAll();

    const apiUrl = await createDatabase(cluster.url, 'bench_api');
    const first = await start({ BENCH_DATABASE_URL: apiUrl });
    const onePg = await measureAll([first], postgresPid);
    const second = await start({ BENCH_DATABASE_URL: apiUrl, BENCH_JOIN: '1', BENCH_JWT_SECRET: first.jwtSecret });
    const twoPg = await measureAll([first, second], postgresPid);
    stopAll();

    const file = path.join(dir, 'prices.csv');
    writeFileSync(file, priceCsv(IMPORT_ROWS));
    // Alternating rounds on fresh databases, medians reported (one run alone swings by a third here).
    const sqliteRuns: Awaited<ReturnType<typeof realImport>>[] = [];
    const pgRuns: Awaited<ReturnType<typeof realImport>>[] = [];
    let postgresImportCpuS = 0;
    for (let i = 0; i < IMPORT_ROUNDS; i++) {
      clearRealImport(dir);
      sqliteRuns.push(await realImport(dir, file));
      const importUrl = await createDatabase(cluster.url, `bench_import_${i}`);
      const postgresBefore = treeCpuS(postgresPid);
      const run = await realImport(dir, file, importUrl);
      // Includes the migrations import-run applies to the empty database before its clock starts.
      postgresImportCpuS += (treeCpuS(postgresPid) - postgresBefore) / IMPORT_ROUNDS;
      if (run.rows !== IMPORT_ROWS) throw new Error(`PostgreSQL import inserted ${run.rows} of ${IMPORT_ROWS} rows`);
      pgRuns.push(run);
    }
    const middle = (runs: typeof pgRuns) => runs.find((r) => r.seconds === median(runs.map((x) => x.seconds)))!;
    const sqliteImport = middle(sqliteRuns);
    const pgImport = middle(pgRuns);
    const seconds = (runs: typeof pgRuns) => runs.map((r) => round(r.seconds, 2)).join(', ');

    const note = `${CONNECTIONS} connections × ${DURATION_S} s on loopback after a 3 s warm-up; servers in their own processes, PostgreSQL 15 on the same machine (default durability)`;
    const failures = (r: { failed: number }) => (r.failed ? `; ${r.failed} failed requests` : '');
    const cpu = (r: LoadResult) => `; CPU during the run: ${describeCores(r.cores)}`;
    const measures: Measure[] = [];
    for (const load of LOADS) {
      const s = sqlite[load.name];
      const p1 = onePg[load.name];
      const p2 = twoPg[load.name];
      measures.push(
        { id: `api.${load.name}.rps.sqlite`, value: round(s.rps, 0), unit: 'req/s', note: `${note}; one server on SQLite${failures(s)}${cpu(s)}` },
        {
          id: `api.${load.name}.rps.postgres`,
          value: round(p1.rps, 0),
          unit: 'req/s',
          baseline: round(s.rps, 0),
          ratio: round(p1.rps / s.rps, 3),
          note: `${note}; one server on PostgreSQL; baseline api.${load.name}.rps.sqlite; target ratio ≥ 0.67 (within 1.5×)${failures(p1)}${cpu(p1)}`,
        },
        {
          id: `api.${load.name}.rps.postgres-2`,
          value: round(p2.rps, 0),
          unit: 'req/s',
          baseline: round(p1.rps, 0),
          ratio: round(p2.rps / p1.rps, 3),
          note: `${note}; two server processes on one PostgreSQL, connections split between them; baseline one server; target ratio ≥ 1.6 (needs a core per server)${failures(p2)}${cpu(p2)}`,
        },
      );
    }
    measures.push({
      id: 'import.prices-100k.postgres.s',
      value: round(pgImport.seconds, 3),
      unit: 's',
      baseline: round(sqliteImport.seconds, 3),
      ratio: round(pgImport.seconds / sqliteImport.seconds, 2),
      note:
        `${IMPORT_ROWS.toLocaleString('en-US')}-row price file through the import service on PostgreSQL (INSERT … SELECT FROM unnest arrays); baseline the same on SQLite in this run; ` +
        `medians of ${IMPORT_ROUNDS} alternating rounds (PostgreSQL ${seconds(pgRuns)} s; SQLite ${seconds(sqliteRuns)} s); ` +
        `CPU: import process ${round(pgImport.cpuSeconds, 2)} s on PostgreSQL, ${round(sqliteImport.cpuSeconds, 2)} s on SQLite; PostgreSQL ${round(postgresImportCpuS, 2)} s a round (with its migrations)`,
    });
    return measures;
  } finally {
    stopAll();
    rmSync(dir, { recursive: true, force: true });
    await cluster.stop();
  }
}
