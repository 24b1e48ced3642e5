import request from 'supertest';
import { describe, expect, it } from 'vitest';
import type { Finding, TransitionRule } from '../../../shared/rules/types';
import { useTestApp } from '../../helpers/fixture-app';
import type { TestApp } from '../../helpers/test-app';

let t: TestApp;
useTestApp((app) => (t = app));

const auth = (role: 'tech' | 'estimator' | 'admin') => ({ Authorization: `Bearer ${t.tokenFor(role)}` });
const getRules = (role: 'tech' | 'estimator' | 'admin' = 'tech') => request(t.app).get('/api/settings/rules').set(auth(role));
const putRules = (body: object, role: 'tech' | 'estimator' | 'admin' = 'admin') => request(t.app).put('/api/settings/rules').set(auth(role)).send(body);

describe('GET /api/settings/rules', () => {
  it('when nothing was saved, then every role reads the shared defaults and the seeded transition rules', async () => {
    for (const role of ['tech', 'estimator', 'admin'] as const) {
      const res = await getRules(role).expect(200);
      // 350–450 CFM/ton and 10 °F subcooling: the shared defaults (common practice, no source)
      expect(res.body.settings).toMatchObject({ cfmPerTonMin: 350, cfmPerTonMax: 450, defaultTargetSubcoolingF: 10 });
      expect(res.body.defaults).toEqual(res.body.settings);
      expect(res.body.updatedAt).toBeNull();
      // R-22 in new systems banned from 2010-01-01: EPA 74 FR 66450, 40 CFR 82 Subpart I (values.json REG-01)
      expect(res.body.transitionRules.find((r: TransitionRule) => r.refrigerants.includes('R-22') && r.scope === 'new-system')).toMatchObject({
        installFrom: '2010-01-01',
        severity: 'blocker',
      });
    }
    await request(t.app).get('/api/settings/rules').expect(401);
  });
});

describe('PUT /api/settings/rules', () => {
  it('when a tech or an estimator saves, then 403', async () => {
    const current = (await getRules()).body;
    await putRules({ settings: current.settings, transitionRules: current.transitionRules }, 'tech').expect(403);
    await putRules({ settings: current.settings, transitionRules: current.transitionRules }, 'estimator').expect(403);
  });

  it('when the band is upside down or a date is malformed, then 422 with the field paths', async () => {
    const current = (await getRules()).body;
    const bad = await putRules({ settings: { ...current.settings, cfmPerTonMin: 450, cfmPerTonMax: 400 }, transitionRules: current.transitionRules }).expect(422);
    expect(bad.body.error.details.map((d: { path: string }) => d.path)).toContain('settings.cfmPerTonMax');
    const rules = current.transitionRules.map((r: TransitionRule, i: number) => (i === 0 ? { ...r, installFrom: '1/1/2010' } : r));
    const badDate = await putRules({ settings: current.settings, transitionRules: rules }).expect(422);
    expect(badDate.body.error.details.map((d: { path: string }) => d.path)).toEqual(['transitionRules.0.installFrom']);
  });

  it('when an admin saves a changed note, then every role reads it back', async () => {
    const current = (await getRules()).body;
    const rules = current.transitionRules.map((r: TransitionRule, i: number) => (i === 0 ? { ...r, note: 'Office note: checked 2026.' } : r));
    const saved = await putRules({ settings: current.settings, transitionRules: rules }).expect(200);
    expect(saved.body.updatedAt).toEqual(expect.any(String));
    const read = await getRules('tech').expect(200);
    expect(read.body.transitionRules[0].note).toBe('Office note: checked 2026.');
    expect(read.body.transitionRules).toHaveLength(current.transitionRules.length);
  });

  it('when an admin moves a transition date earlier, then a check on an install date before the published one is now not allowed', async () => {
    const body = {
      scope: 'new-system',
      // A new R-410A split system installed 2024-06-01: before the 40 CFR 84.54 GWP-700 date of 2025-01-01 (values.json REG-03)
      installDate: '2024-06-01',
      outdoor: { spec: { model: 'ZS-HP30', systemType: 'heat-pump', refrigerant: 'R-410A', nominalTons: 2.5 } },
    };
    const regulationBlockers = (findings: Finding[]) => findings.filter((f) => f.ruleId === 'regulation.refrigerant-transition' && f.severity === 'blocker');
    const before = await request(t.app).post('/api/checks').set(auth('tech')).send(body).expect(200);
    expect(regulationBlockers(before.body.findings)).toHaveLength(0);

    const current = (await getRules()).body;
    const moved = current.transitionRules.map((r: TransitionRule) =>
      r.refrigerants.includes('R-410A') && r.scope === 'new-system' ? { ...r, installFrom: '2024-01-01', manufacturedBefore: undefined } : r,
    );
    await putRules({ settings: current.settings, transitionRules: JSON.parse(JSON.stringify(moved)) }).expect(200);
    const after = await request(t.app).post('/api/checks').set(auth('tech')).send(body).expect(200);
    expect(regulationBlockers(after.body.findings).length).toBeGreaterThan(0);
    expect(after.body.verdict).toBe('incompatible');
  });
});
