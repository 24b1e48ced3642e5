import { describe, expect, it } from 'vitest';
import { findRatedCombination } from '../../../shared/rules/rated-match';
import { noRatedCombination } from '../../../shared/rules/rating/no-rated-combination';
import { ratedCombination } from '../../../shared/rules/rating/rated-combination';
import type { RatedCombinationSpec } from '../../../shared/schemas/equipment';
import { makePairing, outcome, runRule, type PairingOverrides } from './pairing-builder';

// An installed split system's efficiency is the certified rating of its exact combination:
// 10 CFR 429.16 — values.json EFF-12. Figures below are invented for the test combinations.
const combo = (over: Partial<RatedCombinationSpec> = {}): RatedCombinationSpec => ({
  outdoorModel: 'NW-AC36-R4',
  indoorModel: 'NW-CA36-M',
  coolingBtuh: 35400,
  seer2: 14.3,
  eer2: 11.7,
  reference: 'CERT-000123',
  ...over,
});

describe('rating.no-rated-combination', () => {
  const cases: [string, PairingOverrides, string][] = [
    ['the exact outdoor + coil combination is listed', { ratedCombinations: [combo()] }, 'none'],
    ['the models differ only in dashes, spaces and case', { ratedCombinations: [combo({ outdoorModel: 'nw ac36 r4', indoorModel: 'NWCA36M' })] }, 'none'],
    ['only another coil is listed with the outdoor unit', { ratedCombinations: [combo({ indoorModel: 'NW-CA42-M' })] }, 'caution'],
    ['the listed combination names another air handler', { ratedCombinations: [combo({ airHandlerModel: 'NW-AH99' })] }, 'caution'],
    ['the listed combination names this furnace', { ratedCombinations: [combo({ airHandlerModel: 'NW FG80 17' })] }, 'none'],
    ['the lookup list is empty', { ratedCombinations: [] }, 'caution'],
    ['the lookup could not be made (offline)', { ratedCombinations: null }, 'missing'],
    ['the outdoor model is not known', { outdoor: { model: undefined }, ratedCombinations: [combo()] }, 'missing'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(noRatedCombination, makePairing(overrides)))).toBe(expected);
  });

  it('when no combination matches, then the fix warns about efficiency and rebate claims', () => {
    const [f] = runRule(noRatedCombination, makePairing({ ratedCombinations: [] }));
    expect(f.fix).toMatch(/rebate/);
  });

  it('when offline, then the missing note names the lookup', () => {
    const [f] = runRule(noRatedCombination, makePairing({ ratedCombinations: null }));
    expect(f.values.missing).toBe('rated-combination lookup (offline)');
  });
});

describe('rating.rated-combination', () => {
  it('when the combination is listed, then an info finding carries its certified figures', () => {
    const [f] = runRule(ratedCombination, makePairing({ ratedCombinations: [combo()] }));
    expect(f.severity).toBe('info');
    expect(f.values).toMatchObject({ seer2: 14.3, eer2: 11.7, coolingBtuh: 35400, reference: 'CERT-000123' });
    expect(f.detail).toContain('SEER2 14.3');
  });

  it('when nothing matches, then there is no finding', () => {
    expect(runRule(ratedCombination, makePairing({ ratedCombinations: [combo({ indoorModel: 'X' })] }))).toEqual([]);
  });

  it('when both a general and an air-handler-specific rating match, then the specific one wins', () => {
    const specific = combo({ airHandlerModel: 'NW-FG80-17', seer2: 15.2 });
    expect(findRatedCombination(makePairing({ ratedCombinations: [combo(), specific] }))).toBe(specific);
  });

  it('when there is no coil, then the air handler is the indoor model', () => {
    const ahOnly = combo({ indoorModel: 'NW-FG80-17' });
    expect(findRatedCombination(makePairing({ indoorCoil: null, ratedCombinations: [ahOnly] }))).toBe(ahOnly);
  });

  it('when the same pairing object gets a new combination list or a new coil, then the match is worked out again', () => {
    const p = makePairing({ ratedCombinations: [combo()] });
    expect(findRatedCombination(p)?.reference).toBe('CERT-000123');
    p.ratedCombinations = [combo({ reference: 'CERT-000999' })];
    expect(findRatedCombination(p)?.reference).toBe('CERT-000999');
    p.indoorCoil = { spec: { ...p.indoorCoil!.spec, model: 'NW-OTHER' }, kept: false };
    expect(findRatedCombination(p)).toBeUndefined();
  });
});
