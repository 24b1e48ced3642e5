import { describe, expect, it } from 'vitest';
import { overflowProtection } from '../../../shared/rules/condensate/overflow-protection';
import { makePairing, outcome, runRule, type PairingOverrides } from './pairing-builder';

// Secondary pan or float switch where overflow damages the building: IRC M1411.3 / IMC 307.2.3 (from memory for the clause numbers).
describe('condensate.overflow-protection', () => {
  const none = { hasFloatSwitch: false, hasSecondaryPan: false };
  const cases: [string, PairingOverrides, string][] = [
    ['an attic unit with neither', { site: { indoorLocation: 'attic', ...none } }, 'caution'],
    ['an attic unit with nothing recorded', { site: { indoorLocation: 'attic', hasFloatSwitch: undefined } }, 'caution'],
    ['an attic unit with a float switch', { site: { indoorLocation: 'attic', hasFloatSwitch: true } }, 'none'],
    ['an attic unit with a secondary pan', { site: { indoorLocation: 'attic', hasFloatSwitch: false, hasSecondaryPan: true } }, 'none'],
    ['an above-ceiling unit with neither', { site: { indoorLocation: 'above-ceiling', ...none } }, 'caution'],
    ['a closet unit with neither', { site: { indoorLocation: 'closet', ...none } }, 'caution'],
    ['a basement unit with neither', { site: { indoorLocation: 'basement', ...none } }, 'info'],
    ['a garage unit with neither', { site: { indoorLocation: 'garage', ...none } }, 'none'],
    ['a crawlspace unit with neither', { site: { indoorLocation: 'crawlspace', ...none } }, 'none'],
    ['the location is not given', { site: { indoorLocation: undefined } }, 'missing'],
    ['there is no site at all', { site: null }, 'missing'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(overflowProtection, makePairing(overrides)))).toBe(expected);
  });
});
