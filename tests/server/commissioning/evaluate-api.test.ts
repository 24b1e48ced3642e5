import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { R410A_TXV_ON_TARGET } from '../../helpers/charge-readings';
import { createTestApp, type TestApp } from '../../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

const auth = (role: 'tech' | 'estimator' | 'admin' = 'tech') => ({ Authorization: `Bearer ${t.tokenFor(role)}` });
const evaluate = (body: object, role: 'tech' | 'estimator' | 'admin' = 'tech') =>
  request(t.app).post('/api/commissioning/evaluate').set(auth(role)).send(body);
const paths = (res: request.Response) => (res.body.error.details as { path: string }[]).map((d) => d.path);

// Right on target (tests/helpers/charge-readings.ts: dew 40 °F at 118.4 psig, bubble 100 °F at 318.5 psig, values.json PT-02).
const TXV_READINGS = { ...R410A_TXV_ON_TARGET, outdoorDbF: 95, targetSubcoolingF: 10 };

describe('POST /api/commissioning/evaluate', () => {
  it('when a TXV system reads 10 °F subcooling against a 10 °F target, then the contract shape with on-target', async () => {
    for (const role of ['tech', 'estimator', 'admin'] as const) {
      const res = await evaluate(TXV_READINGS, role).expect(200);
      expect(res.body).toMatchObject({
        superheatF: expect.any(Number),
        subcoolingF: expect.any(Number),
        suctionSatF: expect.any(Number),
        liquidSatF: expect.any(Number),
        targetSubcoolingF: 10,
        verdict: 'on-target',
        advice: expect.any(String),
      });
      // Superheat = 50 − 40 and subcooling = 100 − 90 (definitions, DESIGN §4; saturation from PT-02), ± 1 °F
      expect(Math.abs(res.body.suctionSatF - 40)).toBeLessThanOrEqual(1);
      expect(Math.abs(res.body.liquidSatF - 100)).toBeLessThanOrEqual(1);
      expect(Math.abs(res.body.superheatF - 10)).toBeLessThanOrEqual(1);
      expect(Math.abs(res.body.subcoolingF - 10)).toBeLessThanOrEqual(1);
    }
  });

  it('when the subcooling is 6 °F under its target, then off-target with advice that names the numbers', async () => {
    // 100 − 96 = 4 °F subcooling against 10 ± 3 °F (shop default band, common practice, no source)
    const res = await evaluate({ ...TXV_READINGS, liquidLineF: 96 }).expect(200);
    expect(res.body.verdict).toBe('off-target');
    expect(res.body.advice).toMatch(/\d/);
  });

  it('when the unit gives no target subcooling, then the shop default is used', async () => {
    const { targetSubcoolingF: _omit, ...body } = TXV_READINGS;
    const res = await evaluate(body).expect(200);
    // 10 °F: the shared default target subcooling (common practice, no source)
    expect(res.body.targetSubcoolingF).toBe(10);
  });

  it('when a fixed orifice reads against 67 °F WB / 95 °F DB, then the target superheat is 13 °F', async () => {
    // target SH = (3 × 67 − 80 − 95) / 2 = 13 °F (values.json CM-05, trade rule of thumb)
    const res = await evaluate({ ...TXV_READINGS, meteringType: 'piston', indoorWbF: 67, suctionLineF: 53 }).expect(200);
    expect(Math.abs(res.body.targetSuperheatF - 13)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(res.body.superheatF - 13)).toBeLessThanOrEqual(1);
    expect(res.body.verdict).toBe('on-target');
  });

  it('when the reading is taken in heating mode, then it is not evaluated and the advice says so', async () => {
    const res = await evaluate({ ...TXV_READINGS, mode: 'heating' }).expect(200);
    expect(res.body.verdict).toBe('not-evaluated');
    expect(res.body.advice.toLowerCase()).toContain('heating');
  });

  it('when the refrigerant is written R410A, then it is read as R-410A', async () => {
    const res = await evaluate({ ...TXV_READINGS, refrigerant: 'R410A' }).expect(200);
    expect(Math.abs(res.body.suctionSatF - 40)).toBeLessThanOrEqual(1); // values.json PT-02
  });

  it('when the input is bad, then 422 names the field', async () => {
    const { liquidLineF: _missing, ...withoutLiquidLine } = TXV_READINGS;
    const cases: [object, string][] = [
      [{ ...TXV_READINGS, refrigerant: 'R-999' }, 'refrigerant'],
      [{ ...TXV_READINGS, suctionPsig: -20 }, 'suctionPsig'], // below zero absolute
      [{ ...TXV_READINGS, liquidPsig: 800 }, 'liquidPsig'], // above R-410A's critical pressure (about 711 psia, from memory)
      [{ ...TXV_READINGS, suctionPsig: 'high' }, 'suctionPsig'],
      [withoutLiquidLine, 'liquidLineF'],
      [{ ...TXV_READINGS, meteringType: 'capillary' }, 'meteringType'],
      [{ ...TXV_READINGS, extra: 1 }, ''],
    ];
    for (const [body, field] of cases) {
      const res = await evaluate(body);
      expect(res.status, JSON.stringify(body)).toBe(422);
      expect(res.body.error.code).toBe('validation-failed');
      if (field) expect(paths(res), JSON.stringify(body)).toContain(field);
    }
  });

  it('when no token is sent, then 401', async () => {
    await request(t.app).post('/api/commissioning/evaluate').send(TXV_READINGS).expect(401);
  });
});
