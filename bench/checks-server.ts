/**
 * The server side of bench/checks-api.bench.ts and bench/databases.bench.ts, run as its own process
 * (as in production) so the load generator does not share its event loop: a temp database with a few
 * invented catalog items, then one line of JSON on stdout with the port, a token and a realistic check body.
 * BENCH_DATABASE_URL runs it on that (empty) PostgreSQL database instead of a temp SQLite file; with
 * BENCH_JOIN=1 and BENCH_JWT_SECRET it joins a database another bench server already seeded (a second
 * instance).
 */
import 'reflect-metadata';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import pino from 'pino';
import { createApp } from '../server/app';
import { signToken } from '../server/auth/tokens';
import type { AppContext } from '../server/context';
import { openDatabase } from '../server/db/data-source';
import { databaseTarget, type AppConfig } from '../server/env';
import { uploadImport } from '../server/imports/imports.service';
import { User } from '../server/users/user.entity';

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


async function main() {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'tandem-bench-checks-'));
  const config: AppConfig = {
    port: 0,
    databasePath: path.join(dir, 'bench.sqlite'),
    databaseUrl: process.env.BENCH_DATABASE_URL || undefined,
    dataDir: dir,
    demo: false,
    jwtSecret: process.env.BENCH_JWT_SECRET || randomBytes(32).toString('hex'),
    webDir: process.env.TANDEM_WEB_DIR ?? path.join(dir, 'web'),
    logLevel: 'silent',
    signInLimit: 10_000,
  };
  const dataSource = await openDatabase(databaseTarget(config));
  const ctx: AppContext = { dataSource, config, logger: pino({ level: 'silent' }) };
  const users = dataSource.getRepository(User);
  const join = process.env.BENCH_JOIN === '1';
  const benchUser = async (role: 'tech' | 'admin') => {
    const email = `bench-${role}@test.invalid`;
    if (join) return users.findOneByOrFail({ email });
    return users.save(users.create({ email, name: `Bench ${role}`, role, passwordHash: 'x', active: true }));
  };
  const tech = await benchUser('tech');
  if (!join) await seedCatalog(ctx, tech.id);
  const ids = async (table: string) => ((await dataSource.query(`SELECT id FROM ${table} ORDER BY id`)) as { id: number }[])[0].id;
  const body = {
    scope: 'new-system',
    site: { state: 'TX', indoorLocation: 'attic', airflowDirection: 'horizontal-left', conditionedAreaSqFt: 1800, hasSecondaryPan: true },
    outdoor: { id: await ids('outdoor_units') },
    indoorCoil: { id: await ids('indoor_coils') },
    airHandler: { id: await ids('air_handlers') },
    controls: { thermostatHeatPump: true },
    lineSet: { liquidOdIn: 0.375, suctionOdIn: 0.875, lengthFt: 35, liftFt: 10, filterDrier: 'bi-flow' },
    electrical: { breakerAmps: 30, wireAwg: 10, wireMaterial: 'copper', supplyVoltage: 240, supplyPhase: 1 },
  };
  const server = createApp(ctx).listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  const token = signToken(config.jwtSecret, { userId: tech.id, role: 'tech' });
  const admin = await benchUser('admin');
  const adminToken = signToken(config.jwtSecret, { userId: admin.id, role: 'admin' });
  process.stdout.write(`${JSON.stringify({ port: (server.address() as AddressInfo).port, token, adminToken, body, jwtSecret: config.jwtSecret })}\n`);
  process.on('SIGTERM', () => {
    server.close(() => void dataSource.destroy().finally(() => {
      rmSync(dir, { recursive: true, force: true });
      process.exit(0);
    }));
  });
}

void main();
