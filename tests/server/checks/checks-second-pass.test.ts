import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Finding } from '../../../shared/rules/types';
import { uploadImport } from '../../../server/imports/imports.service';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { coil410a, heatPump410a, inline } from './check-bodies';

let t: TestApp;
let airHandlerId = 0;

const auth = () => ({ Authorization: `Bearer ${t.tokenFor('tech')}` });
const post = (body: object) => request(t.app).post('/api/checks').set(auth()).send(body);

/**
 * An air handler imported with a blower table in the catalog CSV's compact column (invented figures,
 * shaped like published fan data), its heat kit's rated voltage and a leak sensor (Issue 12).
 */
beforeAll(async () => {
  t = await createTestApp();
  const csv =
    'model,kind,min_tons,max_tons,airflow_cfm,blower_table,refrigerants,heat_kit_kw,heat_kit_rated_voltage,leak_sensor\n' +
    'ZK-AH36,air-handler,2,3.5,1400,low:0.3=950/0.7=800;med:0.3=1150/0.7=1000;high:0.3=1400/0.7=1230,R-410A,10,230,yes\n';
  const result = await uploadImport(t.ctx, {
    buffer: Buffer.from(csv),
    fileName: 'air-handlers.csv',
    kind: 'air-handlers',
    dryRun: false,
    userId: t.users.admin.id,
  });
  expect(result).toBeDefined();
  const res = await request(t.app).get('/api/catalog/air-handlers').set(auth()).expect(200);
  airHandlerId = res.body.items[0].id;
  // A certificate directory row naming a model family (Issue 12 item 9)
  const combos = 'outdoor_model,indoor_model,seer2,eer2,hspf2,reference\nZT-HP3?-*,ZT-COIL-3*,15.1,12,7.9,FAMILY-ROW\n';
  await uploadImport(t.ctx, {
    buffer: Buffer.from(combos),
    fileName: 'rated.csv',
    kind: 'rated-combinations',
    dryRun: false,
    userId: t.users.admin.id,
  });
});
afterAll(async () => {
  await t.close();
});

describe('catalog air handler with a blower table (Issue 12 correction 1)', () => {
  it('when imported, then the catalog item carries the parsed table, the kit voltage and the sensor', async () => {
    const res = await request(t.app).get('/api/catalog/air-handlers').set(auth()).expect(200);
    expect(res.body.items[0]).toMatchObject({
      heatKitRatedVoltage: 230,
      leakSensor: true,
      blowerTable: [
        {
          tap: 'low',
          points: [
            { staticInWc: 0.3, cfm: 950 },
            { staticInWc: 0.7, cfm: 800 },
          ],
        },
        {
          tap: 'med',
          points: [
            { staticInWc: 0.3, cfm: 1150 },
            { staticInWc: 0.7, cfm: 1000 },
          ],
        },
        {
          tap: 'high',
          points: [
            { staticInWc: 0.3, cfm: 1400 },
            { staticInWc: 0.7, cfm: 1230 },
          ],
        },
      ],
    });
  });

  it('when the static is measured at 0.7 in. w.c., then the check names the high tap as the one inside the band', async () => {
    // 3 tons needs 1050–1350 CFM (350–450 CFM/ton, common practice (no source)); at 0.7: med 1000 (below), high 1230 (inside)
    const res = await post({
      scope: 'new-system',
      outdoor: inline(heatPump410a),
      indoorCoil: inline(coil410a),
      airHandler: { id: airHandlerId },
      site: { externalStaticInWc: 0.7 },
    }).expect(200);
    const [f] = res.body.findings.filter((x: Finding) => x.ruleId === 'airflow.per-ton');
    expect(f).toMatchObject({ severity: 'info', values: { tapsInBand: 'high' } });
  });

  it('when no static is given, then the rated 1400 CFM (467 CFM/ton) is a caution, not a blocker', async () => {
    const res = await post({
      scope: 'new-system',
      outdoor: inline(heatPump410a),
      indoorCoil: inline(coil410a),
      airHandler: { id: airHandlerId },
    }).expect(200);
    const severities = res.body.findings.filter((x: Finding) => x.ruleId === 'airflow.per-ton').map((x: Finding) => x.severity);
    expect(severities).toEqual(['caution', 'info']);
  });

  it('when the blower table text is malformed in a typed nameplate, then 422 says how it should read', async () => {
    const res = await post({
      scope: 'new-system',
      outdoor: inline(heatPump410a),
      airHandler: inline({ kind: 'air-handler', blowerTable: 'low 900' }),
    }).expect(422);
    expect(res.body.error.details[0]).toMatchObject({
      path: 'airHandler.spec.blowerTable',
      message: expect.stringContaining('tap:static=CFM'),
    });
  });
});

describe('rated combinations by model family (Issue 12 item 9)', () => {
  it('when a family row is imported, then a check of a member pairing finds it and names the row', async () => {
    const res = await post({
      scope: 'new-system',
      site: { state: 'FL' },
      outdoor: inline(heatPump410a),
      indoorCoil: inline(coil410a),
    }).expect(200);
    const rated = res.body.findings.find((f: Finding) => f.ruleId === 'rating.rated-combination');
    expect(rated.detail).toContain('(row ZT-HP3?-* with ZT-COIL-3*)');
    expect(res.body.findings.map((f: Finding) => f.ruleId)).not.toContain('rating.no-rated-combination');
  });

  it('when the models fall outside the family, then no rating is claimed', async () => {
    const res = await post({
      scope: 'new-system',
      outdoor: inline({ ...heatPump410a, model: 'ZT-HP48-T1' }),
      indoorCoil: inline(coil410a),
    }).expect(200);
    expect(res.body.findings.map((f: Finding) => f.ruleId)).toContain('rating.no-rated-combination');
  });
});

describe('electrical second-pass facts through the API (Issue 12 item 11)', () => {
  it('when the disconnect is not within sight and the cable is NM-B, then both findings come back', async () => {
    // NEC 440.14 (within sight); NM-B held to 60 °C (NEC 334.80): 10 AWG copper = 30 A < 35 A MCA (NEC Table 310.16)
    const res = await post({
      scope: 'new-system',
      outdoor: inline({ ...heatPump410a, mcaAmps: 35, mocpAmps: 50 }),
      electrical: {
        breakerAmps: 40,
        wireAwg: 10,
        wireMaterial: 'copper',
        terminalRatingC: 75,
        conductorType: 'nm-b',
        disconnect: { withinSight: false, ratingAmps: 60 },
      },
    }).expect(200);
    const blockers = res.body.findings.filter((f: Finding) => f.severity === 'blocker').map((f: Finding) => f.ruleId);
    expect(blockers).toEqual(expect.arrayContaining(['electrical.disconnect', 'electrical.wire-ampacity']));
  });

  it('when the conductor type is not a choice, then 422 in plain words', async () => {
    const res = await post({ scope: 'new-system', outdoor: inline(heatPump410a), electrical: { conductorType: 'romex' } }).expect(422);
    expect(res.body.error.details).toEqual([
      { path: 'electrical.conductorType', message: 'Choose the wire type: NM-B cable, UF-B cable, THHN in conduit or SE cable' },
    ]);
  });
});
