import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Finding } from '../../../shared/rules/types';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { airHandler1200, coil410a, heatPump410a, inline, r22TxvCoil } from './check-bodies';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

const post = (body: object, role: 'tech' | 'estimator' | 'admin' = 'tech') =>
  request(t.app).post('/api/checks').set('Authorization', `Bearer ${t.tokenFor(role)}`).send(body);
const ruleIds = (findings: Finding[], severity?: Finding['severity']) =>
  findings.filter((f) => !severity || f.severity === severity).map((f) => f.ruleId);

describe('POST /api/checks', () => {
  it('when an R-410A heat pump meets a kept coil whose factory TXV is for R-22, then the answer is incompatible with a metering-device blocker', async () => {
    const res = await post({ scope: 'component-replacement', outdoor: inline(heatPump410a), indoorCoil: inline(r22TxvCoil, true) }).expect(200);
    expect(Object.keys(res.body).sort()).toEqual(['computed', 'coverage', 'findings', 'rulesVersion', 'verdict']);
    expect(res.body.verdict).toBe('incompatible');
    expect(res.body.rulesVersion).toMatch(/^\d{4}\.\d+\.\d+$/);
    // A TXV set for R-22 does not meter R-410A (DESIGN.md §3 refrigerant.metering-device; common practice: fit a valve for the system's refrigerant)
    const blocker = res.body.findings.find((f: Finding) => f.ruleId === 'refrigerant.metering-device');
    expect(blocker).toMatchObject({ severity: 'blocker' });
    expect(blocker.fix).not.toBe('');
    expect(blocker.basis).toEqual({ kind: expect.any(String), citation: expect.any(String) });
    expect(res.body.coverage).toEqual({ ran: expect.any(Array), notChecked: expect.any(Array) });
  });

  it('when the same heat pump meets a coil listed for R-410A with its own TXV, then no refrigerant blocker is found', async () => {
    const res = await post({ scope: 'new-system', outdoor: inline(heatPump410a), indoorCoil: inline(coil410a) }).expect(200);
    expect(ruleIds(res.body.findings, 'blocker')).not.toContain('refrigerant.metering-device');
    expect(ruleIds(res.body.findings, 'blocker')).not.toContain('refrigerant.coil-listing');
  });

  it('when the outdoor unit has MCA 21.2 A and MOCP 35 A and the breaker is 40 A, then breaker-over-mocp is a blocker and the computed range lists 25, 30, 35', async () => {
    const res = await post({
      scope: 'new-system',
      outdoor: inline(heatPump410a),
      indoorCoil: inline(coil410a),
      // 40 A > MOCP 35 A (NEC 440.22(A), values.json EL-05); 8 AWG copper is 40 A at 60 °C (NEC Table 310.16, values.json EL-01)
      electrical: { breakerAmps: 40, wireAwg: 8, wireMaterial: 'copper' },
    }).expect(200);
    expect(ruleIds(res.body.findings, 'blocker')).toContain('electrical.breaker-over-mocp');
    // Standard ratings 25, 30, 35 A lie within 21.2..35 A (NEC 240.6(A), values.json EL-03)
    expect(res.body.computed.breakerRange).toEqual({ mcaAmps: 21.2, mocpAmps: 35, standardSizes: [25, 30, 35] });
  });

  it('when no electrical facts are given, then coverage says electrical was not checked (no silent pass)', async () => {
    const res = await post({ scope: 'new-system', outdoor: inline(heatPump410a), indoorCoil: inline(coil410a) }).expect(200);
    const families = res.body.coverage.notChecked.map((n: { family: string }) => n.family);
    expect(families).toContain('electrical');
    const note = res.body.coverage.notChecked.find((n: { family: string }) => n.family === 'electrical');
    expect(note.missing).toMatch(/breaker|electrical/i);
  });

  it('when the air handler moves 1200 CFM for 3 tons, then CFM per ton is 400 and computed says so', async () => {
    const res = await post({ scope: 'new-system', outdoor: inline(heatPump410a), indoorCoil: inline(coil410a), airHandler: inline(airHandler1200) }).expect(200);
    // 1200 CFM / 3 tons = 400 CFM/ton (arithmetic; band 350–450 is common practice, no source)
    expect(res.body.computed.cfmPerTon).toBe(400);
    expect(ruleIds(res.body.findings)).not.toContain('airflow.per-ton');
  });

  it('when a tech, an estimator and an admin check, then each gets 200; when signed out, then 401', async () => {
    const body = { scope: 'new-system', outdoor: inline(heatPump410a) };
    for (const role of ['tech', 'estimator', 'admin'] as const) await post(body, role).expect(200);
    await request(t.app).post('/api/checks').send(body).expect(401);
  });
});

describe('POST /api/checks validation', () => {
  const paths = (res: request.Response) => res.body.error.details.map((d: { path: string }) => d.path);

  it('when the refrigerant is not a known one, then 422 names outdoor.spec.refrigerant and lists what is allowed', async () => {
    const res = await post({ scope: 'new-system', outdoor: inline({ ...heatPump410a, refrigerant: 'R-12' }) }).expect(422);
    expect(paths(res)).toEqual(['outdoor.spec.refrigerant']);
    expect(res.body.error.details[0].message).toContain('R-410A');
  });

  it('when the tons are out of range, then 422 names the field', async () => {
    // 0.5–25 tons is the spec schema's range (shared/schemas/fields.ts)
    const res = await post({ scope: 'new-system', outdoor: inline({ ...heatPump410a, nominalTons: 40 }) }).expect(422);
    expect(paths(res)).toEqual(['outdoor.spec.nominalTons']);
  });

  it('when the wire size is not an AWG size, then 422 names electrical.wireAwg', async () => {
    const res = await post({ scope: 'new-system', outdoor: inline(heatPump410a), electrical: { breakerAmps: 30, wireAwg: 11, wireMaterial: 'copper' } }).expect(422);
    expect(paths(res)).toEqual(['electrical.wireAwg']);
    expect(res.body.error.details[0].message).toContain('1/0');
  });

  it('when a part has both an id and a spec, then 422 says to give one', async () => {
    const res = await post({ scope: 'new-system', outdoor: { id: 1, spec: heatPump410a } }).expect(422);
    expect(paths(res)).toEqual(['outdoor']);
    expect(res.body.error.details[0].message).toMatch(/either id .* or spec/);
  });

  it('when the scope is missing, then 422 names scope', async () => {
    const res = await post({ outdoor: inline(heatPump410a) }).expect(422);
    expect(paths(res)).toContain('scope');
  });
});
