import { readFileSync } from 'node:fs';
// autocannon ships no types here; the options and result fields used are documented in its README.
// eslint-disable-next-line @typescript-eslint/ban-ts-comment
// @ts-ignore
import autocannon from 'autocannon';
import { startBenchServer } from './bench-server';
import { processCpuS } from './process-cpu';
import { round, type Measure } from './measure';

const CONNECTIONS = 50;
const DURATION_S = 10;
/** Alternating 10-second rounds of health and checks whose mean rates give api.checks.rps. */
const RATE_ROUNDS = 3;

interface CannonResult {
  latency: { p99: number };
  requests: { average: number; total: number };
  non2xx: number;
  errors: number;
}

const cannon = (opts: Record<string, unknown>) =>
  autocannon({ connections: CONNECTIONS, duration: DURATION_S, ...opts }) as Promise<CannonResult>;

/** A cannon run beside the server's CPU time per request in it (µs, from /proc): steadier than a rate on a shared machine. */
type Round = CannonResult & { cpuUs: number };

async function measuredRound(pid: number, opts: Record<string, unknown>): Promise<Round> {
  const before = processCpuS(pid);
  const result = await cannon(opts);
  return { ...result, cpuUs: ((processCpuS(pid) - before) * 1e6) / Math.max(result.requests.total, 1) };
}

const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;

/** Health and checks rounds' mean rates and CPU per request, and the two ratios (checks ÷ health). */
function compare(health: Round[], checks: Round[]) {
  const healthRps = mean(health.map((r) => r.requests.average));
  const checksRps = mean(checks.map((r) => r.requests.average));
  const healthCpuUs = mean(health.map((r) => r.cpuUs));
  const checksCpuUs = mean(checks.map((r) => r.cpuUs));
  const rates = (rounds: Round[]) => rounds.map((r) => round(r.requests.average, 0)).join(', ');
  return {
    healthRps,
    checksRps,
    cpu: `server CPU per request ${round(healthCpuUs, 0)} µs health, ${round(checksCpuUs, 0)} µs checks (ratio ${round(healthCpuUs / checksCpuUs, 3)})`,
    rounds: `health ${rates(health)}; checks ${rates(checks)} req/s`,
  };
}

/** Resident set size of a process in MB, from /proc (Linux). */
function rssMbOf(pid: number): number | undefined {
  try {
    const kb = /VmRSS:\s+(\d+)/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'))?.[1];
    return kb ? Number(kb) / 1024 : undefined;
  } catch {
    return undefined;
  }
}

const COMMIT_ROWS = 500;

/** A 500-row price file whose effective date differs per round, so every commit inserts all its rows. */
function priceFile(round: number): Blob {
  const day = new Date(Date.UTC(2020, 0, 1) + round * 86_400_000).toISOString().slice(0, 10);
  const lines = ['model,price,effective_from,description'];
  for (let i = 0; i < COMMIT_ROWS; i++)
    lines.push(`BX-${String(i).padStart(4, '0')}-P,"$${(100 + i / 4).toFixed(2)}",${day},"Bench part ${i}"`);
  return new Blob([`${lines.join('\n')}\n`], { type: 'text/csv' });
}

/** Commits 500-row price files back to back (dryRun=false) until stopped; resolves with the count committed. */
async function commitLoop(base: string, adminToken: string, stop: { done: boolean }): Promise<{ commits: number; failed: number }> {
  let commits = 0;
  let failed = 0;
  for (let round = 0; !stop.done; round++) {
    const form = new FormData();
    form.append('kind', 'prices');
    form.append('distributor', 'Bench Supply');
    form.append('dryRun', 'false');
    form.append('file', priceFile(round), 'prices.csv');
    const res = await fetch(`${base}/api/imports`, { method: 'POST', headers: { Authorization: `Bearer ${adminToken}` }, body: form });
    await res.arrayBuffer();
    if (res.status === 201) commits++;
    else failed++;
  }
  return { commits, failed };
}

/**
 * The same two rates on the floor server (the app's middleware, a stored answer, no work), alternating
 * like the real rounds; its own process, started after the real server has stopped.
 */
async function floorRates(answer: string, headers: Record<string, string>, payload: string) {
  const { child, info } = await startBenchServer<{ port: number }>('checks-floor-server.ts', { BENCH_ANSWER: answer });
  try {
    const base = `http://127.0.0.1:${info.port}`;
    const post = { url: `${base}/api/checks`, method: 'POST', headers, body: payload };
    await cannon({ ...post, duration: 3 });
    const health: Round[] = [];
    const checks: Round[] = [];
    for (let i = 0; i < RATE_ROUNDS; i++) {
      health.push(await measuredRound(child.pid!, { url: `${base}/api/health` }));
      checks.push(await measuredRound(child.pid!, post));
    }
    return compare(health, checks);
  } finally {
    child.kill('SIGTERM');
  }
}

/** POST /api/checks and GET /api/health under autocannon on loopback, in the same run, against a server process of its own. */
export async function run(): Promise<Measure[]> {
  const { child, info } = await startBenchServer<{ port: number; token: string; adminToken: string; body: unknown }>('checks-server.ts');
  try {
    const { port, token, adminToken, body } = info;
    const base = `http://127.0.0.1:${port}`;
    const headers = { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' };
    const payload = JSON.stringify(body);
    const probe = await fetch(`${base}/api/checks`, { method: 'POST', headers, body: payload });
    if (probe.status !== 200) throw new Error(`POST /api/checks answered ${probe.status}: ${await probe.text()}`);
    const answer = await probe.text();
    // Warm-up (JIT, lazily compiled modules) so the measured runs see a server in its steady state.
    await cannon({ url: `${base}/api/checks`, method: 'POST', headers, body: payload, duration: 3 });
    // Alternating rounds of each: a burst of other work on a shared machine then weighs on both rates,
    // and on two shared cores one 10-second rate moves by 10-30 %, so the ratio is the mean of RATE_ROUNDS.
    const healthRounds: Round[] = [];
    const checkRounds: Round[] = [];
    for (let i = 0; i < RATE_ROUNDS; i++) {
      healthRounds.push(await measuredRound(child.pid!, { url: `${base}/api/health` }));
      checkRounds.push(await measuredRound(child.pid!, { url: `${base}/api/checks`, method: 'POST', headers, body: payload }));
    }
    const [health, checks] = [healthRounds[0], checkRounds[0]];
    const real = compare(healthRounds, checkRounds);
    const { healthRps, checksRps } = real;
    // The same checks while an admin commits 500-row price files back to back (issue 8, fault 6).
    const stop = { done: false };
    const loop = commitLoop(base, adminToken, stop);
    const during = await cannon({ url: `${base}/api/checks`, method: 'POST', headers, body: payload });
    stop.done = true;
    const { commits, failed } = await loop;
    const rssMb = rssMbOf(child.pid!);
    child.kill('SIGTERM');
    const floor = await floorRates(answer, headers, payload);
    const note = `${CONNECTIONS} connections × ${DURATION_S} s on loopback after a 3 s warm-up; server in its own process, autocannon in the bench process`;
    const failures = checkRounds.reduce((sum, r) => sum + r.non2xx + r.errors, 0);
    return [
      {
        id: 'api.checks.p99-ms',
        value: checks.latency.p99,
        unit: 'ms',
        baseline: health.latency.p99,
        ratio: round(checks.latency.p99 / Math.max(health.latency.p99, 1), 2),
        note: `${note}; target < 25; baseline GET /api/health p99`,
      },
      {
        id: 'api.checks.rps',
        value: round(checksRps, 0),
        unit: 'req/s',
        baseline: round(healthRps, 0),
        ratio: round(checksRps / healthRps, 3),
        note: `${note}; mean of ${RATE_ROUNDS} alternating rounds (${real.rounds}); ${real.cpu}; baseline GET /api/health; target ratio ≥ 0.6${failures ? `; ${failures} failed requests` : ''}`,
      },
      {
        id: 'api.checks.during-commits.p99-ms',
        value: during.latency.p99,
        unit: 'ms',
        baseline: checks.latency.p99,
        ratio: round(during.latency.p99 / Math.max(checks.latency.p99, 1), 2),
        note: `${note}; while ${commits} price commits of ${COMMIT_ROWS} rows ran back to back${failed ? ` (${failed} failed)` : ''}; ${round(during.requests.average, 0)} req/s; baseline = idle api.checks.p99-ms of this run; target ratio ≤ 1.5`,
      },
      {
        id: 'api.checks.rps.floor',
        value: round(floor.checksRps, 0),
        unit: 'req/s',
        baseline: round(floor.healthRps, 0),
        ratio: round(floor.checksRps / floor.healthRps, 3),
        note: `${note}; the app's middleware answering POST /api/checks with this run's answer and no work (bench/checks-floor-server.ts): the highest checks ÷ health ratio any handler can reach here; mean of ${RATE_ROUNDS} alternating rounds (${floor.rounds}); ${floor.cpu}`,
      },
      ...(rssMb === undefined
        ? []
        : [
            { id: 'api.checks.rss-mb-after', value: round(rssMb, 1), unit: 'MB', note: 'server process RSS after both runs; target < 300' },
          ]),
    ];
  } finally {
    child.kill('SIGTERM');
  }
}
