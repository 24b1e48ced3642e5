import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { DEFAULT_SHOP_SETTINGS } from '../../../shared/estimates/shop-defaults';
import type { Finding } from '../../../shared/rules/types';
import type { ShopRebateTier } from '../../../shared/schemas/options';
import { useTestApp } from '../../helpers/fixture-app';
import type { TestApp } from '../../helpers/test-app';

let t: TestApp;
useTestApp((app) => (t = app));

const auth = (role: 'tech' | 'estimator' | 'admin') => ({ Authorization: `Bearer ${t.tokenFor(role)}` });
const putShop = (rebateTiers: ShopRebateTier[]) =>
  request(t.app)
    .put('/api/settings/shop')
    .set(auth('admin'))
    .send({ ...DEFAULT_SHOP_SETTINGS, rebateTiers })
    .expect(200);
const rebateFindings = async (seer2: number) => {
  // An inline 3-ton heat pump rated SEER2 `seer2` / EER2 12 / HSPF2 8 (invented figures).
  const body = {
    scope: 'new-system',
    outdoor: { spec: { model: 'ZT-HP36-RB', systemType: 'heat-pump', refrigerant: 'R-410A', nominalTons: 3, seer2, eer2: 12, hspf2: 8 } },
  };
  const res = await request(t.app).post('/api/checks').set(auth('tech')).send(body).expect(200);
  return (res.body.findings as Finding[]).filter((f) => f.ruleId === 'efficiency.rebate-tier');
};

// Tier thresholds are invented shop figures (no source; not any real program).
const tierA: ShopRebateTier = { name: 'Shop tier A', seer2: 15, note: 'entry tier' };
const tierB: ShopRebateTier = { name: 'Shop tier B', seer2: 17, eer2: 12 };

describe('rebate tiers: one list (the shop settings) for checks and options', () => {
  it('when no tiers are set, then checks find nothing about rebates and the rule settings list none', async () => {
    expect(await rebateFindings(14)).toEqual([]);
    const rules = await request(t.app).get('/api/settings/rules').set(auth('tech')).expect(200);
    expect(rules.body.settings.rebateTiers).toEqual([]);
  });

  it('when an admin saves tiers on Pricing, then the rule settings carry them (without notes) and the next check uses them at once', async () => {
    await putShop([tierA, tierB]);
    const rules = await request(t.app).get('/api/settings/rules').set(auth('tech')).expect(200);
    expect(rules.body.settings.rebateTiers).toEqual([
      { name: 'Shop tier A', seer2: 15 },
      { name: 'Shop tier B', seer2: 17, eer2: 12 },
    ]);
    // 14 < 15 and < 17: short of both, meets none → two cautions.
    const none = await rebateFindings(14);
    expect(none.map((f) => [f.severity, f.values.tier])).toEqual([
      ['caution', 'Shop tier A'],
      ['caution', 'Shop tier B'],
    ]);
    // 16 meets A (15) but not B (17) → the shortfall is info and says which tier it meets.
    const some = await rebateFindings(16);
    expect(some.map((f) => [f.severity, f.values.tier])).toEqual([['info', 'Shop tier B']]);
    expect(some[0].title).toBe('Short of the Shop tier B rebate tier (meets Shop tier A): SEER2 16 is below 17');
    expect(await rebateFindings(17)).toEqual([]);
  });

  it('when the rule settings are saved with a tier in them, then it is not stored there: the shop list stays the one source', async () => {
    await putShop([tierB]);
    const current = (await request(t.app).get('/api/settings/rules').set(auth('admin')).expect(200)).body;
    const settings = {
      ...current.settings,
      rebateTiers: [{ name: 'Sneaked in', seer2: 30 }],
      rebateTier: { name: 'Old single', seer2: 30 },
    };
    const saved = await request(t.app)
      .put('/api/settings/rules')
      .set(auth('admin'))
      .send({ settings, transitionRules: current.transitionRules })
      .expect(200);
    expect(saved.body.settings.rebateTiers).toEqual([{ name: 'Shop tier B', seer2: 17, eer2: 12 }]);
    expect(saved.body.settings.rebateTier).toBeUndefined();
  });
});
