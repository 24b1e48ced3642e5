import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
// autocannon ships no types here; the options and result fields used are documented in its README.
// eslint-disable-next-line @typescript-eslint/ban-ts-comment
// @ts-ignore
import autocannon from 'autocannon';
import pino from 'pino';
import { createApp } from '../server/app';
import { signToken } from '../server/auth/tokens';
import type { AppContext } from '../server/context';
import { openDatabase } from '../server/db/data-source';
import type { AppConfig } from '../server/env';
import { uploadImport } from '../server/imports/imports.service';
import { User } from '../server/users/user.entity';
import { round, type Measure } from './measure';

const CONNECTIONS = 50;
const DURATION_S = 10;

interface CannonResult {
  latency: { p99: number };
  requests: { average: number };
  non2xx: number;
  errors: number;
}

// One worker thread generates the load, so it does not share the server's event loop (2 cores).
const cannon = (opts: Record<string, unknown>) => autocannon({ connections: CONNECTIONS, duration: DURATION_S, workers: 1, ...opts }) as Promise<CannonResult>;

/** A few invented catalog items, the way an office would import them. */
async function seedCatalog(ctx: AppContext, userId: number) {
  const load = (kind: 'outdoor-units' | 'indoor-coils' | 'air-handlers' | 'rated-combinations', csv: string) =>
    uploadImport(ctx, { buffer: Buffer.from(csv), fileName: `${kind}.csv`, kind, dryRun: false, userId });
  await load(
    'outdoor-units',
    'model,system_type,refrigerant,nominal_tons,metering_required,liquid_line_od_in,suction_line_od_in,max_line_length_ft,max_lift_ft,charged_line_length_ft,charge_per_ft_oz,mca_amps,mocp_amps,voltage,phase,seer2,eer2,hspf2,cooling_btuh\n' +
      'BX-HP36,heat-pump,R-454B,3,txv,0.375,0.875,100,50,15,0.6,21.2,35,208/230,1,16,12,8,35000\nBX-AC24,ac,R-410A,2,any,0.375,0.75,80,30,15,0.6,15,25,208/230,1,14.3,11.7,,23500\n',
  );
  await load('indoor-coils', 'model,min_tons,max_tons,refrigerants,metering_type,metering_refrigerant,metering_bidirectional,a2l_listed,configuration\nBX-CL36,2.5,3.5,R-454B;R-32,txv,R-454B,yes,yes,multi-position\n');
  await load('air-handlers', 'model,kind,min_tons,max_tons,airflow_cfm\nBX-AH36,air-handler,2.5,3.5,1200\n');
  await load('rated-combinations', 'outdoor_model,indoor_model,air_handler_model,seer2,eer2,hspf2,cooling_btuh\nBX-HP36,BX-CL36,BX-AH36,16,12,8,35000\n');
}

/** POST /api/checks and GET /api/health under autocannon on loopback, in the same run. */
export async function run(): Promise<Measure[]> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'tandem-bench-checks-'));
  const config: AppConfig = { port: 0, databasePath: path.join(dir, 'bench.sqlite'), dataDir: dir, demo: false, jwtSecret: randomBytes(32).toString('hex'), webDir: path.join(dir, 'web'), logLevel: 'silent', signInLimit: 10_000 };
  const dataSource = await openDatabase(config.databasePath);
  const ctx: AppContext = { dataSource, config, logger: pino({ level: 'silent' }) };
  const users = dataSource.getRepository(User);
  const tech = await users.save(users.create({ email: 'bench-tech@test.invalid', name: 'Bench tech', role: 'tech', passwordHash: 'x', active: true }));
  await seedCatalog(ctx, tech.id);
  const ids = async (table: string) => ((await dataSource.query(`SELECT id FROM ${table} ORDER BY id`)) as { id: number }[])[0].id;
  const body = JSON.stringify({
    scope: 'new-system',
    site: { state: 'TX', indoorLocation: 'attic', airflowDirection: 'horizontal-left', conditionedAreaSqFt: 1800, hasSecondaryPan: true },
    outdoor: { id: await ids('outdoor_units') },
    indoorCoil: { id: await ids('indoor_coils') },
    airHandler: { id: await ids('air_handlers') },
    controls: { thermostatHeatPump: true },
    lineSet: { liquidOdIn: 0.375, suctionOdIn: 0.875, lengthFt: 35, liftFt: 10, filterDrier: 'bi-flow' },
    electrical: { breakerAmps: 30, wireAwg: 10, wireMaterial: 'copper', supplyVoltage: 240, supplyPhase: 1 },
  });

  const server = createApp(ctx).listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const headers = { Authorization: `Bearer ${signToken(config.jwtSecret, { userId: tech.id, role: 'tech' })}`, 'Content-Type': 'application/json' };
  try {
    const probe = await fetch(`${base}/api/checks`, { method: 'POST', headers, body });
    if (probe.status !== 200) throw new Error(`POST /api/checks answered ${probe.status}: ${await probe.text()}`);
    const health = await cannon({ url: `${base}/api/health` });
    const checks = await cannon({ url: `${base}/api/checks`, method: 'POST', headers, body });
    const rssMb = process.memoryUsage().rss / 2 ** 20;
    const note = `${CONNECTIONS} connections × ${DURATION_S} s, autocannon in a worker thread of the server's process (loopback)`;
    const failures = checks.non2xx + checks.errors;
    return [
      { id: 'api.checks.p99-ms', value: checks.latency.p99, unit: 'ms', baseline: health.latency.p99, ratio: round(checks.latency.p99 / Math.max(health.latency.p99, 1), 2), note: `${note}; target < 25; baseline GET /api/health p99` },
      { id: 'api.checks.rps', value: round(checks.requests.average, 0), unit: 'req/s', baseline: round(health.requests.average, 0), ratio: round(checks.requests.average / health.requests.average, 3), note: `${note}; baseline GET /api/health${failures ? `; ${failures} failed requests` : ''}` },
      { id: 'api.checks.rss-mb-after', value: round(rssMb, 1), unit: 'MB', note: 'process RSS after both runs; target < 300' },
    ];
  } finally {
    await new Promise((resolve) => server.close(resolve));
    await dataSource.destroy();
    rmSync(dir, { recursive: true, force: true });
  }
}
