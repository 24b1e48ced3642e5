import { describe, expect, it } from 'vitest';
import { material } from '../../../shared/rules/coil/material';
import { makePairing, outcome, runRule, type PairingOverrides } from './pairing-builder';

// Formicary corrosion of copper evaporator tubes: trade experience, common practice (no source).
describe('coil.material', () => {
  const cases: [string, PairingOverrides, string][] = [
    ['a kept copper coil', { indoorCoil: { material: 'copper' }, coilKept: true }, 'info'],
    ['a new copper coil', { indoorCoil: { material: 'copper' } }, 'none'],
    ['an aluminum coil', {}, 'info'],
    ['a kept coil of unknown material', { indoorCoil: { material: undefined }, coilKept: true }, 'missing'],
    ['a new coil of unknown material', { indoorCoil: { material: undefined } }, 'none'],
    ['no coil', { indoorCoil: null }, 'none'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(material, makePairing(overrides)))).toBe(expected);
  });

  it('when a kept copper coil is found, then the note names formicary corrosion', () => {
    const [f] = runRule(material, makePairing({ indoorCoil: { material: 'copper' }, coilKept: true }));
    expect(f.detail).toMatch(/formicary/);
  });
});
