import { describe, expect, it } from 'vitest';
import { chargeAdjustment } from '../../../shared/rules/lineset/charge-adjustment';
import { filterDrier } from '../../../shared/rules/lineset/filter-drier';
import { length } from '../../../shared/rules/lineset/length';
import { lift } from '../../../shared/rules/lineset/lift';
import { liquidSize } from '../../../shared/rules/lineset/liquid-size';
import { reuseCondition } from '../../../shared/rules/lineset/reuse-condition';
import { suctionSize } from '../../../shared/rules/lineset/suction-size';
import { makePairing, outcome, runRule, type PairingOverrides } from './pairing-builder';

// Standard ACR sizes 1/4, 5/16, 3/8, 1/2, 5/8, 3/4, 7/8, 1-1/8 …: ASTM B280 size list (from memory);
// one size off = caution, more = blocker: DESIGN.md §3 (our decision, common practice).
describe('lineset.liquid-size', () => {
  const cases: [string, PairingOverrides, string][] = [
    ['the liquid line equals the 3/8 in connection', {}, 'none'],
    ['the liquid line is 5/16 in on a 3/8 in connection (one size)', { lineSet: { liquidOdIn: 0.3125 } }, 'caution'],
    ['the liquid line is 1/2 in on a 3/8 in connection (one size)', { lineSet: { liquidOdIn: 0.5 } }, 'caution'],
    ['the liquid line is 1/4 in on a 3/8 in connection (two sizes)', { lineSet: { liquidOdIn: 0.25 } }, 'blocker'],
    ['the liquid line is 1/2 in and the unit allows 3/8 or 1/2 in', { outdoor: { allowedLiquidOdIn: [0.375, 0.5] }, lineSet: { liquidOdIn: 0.5 } }, 'none'],
    ['the unit gives neither a list nor a connection size', { outdoor: { liquidLineOdIn: undefined } }, 'missing'],
    ['there is no line set', { lineSet: null }, 'none'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(liquidSize, makePairing(overrides)))).toBe(expected);
  });

  it('when the liquid line is 5/16 in on 3/8 in, then the detail reads in trade fractions', () => {
    const [f] = runRule(liquidSize, makePairing({ lineSet: { liquidOdIn: 0.3125 } }));
    expect(f.detail).toBe('Liquid line is 5/16 in; the outdoor unit allows 3/8 in (1 size smaller).');
  });
});

describe('lineset.suction-size', () => {
  const cases: [string, PairingOverrides, string][] = [
    ['the suction line equals the 7/8 in connection', {}, 'none'],
    ['the suction line is 3/4 in on 7/8 in (one size)', { lineSet: { suctionOdIn: 0.75 } }, 'caution'],
    ['the suction line is 1-1/8 in on 7/8 in (one size; 1 in is not a size)', { lineSet: { suctionOdIn: 1.125 } }, 'caution'],
    ['the suction line is 5/8 in on 7/8 in (two sizes)', { lineSet: { suctionOdIn: 0.625 } }, 'blocker'],
    ['the unit allows 3/4 or 7/8 in and 3/4 in is run', { outdoor: { allowedSuctionOdIn: [0.75, 0.875] }, lineSet: { suctionOdIn: 0.75 } }, 'none'],
    ['the unit gives no suction size', { outdoor: { suctionLineOdIn: undefined } }, 'missing'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(suctionSize, makePairing(overrides)))).toBe(expected);
  });
});

// 50 ft default when a unit gives no limit: shop setting default, common practice (no source) —
// values.json LS-05. The unit's own limit governs (blocker); the default only warns (caution).
describe('lineset.length', () => {
  const cases: [string, PairingOverrides, string][] = [
    ['25 ft on an 80 ft unit', {}, 'none'],
    ['80 ft on an 80 ft unit (edge)', { lineSet: { lengthFt: 80 } }, 'none'],
    ['81 ft on an 80 ft unit', { lineSet: { lengthFt: 81 } }, 'blocker'],
    ['60 ft with no unit limit (50 ft default)', { outdoor: { maxLineLengthFt: undefined }, lineSet: { lengthFt: 60 } }, 'caution'],
    ['50 ft with no unit limit (default edge)', { outdoor: { maxLineLengthFt: undefined }, lineSet: { lengthFt: 50 } }, 'none'],
    ['no line set', { lineSet: null }, 'missing'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(length, makePairing(overrides)))).toBe(expected);
  });

  it('when the default limit is used, then the detail says so', () => {
    const [f] = runRule(length, makePairing({ outdoor: { maxLineLengthFt: undefined }, lineSet: { lengthFt: 60 } }));
    expect(f.detail).toContain('shop default of 50 ft');
    expect(f.values.limitSource).toBe('default');
  });
});

describe('lineset.charge-adjustment', () => {
  it('when a 3/8 in R-410A line is 40 ft and the charge covers 15 ft at 0.6 oz/ft, then add 15 oz', () => {
    // (40 − 15) × 0.6 = 15 oz: common practice (no source) — values.json LS-03
    const [f] = runRule(chargeAdjustment, makePairing({ lineSet: { lengthFt: 40 } }));
    expect(f.severity).toBe('info');
    expect(f.values.chargeAdjustmentOz).toBeCloseTo(15, 5);
    expect(f.detail).toContain('add 15 oz');
  });

  it('when the line is 10 ft, then remove 3 oz', () => {
    // (10 − 15) × 0.6 = −3 oz: common practice (no source) — values.json LS-03
    const [f] = runRule(chargeAdjustment, makePairing({ lineSet: { lengthFt: 10 } }));
    expect(f.values.chargeAdjustmentOz).toBeCloseTo(-3, 5);
    expect(f.detail).toContain('remove 3 oz');
  });

  it('when the unit gives no oz/ft, then the 3/8 in tube content for R-410A is used (about 0.54 oz/ft)', () => {
    // 0.54 oz/ft ±10 %: ASTM B280 bore × CoolProp 8.0.0 liquid density at 90 °F — values.json LS-01
    const [f] = runRule(chargeAdjustment, makePairing({ outdoor: { chargePerFtOz: undefined }, lineSet: { lengthFt: 35 } }));
    expect(Number(f.values.ozPerFt)).toBeGreaterThan(0.54 * 0.9);
    expect(Number(f.values.ozPerFt)).toBeLessThan(0.54 * 1.1);
    expect(f.values.method).toBe('tube-content');
  });

  it('when a 1/2 in line replaces the 3/8 in connection, then the unit figure is scaled by tube bore and the detail says so', () => {
    // bore ratio (0.436/0.311)² ≈ 1.97 from ASTM B280 bores — values.json LS-01 inputs
    const [f] = runRule(chargeAdjustment, makePairing({ lineSet: { liquidOdIn: 0.5, lengthFt: 25 } }));
    expect(f.values.method).toBe('unit-scaled');
    expect(Number(f.values.ozPerFt)).toBeCloseTo(0.6 * (0.436 / 0.311) ** 2, 2);
    expect(f.detail).toContain('scaled');
  });

  it('when the unit does not say what length its charge covers, then 15 ft is assumed and said', () => {
    // 15 ft typical factory charge length: common practice (no source) — values.json LS-03
    const [f] = runRule(chargeAdjustment, makePairing({ outdoor: { chargedLineLengthFt: undefined }, lineSet: { lengthFt: 40 } }));
    expect(f.values.chargedLineLengthFt).toBe(15);
    expect(f.detail).toContain('assumed');
  });

  it('when there is no line set, then nothing is reported (lineset.length reports it)', () => {
    expect(runRule(chargeAdjustment, makePairing({ lineSet: null }))).toEqual([]);
  });
});

// 20 ft default lift: shop setting default, common practice (no source).
describe('lineset.lift', () => {
  const cases: [string, PairingOverrides, string][] = [
    ['8 ft on a 30 ft unit', {}, 'none'],
    ['30 ft on a 30 ft unit (edge)', { lineSet: { liftFt: 30 } }, 'none'],
    ['-35 ft (outdoor below) on a 30 ft unit', { lineSet: { liftFt: -35 } }, 'blocker'],
    ['25 ft with no unit limit (20 ft default)', { outdoor: { maxLiftFt: undefined }, lineSet: { liftFt: 25 } }, 'caution'],
    ['lift not given', { lineSet: { liftFt: undefined } }, 'missing'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(lift, makePairing(overrides)))).toBe(expected);
  });
});

// Bi-flow driers on heat pumps; a new drier whenever the system is opened: common practice (no source).
describe('lineset.filter-drier', () => {
  const hp = { systemType: 'heat-pump' } as const;
  const cases: [string, PairingOverrides, string][] = [
    ['a heat pump has a bi-flow drier', { outdoor: hp }, 'none'],
    ['a heat pump has a one-way drier', { outdoor: hp, lineSet: { filterDrier: 'one-way' } }, 'blocker'],
    ['an AC has a one-way drier', { lineSet: { filterDrier: 'one-way' } }, 'none'],
    ['a new system has no drier', { scope: 'new-system', lineSet: { filterDrier: 'none' } }, 'caution'],
    ['a component replacement has no drier', { lineSet: { filterDrier: 'none' } }, 'caution'],
    ['the drier is not given', { lineSet: { filterDrier: undefined } }, 'missing'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(filterDrier, makePairing(overrides)))).toBe(expected);
  });
});

// Burnout: acid clean-up practice, common practice (no source). A2L indoor flares: UL 60335-2-40
// 3rd ed. joint requirements (from memory). A2L class of R-32 / R-454B: ASHRAE 34 — values.json RP-03, RP-04.
describe('lineset.reuse-condition', () => {
  const cases: [string, PairingOverrides, string][] = [
    ['a reused line set without burnout', { lineSet: { reused: true, burnoutHistory: false } }, 'none'],
    ['a reused line set after a burnout', { lineSet: { reused: true, burnoutHistory: true } }, 'caution'],
    ['a reused line set with unknown history', { lineSet: { reused: true } }, 'missing'],
    ['a new line set', {}, 'none'],
    ['indoor flare joints on R-454B', { outdoor: { refrigerant: 'R-454B' }, lineSet: { indoorFlareJoints: true } }, 'blocker'],
    ['indoor flare joints on R-32', { outdoor: { refrigerant: 'R-32' }, lineSet: { indoorFlareJoints: true } }, 'blocker'],
    ['indoor flare joints on R-410A (A1)', { lineSet: { indoorFlareJoints: true } }, 'none'],
    ['flares on R-32 and a burnt-out reused line', { outdoor: { refrigerant: 'R-32' }, lineSet: { indoorFlareJoints: true, reused: true, burnoutHistory: true } }, 'blocker,caution'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(reuseCondition, makePairing(overrides)))).toBe(expected);
  });
});
