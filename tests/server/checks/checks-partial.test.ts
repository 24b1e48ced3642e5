import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Finding } from '../../../shared/rules/types';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { coil410a, heatPump410a, inline } from './check-bodies';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

const post = (body: object) =>
  request(t.app)
    .post('/api/checks')
    .set('Authorization', `Bearer ${t.tokenFor('tech')}`)
    .send(body);
const base = { scope: 'new-system', outdoor: inline(heatPump410a), indoorCoil: inline(coil410a) };
const byRule = (findings: Finding[], id: string) => findings.filter((f) => f.ruleId === id);

describe('POST /api/checks with partial facts (Issue 7 item 3)', () => {
  it('when the line set gives only its length, then 200 and the length and charge rules run, the size rules say what they lack', async () => {
    // The unit gives no oz/ft: the charge comes from liquid-full 3/8 in tube (ASTM B280 bore 0.311 in, R-410A 63.7 lb/ft³ at 90 °F, values.json LS-01/LS-02)
    const res = await post({ ...base, lineSet: { lengthFt: 40 } }).expect(200);
    const charge = byRule(res.body.findings, 'lineset.charge-adjustment');
    expect(charge).toHaveLength(1);
    expect(charge[0].values.liquidSizeAssumed).toBe(true);
    expect(res.body.coverage.notChecked).toContainEqual({ family: 'lineset', missing: 'installed liquid line size' });
    expect(res.body.coverage.notChecked).not.toContainEqual({ family: 'lineset', missing: 'line set length' });
  });

  it('when the line set gives only kept and R-22, then the oil caution is returned', async () => {
    // R-22 mineral oil into an R-410A POE system (retrofit practice, common practice (no source))
    const res = await post({ ...base, lineSet: { reused: true, previousRefrigerant: 'R-22' } }).expect(200);
    expect(byRule(res.body.findings, 'refrigerant.oil-compatibility').map((f: Finding) => f.severity)).toEqual(['caution']);
  });

  it('when the electrical block gives only a 40 A breaker, then the breaker is checked against the 35 A MOCP', async () => {
    // 40 A > MOCP 35 A (NEC 440.22(A), values.json EL-05)
    const res = await post({ ...base, electrical: { breakerAmps: 40 } }).expect(200);
    const [f] = byRule(res.body.findings, 'electrical.breaker-over-mocp');
    expect(f).toMatchObject({ severity: 'blocker', title: 'Breaker 40 A is above the 35 A maximum' });
    expect(res.body.coverage.notChecked).toContainEqual({ family: 'electrical', missing: 'wire size and material' });
  });

  it('when the site gives no state, then 200 and coverage says the site state is missing', async () => {
    const res = await post({ ...base, site: { indoorLocation: 'closet' } }).expect(200);
    expect(res.body.coverage.notChecked).toContainEqual({ family: 'efficiency', missing: 'site state' });
  });

  it('when the wire material is not a choice, then 422 says so in plain words beside the field', async () => {
    const res = await post({ ...base, electrical: { breakerAmps: 30, wireMaterial: 'tin' } }).expect(422);
    expect(res.body.error.details).toEqual([{ path: 'electrical.wireMaterial', message: 'Choose copper or aluminum' }]);
  });

  it('when the line length is zero, then 422 names the field and its range', async () => {
    const res = await post({ ...base, lineSet: { lengthFt: 0 } }).expect(422);
    expect(res.body.error.details).toEqual([{ path: 'lineSet.lengthFt', message: 'Line length must be a number from 1 to 500 ft' }]);
  });
});
