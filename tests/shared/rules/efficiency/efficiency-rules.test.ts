import { describe, expect, it } from 'vitest';
import { efficiencyRules } from '../../../../shared/rules/efficiency';
import { rebateTier } from '../../../../shared/rules/efficiency/rebate-tier';
import { regionalMinimumRule } from '../../../../shared/rules/efficiency/regional-minimum';
import { combo, context, expectWellFormed, pairing, run, severities } from '../reference-fixtures';

describe('efficiency.regional-minimum', () => {
  it.each([
    // 10 CFR 430.32(c), 82 FR 1786 — North split AC 13.4 SEER2 (values.json EFF-01): 13.4 passes, 13.3 fails
    ['OH', { seer2: 13.4 }, []],
    ['OH', { seer2: 13.3 }, ['blocker']],
    // Southeast split AC <45k 14.3 (EFF-02); 3.5 tons = 42,000 Btu/h is under 45k
    ['GA', { seer2: 14.2, nominalTons: 3.5 }, ['blocker']],
    ['GA', { seer2: 14.3, nominalTons: 3.5 }, []],
    // Southeast >=45k 13.8 (EFF-03); 4 tons = 48,000 Btu/h
    ['TX', { seer2: 13.8, nominalTons: 4 }, []],
    ['TX', { seer2: 13.7, nominalTons: 4 }, ['blocker']],
    // Southwest <45k: 14.3 SEER2 and 11.7 EER2 when SEER2 < 15.2 (EFF-04)
    ['AZ', { seer2: 14.5, eer2: 11.7 }, []],
    ['AZ', { seer2: 14.5, eer2: 11.6 }, ['blocker']],
    ['AZ', { seer2: 15.2, eer2: 9.8 }, []],
    ['AZ', { seer2: 14.5 }, ['missing']],
    // split heat pump 14.3 / 7.5 everywhere (EFF-06)
    ['MN', { systemType: 'heat-pump' as const, seer2: 14.3, hspf2: 7.5 }, []],
    ['MN', { systemType: 'heat-pump' as const, seer2: 14.3, hspf2: 7.4 }, ['blocker']],
  ])('when %s with %j, then %j', (state, unit, expected) => {
    expect(severities(regionalMinimumRule, pairing({ site: { state }, outdoor: unit, ratedCombinations: [] }))).toEqual(expected);
  });

  it('when a rated combination matches, then its figures are used rather than the unit\'s', () => {
    // Southeast 14.3 SEER2 (EFF-02); the combination 14.0 fails though the unit alone claims 15.0
    const p = pairing({ site: { state: 'FL' }, outdoor: { seer2: 15 }, ratedCombinations: [combo({ outdoorModel: 'tq od36', indoorModel: 'TQ-C36', seer2: 14, reference: 'CERT-001' })] });
    const [f] = run(regionalMinimumRule, p);
    expect(f.severity).toBe('blocker');
    // An efficiency blocker names the shortfall; only a regulation.* blocker reads "Not allowed" (Issue 7)
    expect(f.title).toBe('SEER2 14 is below 14.3, the Southeast minimum');
    expect(f.detail).toMatch(/rated combination CERT-001/);
    expect(f.values).toMatchObject({ figuresFrom: 'rated-combination', seer2: 14, minSeer2: 14.3, region: 'Southeast' });
    expectWellFormed(regionalMinimumRule, [f]);
  });

  it('when no combination matches, then it says the outdoor unit\'s own figures were used', () => {
    const [f] = run(regionalMinimumRule, pairing({ site: { state: 'FL' }, outdoor: { seer2: 14 }, ratedCombinations: [] }));
    expect(f.detail).toMatch(/outdoor unit's own figures/);
  });

  it('when a North AC was made before 2023, then the 2023 level does not apply', () => {
    // values.json EFF-12: north goes by manufacture date
    expect(severities(regionalMinimumRule, pairing({ site: { state: 'OH' }, outdoor: { seer2: 12.5, manufactureDate: '2022-08-01' } }))).toEqual(['info']);
  });

  it('when a Southeast AC was made before 2023 but installed after, then the 2023 level still applies', () => {
    // values.json EFF-12: south goes by installation date
    expect(severities(regionalMinimumRule, pairing({ site: { state: 'GA' }, outdoor: { seer2: 13.4, manufactureDate: '2022-08-01' } }))).toEqual(['blocker']);
  });

  it('when the state is missing, then it says so', () => {
    expect(severities(regionalMinimumRule, pairing({ outdoor: { seer2: 15 } }))).toEqual(['missing']);
  });
});

describe('efficiency.rebate-tier', () => {
  // Invented shop thresholds (no source; not any real program).
  const tier = { name: 'Utility Tier A', seer2: 16, eer2: 12, hspf2: 8.1 };
  const higher = { name: 'Utility Tier B', seer2: 18 };
  it.each([
    ['no tier configured', [], { seer2: 10 }, []],
    ['at the thresholds', [tier], { seer2: 16, eer2: 12 }, []],
    ['SEER2 short', [tier], { seer2: 15.9, eer2: 12 }, ['caution']],
    ['EER2 not given', [tier], { seer2: 16 }, ['missing']],
    ['heat pump short on HSPF2', [tier], { systemType: 'heat-pump' as const, seer2: 17, eer2: 13, hspf2: 8 }, ['caution']],
    ['short of both of two tiers', [tier, higher], { seer2: 15, eer2: 12 }, ['caution', 'caution']],
    ['meeting the lower of two tiers', [tier, higher], { seer2: 17, eer2: 12 }, ['info']],
    ['meeting both tiers', [tier, higher], { seer2: 18, eer2: 12 }, []],
  ])('when %s, then %j', (_name, rebateTiers, unit, expected) => {
    expect(severities(rebateTier, pairing({ outdoor: unit }), context({ rebateTiers }))).toEqual(expected);
  });

  it('when two tiers want a figure that is not rated, then one missing note names both', () => {
    const findings = run(rebateTier, pairing({ outdoor: { seer2: 18 } }), context({ rebateTiers: [tier, { name: 'Utility Tier C', eer2: 13 }] }));
    expect(findings).toHaveLength(1);
    expect(findings[0].detail).toContain('Utility Tier A and Utility Tier C EER2 threshold not checked');
  });

  it('when it fires, then the detail names the tier and numbers', () => {
    const [f] = run(rebateTier, pairing({ outdoor: { seer2: 15.9, eer2: 12 } }), context({ rebateTiers: [tier] }));
    expect(f.detail).toContain('Utility Tier A');
    expect(f.detail).toContain('SEER2 15.9 is below 16');
  });
});

describe('efficiencyRules', () => {
  it('when the family is listed, then it has the contract ids', () => {
    expect(efficiencyRules.map((r) => r.id).sort()).toEqual(['efficiency.rebate-tier', 'efficiency.regional-minimum']);
  });
});
