import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

const auth = (role: 'tech' | 'admin') => ({ Authorization: `Bearer ${t.tokenFor(role)}` });

// R-410A: dew 118.4 psig at 40 °F, bubble 318.5 psig at 100 °F (values.json PT-02). 100 − 92 = 8 °F subcooling.
const READINGS = {
  refrigerant: 'R-410A',
  meteringType: 'txv',
  suctionPsig: 118.4,
  suctionLineF: 50,
  liquidPsig: 318.5,
  liquidLineF: 92,
  outdoorDbF: 95,
};

describe('commissioning settings on Admin → Rules', () => {
  it('when nothing was saved, then the rules settings carry the start-up defaults', async () => {
    const res = await request(t.app).get('/api/settings/rules').set(auth('tech')).expect(200);
    // ±5 °F superheat, ±3 °F subcooling, 500 microns, under 1,000 microns in 10 minutes (values.json EV-01; common practice, no source)
    expect(res.body.settings).toMatchObject({
      superheatToleranceF: 5,
      subcoolingToleranceF: 3,
      evacuationTargetMicrons: 500,
      decayLimitMicrons: 1000,
      decayHoldMinutes: 10,
    });
  });

  it('when an admin narrows the subcooling margin to 1 °F, then 8 °F against a 10 °F target turns off target', async () => {
    // 8 °F is inside 10 ± 3 °F (the default margin)
    expect((await request(t.app).post('/api/commissioning/evaluate').set(auth('tech')).send(READINGS).expect(200)).body.verdict).toBe(
      'on-target',
    );
    const current = (await request(t.app).get('/api/settings/rules').set(auth('admin')).expect(200)).body;
    await request(t.app)
      .put('/api/settings/rules')
      .set(auth('admin'))
      .send({ settings: { ...current.settings, subcoolingToleranceF: 1 }, transitionRules: current.transitionRules })
      .expect(200);
    const after = await request(t.app).post('/api/commissioning/evaluate').set(auth('tech')).send(READINGS).expect(200);
    expect(after.body.verdict).toBe('off-target');
  });

  it('when a margin or limit is out of bounds, then 422 names it', async () => {
    const current = (await request(t.app).get('/api/settings/rules').set(auth('admin')).expect(200)).body;
    const put = (patch: object) =>
      request(t.app)
        .put('/api/settings/rules')
        .set(auth('admin'))
        .send({ settings: { ...current.settings, ...patch }, transitionRules: current.transitionRules });
    const cases: [object, string][] = [
      [{ superheatToleranceF: 0 }, 'settings.superheatToleranceF'],
      [{ subcoolingToleranceF: 50 }, 'settings.subcoolingToleranceF'],
      [{ evacuationTargetMicrons: 20000 }, 'settings.evacuationTargetMicrons'],
      [{ decayHoldMinutes: 0 }, 'settings.decayHoldMinutes'],
      [{ evacuationTargetMicrons: 800, decayLimitMicrons: 600 }, 'settings.decayLimitMicrons'], // the limit sits above the target
    ];
    for (const [patch, path] of cases) {
      const res = await put(patch).expect(422);
      expect(
        res.body.error.details.map((d: { path: string }) => d.path),
        JSON.stringify(patch),
      ).toContain(path);
    }
  });
});
