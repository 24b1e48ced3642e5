import { describe, expect, it } from 'vitest';
import { airHandlerRange } from '../../../shared/rules/capacity/air-handler-range';
import { coilRange } from '../../../shared/rules/capacity/coil-range';
import { makePairing, outcome, runRule, type PairingOverrides } from './pairing-builder';

// Tonnage ranges are the equipment's own listed ranges (invented test equipment); inside the range
// inclusive of its ends passes: common practice (no source).
describe('capacity.coil-range', () => {
  const cases: [string, PairingOverrides, string][] = [
    ['the outdoor tons sit inside the coil range', { outdoor: { nominalTons: 3 } }, 'none'],
    ['the outdoor tons equal the coil minimum (edge)', { outdoor: { nominalTons: 2.5 } }, 'none'],
    ['the outdoor tons equal the coil maximum (edge)', { outdoor: { nominalTons: 3.5 } }, 'none'],
    ['the outdoor unit is a half ton above the coil maximum', { outdoor: { nominalTons: 4 } }, 'blocker'],
    ['the outdoor unit is a half ton below the coil minimum', { outdoor: { nominalTons: 2 } }, 'blocker'],
    ['there is no coil but an air handler', { indoorCoil: null }, 'none'],
    ['there is neither coil nor air handler', { indoorCoil: null, airHandler: null }, 'missing'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(coilRange, makePairing(overrides)))).toBe(expected);
  });

  it('when a 3-ton unit meets a 1.5–2.5 ton coil, then the detail carries both numbers', () => {
    const [f] = runRule(coilRange, makePairing({ indoorCoil: { minTons: 1.5, maxTons: 2.5 } }));
    expect(f.detail).toBe('Coil covers 1.5–2.5 tons; outdoor unit is 3 tons.');
    expect(f.values).toMatchObject({ outdoorTons: 3, coilMinTons: 1.5, coilMaxTons: 2.5 });
  });
});

describe('capacity.air-handler-range', () => {
  const cases: [string, PairingOverrides, string][] = [
    ['the tons are inside the air handler range', {}, 'none'],
    ['the tons equal the air handler maximum (edge)', { outdoor: { nominalTons: 3.5 } }, 'none'],
    ['the tons exceed the air handler maximum', { outdoor: { nominalTons: 4 }, indoorCoil: { maxTons: 5 } }, 'blocker'],
    ['the tons are below the air handler minimum', { airHandler: { minTons: 3.5, maxTons: 5 } }, 'blocker'],
    ['the air handler gives no range', { airHandler: { minTons: undefined, maxTons: undefined } }, 'missing'],
    ['there is no air handler', { airHandler: null }, 'none'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(airHandlerRange, makePairing(overrides)))).toBe(expected);
  });
});
