/**
 * The data the jobs benches run on: a temp SQLite database with invented catalog items and prices, a
 * tech, one job with a full record (serials, readings, checklist, a nameplate photo) and the body that
 * created it. Shared by bench/jobs-server.ts and any in-process profile of a save.
 */
import 'reflect-metadata';
import { randomBytes } from 'node:crypto';
import { mkdtempSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { deflateSync } from 'node:zlib';
import pino from 'pino';
import { saveAttachment } from '../server/attachments/attachments.service';
import type { AppContext } from '../server/context';
import { openDatabase } from '../server/db/data-source';
import type { AppConfig } from '../server/env';
import { uploadImport } from '../server/imports/imports.service';
import { createJob } from '../server/jobs/jobs.service';
import { addReading } from '../server/systems/readings.service';
import { createSystem } from '../server/systems/systems.service';
import { User } from '../server/users/user.entity';
import type { SystemCreate } from '../shared/schemas/systems';
import { DEMO_CHARGE_READING } from '../seed/demo-jobs';

export interface JobsFixture {
  ctx: AppContext;
  /** The temp directory holding the database; the caller removes it. */
  dir: string;
  techId: number;
  jobId: number;
  recordId: number;
  body: SystemCreate;
}

async function seedCatalog(ctx: AppContext, userId: number) {
  const load = (
    kind: 'outdoor-units' | 'indoor-coils' | 'air-handlers' | 'rated-combinations' | 'prices',
    csv: string,
    distributor?: string,
  ) => uploadImport(ctx, { buffer: Buffer.from(csv), fileName: `${kind}.csv`, kind, dryRun: false, userId, distributor });
  await load(
    'outdoor-units',
    'model,brand,system_type,refrigerant,nominal_tons,metering_required,liquid_line_od_in,suction_line_od_in,max_line_length_ft,max_lift_ft,charged_line_length_ft,charge_per_ft_oz,mca_amps,mocp_amps,voltage,phase,seer2,eer2,hspf2,cooling_btuh,target_subcooling_f\n' +
      'BJ-HP36,Benchmark Air,heat-pump,R-454B,3,txv,0.375,0.875,100,50,15,0.6,21.2,35,208/230,1,16,12,8,35000,10\n',
  );
  await load(
    'indoor-coils',
    'model,brand,min_tons,max_tons,refrigerants,metering_type,metering_refrigerant,metering_bidirectional,a2l_listed,leak_sensor,configuration\nBJ-CL36,Benchmark Air,2.5,3.5,R-454B;R-32,txv,R-454B,yes,yes,yes,multi-position\n',
  );
  await load(
    'air-handlers',
    'model,brand,kind,min_tons,max_tons,airflow_cfm,a2l_listed,refrigerants\nBJ-AH36,Benchmark Air,air-handler,2.5,3.5,1200,yes,R-454B\n',
  );
  await load(
    'rated-combinations',
    'outdoor_model,indoor_model,air_handler_model,seer2,eer2,hspf2,cooling_btuh,reference\nBJ-HP36,BJ-CL36,BJ-AH36,16,12,8,35000,BJ-REF-1\n',
  );
  await load('prices', 'model,price\nBJ-HP36,3400\nBJ-CL36,950\nBJ-AH36,1400\n', 'Bench Supply');
}

/** A 640 × 480 gradient PNG standing in for a phone's nameplate photo. */
function photo(): Buffer {
  const crcTable = Array.from({ length: 256 }, (_, n) => {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    return c >>> 0;
  });
  const crc = (b: Buffer) => {
    let c = 0xffffffff;
    for (const x of b) c = crcTable[(c ^ x) & 0xff] ^ (c >>> 8);
    return (c ^ 0xffffffff) >>> 0;
  };
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type), data]);
    const out = Buffer.alloc(12 + data.length);
    out.writeUInt32BE(data.length, 0);
    body.copy(out, 4);
    out.writeUInt32BE(crc(body), 8 + data.length);
    return out;
  };
  const w = 640;
  const h = 480;
  const raw = Buffer.alloc((w * 3 + 1) * h);
  for (let y = 0; y < h; y++) for (let x = 0; x < w; x++) raw.set([x & 255, y & 255, 128], y * (w * 3 + 1) + 1 + x * 3);
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(w, 0);
  ihdr.writeUInt32BE(h, 4);
  ihdr.set([8, 2, 0, 0, 0], 8);
  return Buffer.concat([
    Buffer.from([137, 80, 78, 71, 13, 10, 26, 10]),
    chunk('IHDR', ihdr),
    chunk('IDAT', deflateSync(raw)),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/** Opens a fresh database under a temp directory and fills it (see the file's comment). */
export async function openJobsFixture(): Promise<JobsFixture> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'tandem-bench-jobs-'));
  const config: AppConfig = {
    port: 0,
    databasePath: path.join(dir, 'bench.sqlite'),
    dataDir: dir,
    demo: false,
    jwtSecret: randomBytes(32).toString('hex'),
    webDir: path.join(dir, 'web'),
    logLevel: 'silent',
    signInLimit: 10_000,
    shopName: 'Benchmark Heating',
  };
  const dataSource = await openDatabase(config.databasePath);
  const ctx: AppContext = { dataSource, config, logger: pino({ level: 'silent' }) };
  const users = dataSource.getRepository(User);
  const tech = await users.save(
    users.create({ email: 'bench-tech@test.invalid', name: 'Bench tech', role: 'tech', passwordHash: 'x', active: true }),
  );
  await seedCatalog(ctx, tech.id);
  const id = async (table: string) => ((await dataSource.query(`SELECT id FROM ${table} ORDER BY id`)) as { id: number }[])[0].id;
  const body: SystemCreate = {
    scope: 'new-system',
    site: { state: 'TX', indoorLocation: 'attic', airflowDirection: 'horizontal-left', conditionedAreaSqFt: 1800, hasSecondaryPan: true },
    outdoor: { id: await id('outdoor_units') },
    indoorCoil: { id: await id('indoor_coils') },
    airHandler: { id: await id('air_handlers') },
    controls: { thermostatHeatPump: true },
    lineSet: { liquidOdIn: 0.375, suctionOdIn: 0.875, lengthFt: 35, liftFt: 10, filterDrier: 'bi-flow' },
    electrical: { breakerAmps: 30, wireAwg: 10, wireMaterial: 'copper', supplyVoltage: 240, supplyPhase: 1 },
    serials: { outdoor: 'BJ2611A00001', indoorCoil: 'BJ2611C00002', airHandler: 'BJ2611H00003' },
    checklist: { 'filter-drier': { state: 'done' }, 'nitrogen-purge': { state: 'done' }, evacuation: { state: 'done' } },
  };
  const job = await createJob(ctx, { customerName: 'Bench Customer', siteAddress: '1 Bench Way', state: 'TX' }, tech.id);
  const record = await createSystem(ctx, job.id, body, tech.id);
  const charge = DEMO_CHARGE_READING;
  await addReading(
    ctx,
    record.id,
    {
      label: 'Evacuation',
      evacuation: { finalMicrons: 400, decayMicrons: 700, holdMinutes: 10 },
      pressureTest: { pressurePsig: 300, holdMinutes: 30, dropPsig: 0 },
    },
    tech.id,
  );
  await addReading(ctx, record.id, { label: 'Before adjustment', charge: { ...charge, liquidLineF: 98 } }, tech.id);
  await addReading(ctx, record.id, { label: 'After adjustment', charge }, tech.id);
  await saveAttachment(ctx, {
    jobId: job.id,
    systemId: record.id,
    kind: 'nameplate',
    fileName: 'outdoor.png',
    data: photo(),
    userId: tech.id,
  });
  return { ctx, dir, techId: tech.id, jobId: job.id, recordId: record.id, body };
}
