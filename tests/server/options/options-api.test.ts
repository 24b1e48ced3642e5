import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_SHOP_SETTINGS } from '../../../shared/estimates/shop-defaults';
import type { OptionView } from '../../../shared/schemas/options';
import { uploadImport } from '../../../server/imports/imports.service';
import { useFixtureApp } from '../../helpers/fixture-app';
import type { TestApp } from '../../helpers/test-app';
import { authFor, type Fixture } from '../systems/system-fixtures';

let t: TestApp, f: Fixture;
useFixtureApp((app, fixture) => ([t, f] = [app, fixture]));
beforeAll(async () => {
  // Two invented tiers (not any real program): the shop's list, which the options judge each option against.
  const rebateTiers = [
    { name: 'Demo tier 1 (invented)', seer2: 15.2, eer2: 11 },
    { name: 'Demo tier 2 (invented)', seer2: 17, hspf2: 8.5 },
  ];
  await request(t.app)
    .put('/api/settings/shop')
    .set(authFor(t, 'admin'))
    .send({ ...DEFAULT_SHOP_SETTINGS, rebateTiers })
    .expect(200);
});

const est = () => authFor(t, 'estimator');
const newJob = async () =>
  (
    await request(t.app)
      .post('/api/jobs')
      .set(est())
      .send({ customerName: 'Ines Marlow', siteAddress: '12 Fern Row', state: 'GA' })
      .expect(201)
  ).body.id as number;

/** An option on the fixture's heat pump and coil with an invented air handler (1200 CFM on 3 tons = 400 CFM/ton, common practice (no source)). */
const optionBody = (over: object = {}) => ({
  name: 'Heat pump and new coil',
  outdoor: { id: f.outdoorId },
  indoorCoil: { id: f.coilId },
  airHandler: { spec: { model: 'QX-AH-12', kind: 'air-handler', minTons: 2, maxTons: 4, airflowCfm: 1200 }, kept: true },
  lines: [
    { kind: 'line-set', description: 'Line set 3/8 × 7/8', quantity: 25, unitPriceCents: 450 },
    { kind: 'fee', description: 'Permit', quantity: 1, unitPriceCents: 7500 },
  ],
  laborHours: 6,
  laborRateCents: 9500,
  markupPct: 35,
  taxRatePct: 7,
  ...over,
});
const create = async (jobId: number, over: object = {}) =>
  (await request(t.app).post(`/api/jobs/${jobId}/options`).set(est()).send(optionBody(over)).expect(201)).body as OptionView;

describe('options: roles and errors', () => {
  it('when a tech lists or adds options, then 403; with no token, 401', async () => {
    await request(t.app).get(`/api/jobs/${f.jobId}/options`).set(authFor(t, 'tech')).expect(403);
    await request(t.app).post(`/api/jobs/${f.jobId}/options`).set(authFor(t, 'tech')).send(optionBody()).expect(403);
    await request(t.app).get(`/api/jobs/${f.jobId}/options`).expect(401);
  });
  it('when a tech reads the job itself, then it still answers 200', async () => {
    await request(t.app).get(`/api/jobs/${f.jobId}`).set(authFor(t, 'tech')).expect(200);
  });
  it('when the job or the option does not exist, then 404', async () => {
    await request(t.app).get('/api/jobs/987654/options').set(est()).expect(404);
    await request(t.app).get('/api/options/987654').set(est()).expect(404);
  });
  it('when the body names an unknown part or gives both a markup and a margin, then 422', async () => {
    const jobId = await newJob();
    await request(t.app)
      .post(`/api/jobs/${jobId}/options`)
      .set(est())
      .send(optionBody({ outdoor: { id: 987654 } }))
      .expect(422);
    const res = await request(t.app)
      .post(`/api/jobs/${jobId}/options`)
      .set(est())
      .send(optionBody({ targetMarginPct: 30 }))
      .expect(422);
    expect(res.body.error.code).toBe('validation-failed');
  });
  it('when the energy parameters are not numbers in range or the id is not canonical, then 400', async () => {
    await request(t.app).get(`/api/jobs/${f.jobId}/options`).query({ existingSeer2: 'abc' }).set(est()).expect(400);
    await request(t.app).get(`/api/jobs/${f.jobId}/options`).query({ centsPerKwh: -1 }).set(est()).expect(400);
    await request(t.app).get(`/api/jobs/${f.jobId}/options`).query({ existingHeatPump: 'maybe' }).set(est()).expect(400);
    await request(t.app).get('/api/jobs/0x1/options').set(est()).expect(400);
  });
  it('when a line has no price and its model is on no price list, then 422 naming the line', async () => {
    const jobId = await newJob();
    const res = await request(t.app)
      .post(`/api/jobs/${jobId}/options`)
      .set(est())
      .send(optionBody({ lines: [{ kind: 'pad', model: 'NO-SUCH-PAD', quantity: 1 }] }))
      .expect(422);
    expect(JSON.stringify(res.body.error.details)).toContain('lines.0.unitPriceCents');
  });
});

describe('options: contract, price and figures', () => {
  it('when an estimator saves an option, then equipment lines come from the best current price and the customer price is computed', async () => {
    const jobId = await newJob();
    const o = await create(jobId);
    expect(o).toMatchObject({ jobId, name: 'Heat pump and new coil', revision: 1, chosen: false, systemType: 'heat-pump' });
    // Best prices from the fixture: outdoor $3,100 at Wexmoor (cheaper than Tarn; the 2099 row is future), coil $900 at Tarn.
    expect(o.lines.map((l) => [l.kind, l.unitPriceCents, l.priceSource, l.distributor ?? null])).toEqual([
      ['outdoor-unit', 310000, 'price-list', 'Wexmoor Parts'],
      ['indoor-coil', 90000, 'price-list', 'Tarn Supply'],
      ['line-set', 450, 'typed', null],
      ['fee', 7500, 'typed', null],
    ]);
    expect(o.lines.every((l) => l.currentPriceDiffers === false)).toBe(true);
    // By hand: taxable 411,250 × 1.35 = 555,187.5 → 555,188; fee 7,500 × 1.35 = 10,125; labor 6 × 9,500 × 1.35 = 76,950;
    // subtotal 642,263; tax 7 % of 555,188 = 38,863.16 → 38,863; total 681,126 cents.
    expect(o.price).toMatchObject({
      materialCostCents: 418750,
      laborCostCents: 57000,
      subtotalCents: 642263,
      taxCents: 38863,
      totalCents: 681126,
    });
    expect(o.check.verdict).not.toBe('incompatible');
    expect(o.efficiency).toMatchObject({ source: 'rated-combination', seer2: 15.2, eer2: 11.7, hspf2: 7.8, coolingBtuh: 35000 });
    // GA is in the Southeast; split heat pumps: 14.3 SEER2 / 7.5 HSPF2 (10 CFR 430.32(c)).
    expect(o.regional).toMatchObject({ state: 'GA', meets: true, minimum: { seer2: 14.3, hspf2: 7.5 } });
    // The shop's tiers (set in beforeAll, invented): tier 1 needs 15.2 SEER2 / 11 EER2 → met; tier 2 needs 17 SEER2 / 8.5 HSPF2 → not met.
    expect(o.rebateTiers.map((r) => r.met)).toEqual([true, false]);
    expect(o.rebateTiers[1].missing[0]).toContain('SEER2 17 needed, has 15.2');
  });

  it('when the existing SEER2/HSPF2 are given, then energy and payback follow kWh = Btu/h × h ÷ (rating × 1000)', async () => {
    const jobId = await newJob();
    const { id } = await create(jobId);
    const res = await request(t.app)
      .get(`/api/jobs/${jobId}/options`)
      .query({ existingSeer2: 10, existingHspf2: 6.8 })
      .set(est())
      .expect(200);
    expect(res.body).toMatchObject({ chosenOptionId: null });
    const e = (res.body.items as OptionView[]).find((o) => o.id === id)!.energy;
    // By hand, 35,000 Btu/h, 1,000 h each season, 15 ¢/kWh (shop defaults): cooling 3,500 vs 2,302.6 kWh → 52,500 − 34,539 cents;
    // heating 5,147.1 vs 4,487.2 kWh → 77,206 − 67,308 cents; saving 27,859 cents; payback 681,126 / 27,859 = 24.4 years.
    expect(e.cooling).toMatchObject({ existingKwh: 3500, newKwh: 2302.6, existingCostCents: 52500, newCostCents: 34539 });
    expect(e.heating).toMatchObject({ existingCostCents: 77206, newCostCents: 67308 });
    expect(e.annualSavingCents).toBe(27859);
    expect(e.paybackYears).toBe(24.4);
    expect(e.existing.basis).toBe('given');
  });

  it('when only the existing age is given, then the estimate is stated as an assumption', async () => {
    const jobId = await newJob();
    const { id } = await create(jobId);
    const res = await request(t.app).get(`/api/options/${id}`).query({ existingAgeYears: 18 }).set(est()).expect(200);
    expect(res.body.energy.existing.basis).toBe('estimated-from-age');
    expect(res.body.energy.assumptions.join(' ')).toMatch(/estimated from its age \(18 years/);
  });

  it('when a fourth option is added to a job, then 409 with a clear message', async () => {
    const jobId = await newJob();
    for (const name of ['First', 'Second', 'Third']) await create(jobId, { name });
    const res = await request(t.app)
      .post(`/api/jobs/${jobId}/options`)
      .set(est())
      .send(optionBody({ name: 'Fourth' }))
      .expect(409);
    expect(res.body.error).toMatchObject({ code: 'option-limit' });
    expect(res.body.error.message).toContain('at most 3 options');
  });
});

describe('options: revisions, snapshot, choice and record', () => {
  it('when a PATCH carries a stale revision, then 409; with the current one, then revision 2', async () => {
    const jobId = await newJob();
    const o = await create(jobId);
    const ok = await request(t.app)
      .patch(`/api/options/${o.id}`)
      .set(est())
      .send({ revision: 1, name: 'Renamed', laborHours: 8 })
      .expect(200);
    expect(ok.body).toMatchObject({ revision: 2, name: 'Renamed', laborHours: 8 });
    const stale = await request(t.app).patch(`/api/options/${o.id}`).set(est()).send({ revision: 1, name: 'Late' }).expect(409);
    expect(stale.body.error).toMatchObject({ code: 'conflict', details: { revision: 2 } });
  });

  it('when a later price list lowers the outdoor unit, then the saved option keeps its snapshot, flags the difference, and re-prices on request', async () => {
    const jobId = await newJob();
    const o = await create(jobId);
    await uploadImport(t.ctx, {
      buffer: Buffer.from('model,price,effective_from\nQX-HP36-B,2900.00,2025-06-01\n'),
      fileName: 'prices.csv',
      kind: 'prices',
      distributor: 'Tarn Supply',
      dryRun: false,
      userId: t.users.admin.id,
    });
    const after = (await request(t.app).get(`/api/options/${o.id}`).set(est()).expect(200)).body as OptionView;
    const outdoor = after.lines.find((l) => l.kind === 'outdoor-unit')!;
    expect(outdoor).toMatchObject({
      unitPriceCents: 310000,
      currentPriceDiffers: true,
      currentPrice: { priceCents: 290000, distributor: 'Tarn Supply' },
    });
    expect(after.price.totalCents).toBe(o.price.totalCents);
    expect(after.lines.find((l) => l.kind === 'indoor-coil')!.currentPriceDiffers).toBe(false);
    // Lines sent back as the view showed them keep their snapshot.
    const resent = await request(t.app).patch(`/api/options/${o.id}`).set(est()).send({ revision: 1, lines: after.lines }).expect(200);
    expect(resent.body.lines.find((l: { kind: string }) => l.kind === 'outdoor-unit')).toMatchObject({
      unitPriceCents: 310000,
      currentPriceDiffers: true,
    });
    const repriced = (await request(t.app).patch(`/api/options/${o.id}`).set(est()).send({ revision: 2, reprice: true }).expect(200))
      .body as OptionView;
    expect(repriced.lines.find((l) => l.kind === 'outdoor-unit')).toMatchObject({ unitPriceCents: 290000, currentPriceDiffers: false });
    // Typed lines are never re-priced.
    expect(repriced.lines.find((l) => l.kind === 'line-set')).toMatchObject({ unitPriceCents: 450, priceSource: 'typed' });
  });

  it('when an option is not chosen, then make-record is 409; once chosen, it makes a draft record whose check matches', async () => {
    const jobId = await newJob();
    const a = await create(jobId, { name: 'A' });
    const b = await create(jobId, { name: 'B' });
    await request(t.app).post(`/api/options/${a.id}/make-record`).set(est()).expect(409);
    await request(t.app).post(`/api/options/${a.id}/choose`).set(est()).expect(200);
    const chose = await request(t.app).post(`/api/options/${b.id}/choose`).set(est()).expect(200);
    expect(chose.body.chosenOptionId).toBe(b.id);
    const list = await request(t.app).get(`/api/jobs/${jobId}/options`).set(est()).expect(200);
    expect(list.body.chosenOptionId).toBe(b.id);
    expect((list.body.items as OptionView[]).map((o) => o.chosen)).toEqual([false, true]);
    const made = await request(t.app).post(`/api/options/${b.id}/make-record`).set(est()).expect(201);
    expect(made.body).toMatchObject({ status: 'draft', revision: 1 });
    expect(made.body.check.verdict).toBe(b.check.verdict);
    expect(made.body.check.findings.map((x: { ruleId: string }) => x.ruleId).sort()).toEqual(b.check.findings.map((x) => x.ruleId).sort());
    const systems = await request(t.app).get(`/api/jobs/${jobId}/systems`).set(authFor(t, 'tech')).expect(200);
    expect(systems.body.items).toHaveLength(1);
  });

  it('when an option is deleted, then it is gone and a new one fits under the limit', async () => {
    const jobId = await newJob();
    const o = await create(jobId);
    await request(t.app).delete(`/api/options/${o.id}`).set(est()).expect(204);
    await request(t.app).get(`/api/options/${o.id}`).set(est()).expect(404);
  });
});

describe('repair or replace and shop settings', () => {
  it('when a 12-year-old R-22 system needs $850 and 4 lb at $90, then 12 × 1,210 = 14,520 > 5,000 recommends replacing, with the arithmetic', async () => {
    const jobId = await newJob();
    await create(jobId);
    const res = await request(t.app)
      .post(`/api/jobs/${jobId}/repair-or-replace`)
      .set(est())
      .send({ ageYears: 12, repairQuoteCents: 85000, refrigerant: 'R-22', refrigerantLbs: 4, refrigerantCentsPerLb: 9000 })
      .expect(200);
    // Age × repair dollars against 5,000: common practice (no source).
    expect(res.body).toMatchObject({ refrigerantCostCents: 36000, repairTotalCents: 121000, recommendation: 'replace' });
    expect(res.body.ruleOfThumb).toMatchObject({ product: 14520, threshold: 5000, exceeds: true, basis: 'common practice (no source)' });
    expect(res.body.options).toHaveLength(1);
    expect(res.body.arithmetic.join(' ')).toContain('12 years × 1,210 dollars = 14,520');
    await request(t.app)
      .post(`/api/jobs/${jobId}/repair-or-replace`)
      .set(authFor(t, 'tech'))
      .send({ ageYears: 1, repairQuoteCents: 1 })
      .expect(403);
  });

  it('when an admin raises the threshold, then the same repair reads differently; an estimator may read but not save', async () => {
    const got = await request(t.app).get('/api/settings/shop').set(est()).expect(200);
    expect(got.body.settings.repairReplaceThreshold).toBe(5000);
    await request(t.app).put('/api/settings/shop').set(est()).send(got.body.settings).expect(403);
    await request(t.app).get('/api/settings/shop').set(authFor(t, 'tech')).expect(403);
    await request(t.app)
      .put('/api/settings/shop')
      .set(authFor(t, 'admin'))
      .send({ ...got.body.settings, repairReplaceThreshold: 20000 })
      .expect(200);
    const jobId = await newJob();
    const res = await request(t.app)
      .post(`/api/jobs/${jobId}/repair-or-replace`)
      .set(est())
      .send({ ageYears: 12, repairQuoteCents: 121000 })
      .expect(200);
    expect(res.body.recommendation).toBe('repair'); // 14,520 < 0.8 × 20,000
    await request(t.app).put('/api/settings/shop').set(authFor(t, 'admin')).send(got.body.settings).expect(200);
    await request(t.app)
      .put('/api/settings/shop')
      .set(authFor(t, 'admin'))
      .send({ ...got.body.settings, pricing: 'cheap' })
      .expect(422);
  });
});

describe('options: shop terms are copied in when saved', () => {
  it('when an option takes the shop defaults and the shop later raises its markup, then the saved price does not move', async () => {
    const jobId = await newJob();
    const o = await create(jobId, { markupPct: undefined, laborRateCents: undefined, taxRatePct: undefined });
    // Shop defaults (shared/estimates/shop-defaults.ts): 35 % markup, $95/h labor, 0 % tax.
    expect(o).toMatchObject({ markupPct: 35, laborRateCents: 9500, taxRatePct: 0 });
    const got = await request(t.app).get('/api/settings/shop').set(est()).expect(200);
    await request(t.app)
      .put('/api/settings/shop')
      .set(authFor(t, 'admin'))
      .send({ ...got.body.settings, markupPct: 50, laborRateCents: 12000 })
      .expect(200);
    try {
      const after = (await request(t.app).get(`/api/options/${o.id}`).set(est()).expect(200)).body as OptionView;
      expect(after.price.totalCents).toBe(o.price.totalCents);
      const fresh = await create(jobId, { markupPct: undefined, laborRateCents: undefined });
      expect(fresh).toMatchObject({ markupPct: 50, laborRateCents: 12000 });
    } finally {
      await request(t.app).put('/api/settings/shop').set(authFor(t, 'admin')).send(got.body.settings).expect(200);
    }
  });
});
