import { describe, expect, it } from 'vitest';
import {
  annualCoolingCostDollars,
  annualCoolingKwh,
  annualSavingsKwh,
  complianceDateBasis,
  levels2023Apply,
  NORTH_STATES,
  regionalMinimum,
  regionOfState,
  SOUTHEAST_STATES,
  SOUTHWEST_STATES,
} from '../../../shared/efficiency';

describe('DOE regions (10 CFR 430.32(c))', () => {
  it('when the Southeast is listed, then it is the regulation\'s list', () => {
    // 10 CFR 430.32(c) regional definitions, 76 FR 37408 (values.json EFF-09)
    expect([...SOUTHEAST_STATES].sort()).toEqual(['AL', 'AR', 'DE', 'FL', 'GA', 'HI', 'KY', 'LA', 'MD', 'MS', 'NC', 'OK', 'SC', 'TN', 'TX', 'VA', 'DC'].sort());
  });

  it('when the Southwest and North are listed, then they are the regulation\'s lists', () => {
    // 10 CFR 430.32(c) (values.json EFF-10, EFF-11): 4 Southwest states, 30 North states
    expect([...SOUTHWEST_STATES].sort()).toEqual(['AZ', 'CA', 'NM', 'NV']);
    expect(NORTH_STATES).toHaveLength(30);
    // 30 + 16 + 4 = 50 states, DC is Southeast (EFF-11 notes)
    expect(new Set([...NORTH_STATES, ...SOUTHEAST_STATES, ...SOUTHWEST_STATES]).size).toBe(51);
  });

  it.each([
    // 10 CFR 430.32(c) (values.json EFF-09 notes): TX and OK Southeast, HI Southeast, WV North
    ['TX', 'southeast'],
    ['ok', 'southeast'],
    ['HI', 'southeast'],
    ['WV', 'north'],
    ['PR', 'southeast'],
    ['NV', 'southwest'],
  ])('when the state is %s, then the region is %s', (state, region) => {
    expect(regionOfState(state)).toBe(region);
  });

  it('when the code is not a state, then there is no region', () => {
    expect(regionOfState('ZZ')).toBeUndefined();
  });
});

describe('2023 minimums (10 CFR 430.32(c))', () => {
  it.each([
    // 10 CFR 430.32(c), 82 FR 1786 — values.json EFF-01 (North any size 13.4)
    ['OH', 'ac', 36000, 13.4, undefined, undefined],
    ['OH', 'ac', 60000, 13.4, undefined, undefined],
    // EFF-02 / EFF-03: Southeast split AC <45k 14.3, >=45k 13.8
    ['GA', 'ac', 42000, 14.3, undefined, undefined],
    ['GA', 'ac', 44999, 14.3, undefined, undefined],
    ['GA', 'ac', 45000, 13.8, undefined, undefined],
    // EFF-04: Southwest <45k 14.3 SEER2 and EER2 11.7 (SEER2 < 15.2)
    ['AZ', 'ac', 36000, 14.3, 11.7, undefined],
    // EFF-05 (from memory for 11.2): Southwest >=45k 13.8 and 11.2
    ['AZ', 'ac', 48000, 13.8, 11.2, undefined],
    // EFF-06: split heat pumps national 14.3 / 7.5
    ['MN', 'heat-pump', 36000, 14.3, undefined, 7.5],
    ['FL', 'heat-pump', 60000, 14.3, undefined, 7.5],
  ] as const)('when %s %s %d Btu/h, then the minimum SEER2 is %d', (state, systemType, btuh, seer2, eer2, hspf2) => {
    const min = regionalMinimum({ state, systemType, coolingBtuh: btuh })!;
    expect(min.seer2).toBe(seer2);
    expect(min.eer2).toBe(eer2);
    expect(min.hspf2).toBe(hspf2);
    expect(min.basis).toMatch(/430\.32/);
  });

  it('when a Southwest AC has SEER2 15.2 or more, then the EER2 floor is 9.8', () => {
    // 10 CFR 430.32(c): 9.8 EER2 if SEER2 >= 15.2 (values.json EFF-04, Contracting Business Jul 2022)
    expect(regionalMinimum({ state: 'CA', systemType: 'ac', coolingBtuh: 36000, seer2: 15.2 })!.eer2).toBe(9.8);
    expect(regionalMinimum({ state: 'CA', systemType: 'ac', coolingBtuh: 36000, seer2: 15.1 })!.eer2).toBe(11.7);
  });

  it('when single-package units are asked, then their national levels apply', () => {
    // 10 CFR 430.32(c), 16 CFR 305 App. H (values.json EFF-07): 13.4 SEER2; HP 6.7 HSPF2
    expect(regionalMinimum({ state: 'OH', systemType: 'ac', coolingBtuh: 36000, singlePackage: true })!.seer2).toBe(13.4);
    expect(regionalMinimum({ state: 'OH', systemType: 'heat-pump', coolingBtuh: 36000, singlePackage: true })!.hspf2).toBe(6.7);
    // EFF-07M (from memory): Southwest single-package AC EER2 10.6
    expect(regionalMinimum({ state: 'AZ', systemType: 'ac', coolingBtuh: 36000, singlePackage: true })!.eer2).toBe(10.6);
  });

  it('when the state is unknown, then there is no minimum', () => {
    expect(regionalMinimum({ state: 'XX', systemType: 'ac', coolingBtuh: 36000 })).toBeUndefined();
  });
});

describe('which date governs (81 FR 45387)', () => {
  it('when a split AC is in the South, then the installation date governs; elsewhere the manufacture date', () => {
    // DOE regional enforcement final rule 81 FR 45387 (values.json EFF-12)
    expect(complianceDateBasis('split-ac', 'southeast')).toBe('installation');
    expect(complianceDateBasis('split-ac', 'southwest')).toBe('installation');
    expect(complianceDateBasis('split-ac', 'north')).toBe('manufacture');
    expect(complianceDateBasis('split-heat-pump', 'southeast')).toBe('manufacture');
  });

  it('when a North unit was built in 2022, then the 2023 levels do not apply to it', () => {
    // values.json EFF-12: north allows units built before 2023-01-01 to be installed
    expect(levels2023Apply('manufacture', '2025-05-01', '2022-11-30')).toBe(false);
    expect(levels2023Apply('manufacture', '2025-05-01', '2023-01-01')).toBe(true);
    expect(levels2023Apply('manufacture', '2025-05-01', undefined)).toBe(true);
    expect(levels2023Apply('installation', '2022-12-31', '2020-01-01')).toBe(false);
    expect(levels2023Apply('installation', '2023-01-01', '2020-01-01')).toBe(true);
  });
});

describe('annual energy (SEER2 definition)', () => {
  it.each([
    // kWh/yr = Btu/h × hours / (SEER × 1000), values.json SZ-03 (common practice)
    [10, 5400],
    [13, 4153.8],
    [14.3, 3776.2],
    [16, 3375.0],
  ])('when 36,000 Btu/h runs 1,500 h at %d, then it uses %d kWh', (seer, kwh) => {
    expect(annualCoolingKwh(36000, 1500, seer)).toBeCloseTo(kwh, 0);
  });

  it('when going from 10 to 14.3 at $0.15/kWh, then it saves 1623.8 kWh and $243.6 a year', () => {
    // values.json SZ-03 (common practice)
    const kwh = annualSavingsKwh(36000, 1500, 10, 14.3);
    expect(kwh).toBeCloseTo(1623.8, 0);
    expect(annualCoolingCostDollars(kwh, 0.15)).toBeCloseTo(243.6, 0);
  });
});
