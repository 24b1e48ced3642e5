import { describe, expect, it } from 'vitest';
import { coilCabinet } from '../../../shared/rules/fit/coil-cabinet';
import { coilOrientation } from '../../../shared/rules/fit/coil-orientation';
import { makePairing, outcome, runRule, type PairingOverrides } from './pairing-builder';

// A coil drains correctly only in the positions it is built for: coil installation instructions,
// common practice (no source).
describe('fit.coil-orientation', () => {
  const cases: [string, PairingOverrides, string][] = [
    ['a multi-position coil is installed horizontal-left', { site: { airflowDirection: 'horizontal-left' } }, 'none'],
    ['an upflow coil is installed upflow', { indoorCoil: { configuration: 'upflow' } }, 'none'],
    ['an upflow coil is installed downflow', { indoorCoil: { configuration: 'upflow' }, site: { airflowDirection: 'downflow' } }, 'blocker'],
    ['an upflow coil is installed horizontal-right', { indoorCoil: { configuration: 'upflow' }, site: { airflowDirection: 'horizontal-right' } }, 'blocker'],
    ['a horizontal coil is installed horizontal-right', { indoorCoil: { configuration: 'horizontal' }, site: { airflowDirection: 'horizontal-right' } }, 'none'],
    ['a horizontal coil is installed upflow', { indoorCoil: { configuration: 'horizontal' } }, 'blocker'],
    ['a downflow coil is installed downflow', { indoorCoil: { configuration: 'downflow' }, site: { airflowDirection: 'downflow' } }, 'none'],
    ['the airflow direction is not given', { site: { airflowDirection: undefined } }, 'missing'],
    ['the coil configuration is not given', { indoorCoil: { configuration: undefined } }, 'missing'],
    ['there is no coil', { indoorCoil: null }, 'none'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(coilOrientation, makePairing(overrides)))).toBe(expected);
  });
});

// Widths are the parts' own catalog widths; ±0.25 in counts as equal: common practice (no source).
describe('fit.coil-cabinet', () => {
  const cases: [string, PairingOverrides, string][] = [
    ['the widths are equal (17.5 in)', {}, 'none'],
    ['the coil is 0.25 in narrower (edge of equal)', { indoorCoil: { widthIn: 17.25 } }, 'none'],
    ['the coil is wider (21 in on 17.5 in)', { indoorCoil: { widthIn: 21 } }, 'blocker'],
    ['the coil is narrower (14.5 in on 17.5 in)', { indoorCoil: { widthIn: 14.5 } }, 'caution'],
    ['the coil width is missing', { indoorCoil: { widthIn: undefined } }, 'missing'],
    ['the furnace width is missing', { airHandler: { widthIn: undefined } }, 'missing'],
    ['there is no air handler', { airHandler: null }, 'none'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(coilCabinet, makePairing(overrides)))).toBe(expected);
  });

  it('when a 21 in coil sits on a 17.5 in furnace, then the detail names both widths and the overhang', () => {
    const [f] = runRule(coilCabinet, makePairing({ indoorCoil: { widthIn: 21 } }));
    expect(f.detail).toContain('21 in');
    expect(f.detail).toContain('17.5 in');
    expect(f.values.differenceIn).toBe(3.5);
  });
});
