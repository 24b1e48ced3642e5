import { describe, expect, it } from 'vitest';
import { defineRule } from '../../../shared/rules/define-rule';
import { coverageOf, DEFAULT_CONTEXT, runChecks, verdictOf } from '../../../shared/rules/engine';
import { DEFAULT_TRANSITION_RULES } from '../../../shared/regulation/transition-rules';
import { DEFAULT_RULE_SETTINGS } from '../../../shared/rules/settings';
import type { Finding, Severity } from '../../../shared/rules/types';
import { RULES_VERSION } from '../../../shared/rules/version';
import { makePairing, testContext } from './pairing-builder';

const basis = { kind: 'common-practice', citation: 'test' } as const;
/** A rule that always reports the given severities (or a missing-facts note). */
const fixedRule = (id: string, out: (Severity | 'missing')[]) =>
  defineRule({
    id,
    title: id,
    basis,
    evaluate: (_p, _c, tools) => out.map((s) => (s === 'missing' ? tools.missing(`facts of ${id}`, 'not checked') : tools.finding({ severity: s, detail: id, fix: '', values: {} }))),
  });

describe('runChecks', () => {
  it('when rules report info, blocker and caution, then findings are sorted blockers → cautions → info', () => {
    const rules = [fixedRule('a.one', ['info']), fixedRule('b.two', ['caution', 'blocker']), fixedRule('c.three', ['info', 'caution'])];
    const result = runChecks(makePairing(), testContext(), rules);
    expect(result.findings.map((f) => f.severity)).toEqual(['blocker', 'caution', 'caution', 'info', 'info']);
    // equal severities keep registry order
    expect(result.findings.filter((f) => f.severity === 'caution').map((f) => f.ruleId)).toEqual(['b.two', 'c.three']);
  });

  it.each([
    [['blocker', 'caution'], 'incompatible'],
    [['caution', 'info'], 'compatible-with-cautions'],
    [['info'], 'compatible'],
    [[], 'compatible'],
    [['missing'], 'compatible'],
  ] as [(Severity | 'missing')[], string][])('when the findings are %j, then the verdict is %s', (severities, verdict) => {
    const result = runChecks(makePairing(), testContext(), [fixedRule('a.one', severities)]);
    expect(result.verdict).toBe(verdict);
  });

  it('when a check runs, then it reports the rules version', () => {
    expect(runChecks(makePairing(), testContext(), []).rulesVersion).toBe(RULES_VERSION);
    expect(RULES_VERSION).toMatch(/^\d{4}\.\d{1,2}\.\d+$/);
  });

  it('when one family lacks facts and another ran, then coverage lists both', () => {
    const rules = [fixedRule('fam.a', ['missing']), fixedRule('fam.b', []), fixedRule('other.c', ['missing'])];
    const { coverage } = runChecks(makePairing(), testContext(), rules);
    expect(coverage.ran).toEqual(['fam']);
    expect(coverage.notChecked).toEqual([
      { family: 'fam', missing: 'facts of fam.a' },
      { family: 'other', missing: 'facts of other.c' },
    ]);
  });

  it('when the same fact is missing twice in a family, then coverage lists it once', () => {
    const missing = (id: string): Finding => ({ ruleId: id, severity: 'info', title: '', detail: '', fix: '', basis, values: { missing: 'line set' } });
    const cov = coverageOf([missing('x.a'), missing('x.b')], [fixedRule('x.a', []), fixedRule('x.b', [])]);
    expect(cov.notChecked).toEqual([{ family: 'x', missing: 'line set' }]);
  });

  it('when there is an air handler and a line set, then computed carries CFM/ton and the charge adjustment', () => {
    // 1200 CFM / 3 tons = 400 CFM/ton — values.json CM-09; (40 − 15) × 0.6 = 15 oz — values.json LS-03
    const result = runChecks(makePairing({ lineSet: { lengthFt: 40 } }));
    expect(result.computed.cfmPerTon).toBe(400);
    expect(result.computed.chargeAdjustmentOz).toBe(15);
  });

  it('when no air handler, line set, nameplate amps or state is given, then those computed keys are absent', () => {
    const result = runChecks(makePairing({ airHandler: null, lineSet: null, site: null }));
    expect(result.computed).not.toHaveProperty('cfmPerTon');
    expect(result.computed).not.toHaveProperty('chargeAdjustmentOz');
    expect(result.computed).not.toHaveProperty('breakerRange');
    expect(result.computed).not.toHaveProperty('regionalMinimum');
  });

  it('when the nameplate gives MCA 21 A and MOCP 35 A, then computed lists the standard breakers between', () => {
    // NEC 240.6(A) standard ratings 25, 30, 35 A between 21 and 35 — values.json EL-03, EL-05 (RLA 16.0 + fan 1.2)
    const result = runChecks(makePairing({ outdoor: { mcaAmps: 21.2, mocpAmps: 35 } }));
    expect(result.computed.breakerRange).toEqual({ mcaAmps: 21.2, mocpAmps: 35, standardSizes: [25, 30, 35] });
  });

  it('when the site is in Texas, then computed carries the Southeast minimum for a split AC under 45,000 Btu/h', () => {
    // 14.3 SEER2: 10 CFR 430.32(c) — values.json EFF-02; TX is Southeast — values.json EFF-09
    const result = runChecks(makePairing({ site: { state: 'TX' }, outdoor: { coolingBtuh: 35000 } }));
    expect(result.computed.regionalMinimum).toMatchObject({ region: 'southeast', seer2: 14.3 });
  });

  it('when the full registry runs on a pairing, then every finding names a registered rule and carries its basis', () => {
    const result = runChecks(makePairing({ outdoor: { nominalTons: 5 }, lineSet: { lengthFt: 120 } }));
    expect(result.findings.length).toBeGreaterThan(0);
    for (const f of result.findings) {
      expect(f.ruleId).toMatch(/^[a-z]+\.[a-z0-9-]+$/);
      expect(f.basis.citation.length).toBeGreaterThan(0);
      expect(f.detail.length).toBeGreaterThan(10);
    }
  });

  it('when verdictOf sees no findings, then the verdict is compatible', () => {
    expect(verdictOf([])).toBe('compatible');
  });

  it('when the default context is used, then it carries the default settings', () => {
    expect(DEFAULT_CONTEXT.settings).toEqual(DEFAULT_RULE_SETTINGS);
    expect(DEFAULT_CONTEXT.transitionRules).toBe(DEFAULT_TRANSITION_RULES);
    expect(DEFAULT_CONTEXT.transitionRules.length).toBeGreaterThan(0);
  });
});
