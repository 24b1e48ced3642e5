import { describe, expect, it } from 'vitest';
import { capacityRange } from '../../../shared/rules/metering/capacity-range';
import { heatPumpBidirectional } from '../../../shared/rules/metering/heat-pump-bidirectional';
import { pistonSize } from '../../../shared/rules/metering/piston-size';
import { startAssist } from '../../../shared/rules/metering/start-assist';
import { typeRequired } from '../../../shared/rules/metering/type-required';
import type { MeteringDeviceSpec } from '../../../shared/schemas/equipment';
import { makePairing, outcome, runRule, type PairingOverrides } from './pairing-builder';

const pistonCoil = { meteringType: 'piston', pistonSizeIn: 0.065, meteringBidirectional: true, meteringBleed: undefined } as const;
const txvKit = (over: Partial<MeteringDeviceSpec> = {}): MeteringDeviceSpec => ({
  model: 'NW-TX30',
  type: 'txv',
  refrigerant: 'R-410A',
  minTons: 2.5,
  maxTons: 3.5,
  bidirectional: true,
  bleed: false,
  ...over,
});

// A unit whose instructions require a TXV must not run on a fixed orifice: the unit's own
// instructions, common practice (no source).
describe('metering.type-required', () => {
  const cases: [string, PairingOverrides, string][] = [
    ['a TXV-required unit has a TXV coil', { outdoor: { meteringRequired: 'txv' } }, 'none'],
    ['a TXV-required unit has an EEV coil', { outdoor: { meteringRequired: 'txv' }, indoorCoil: { meteringType: 'eev' } }, 'none'],
    ['a TXV-required unit has a piston coil', { outdoor: { meteringRequired: 'txv' }, indoorCoil: pistonCoil }, 'blocker'],
    ['a TXV-required unit has a piston coil but a field TXV kit', { outdoor: { meteringRequired: 'txv' }, indoorCoil: pistonCoil, metering: txvKit() }, 'none'],
    ['a piston-or-any unit has a piston coil', { indoorCoil: pistonCoil }, 'none'],
    ['a piston coil meets a unit with no stated requirement', { outdoor: { meteringRequired: undefined }, indoorCoil: pistonCoil }, 'missing'],
    ['the coil has no metering device and there is no kit (refrigerant.metering-device reports it)', { indoorCoil: { meteringType: 'none' } }, 'none'],
    ['there is no coil and no kit', { indoorCoil: null }, 'none'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(typeRequired, makePairing(overrides)))).toBe(expected);
  });
});

// Piston bores are marked in thousandths; the unit's shipped piston governs: common practice (no source).
describe('metering.piston-size', () => {
  const cases: [string, PairingOverrides, string][] = [
    ['the coil piston matches the unit (0.065 in)', { outdoor: { pistonSizeIn: 0.065 }, indoorCoil: pistonCoil }, 'none'],
    ['the coil piston is 0.071 in and the unit specifies 0.065 in', { outdoor: { pistonSizeIn: 0.065 }, indoorCoil: { ...pistonCoil, pistonSizeIn: 0.071 } }, 'caution'],
    ['the coil piston is 0.059 in and the unit specifies 0.065 in', { outdoor: { pistonSizeIn: 0.065 }, indoorCoil: { ...pistonCoil, pistonSizeIn: 0.059 } }, 'caution'],
    ['the unit gives no piston size', { indoorCoil: pistonCoil }, 'missing'],
    ['the coil piston size is unknown', { outdoor: { pistonSizeIn: 0.065 }, indoorCoil: { ...pistonCoil, pistonSizeIn: undefined } }, 'missing'],
    ['the metering is a TXV', { outdoor: { pistonSizeIn: 0.065 } }, 'none'],
    ['the unit needs a TXV anyway (type-required reports it)', { outdoor: { pistonSizeIn: 0.065, meteringRequired: 'txv' }, indoorCoil: { ...pistonCoil, pistonSizeIn: 0.071 } }, 'none'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(pistonSize, makePairing(overrides)))).toBe(expected);
  });

  it('when the piston is 0.071 in for a 0.065 in spec, then the detail shows both in thousandths', () => {
    const [f] = runRule(pistonSize, makePairing({ outdoor: { pistonSizeIn: 0.065 }, indoorCoil: { ...pistonCoil, pistonSizeIn: 0.071 } }));
    expect(f.detail).toContain('0.071 in');
    expect(f.detail).toContain('0.065 in');
  });
});

// In heating a heat pump's indoor coil is the condenser and flow reverses through the indoor
// metering device: refrigeration textbooks, common practice (no source).
describe('metering.heat-pump-bidirectional', () => {
  const hp = { systemType: 'heat-pump' } as const;
  const cases: [string, PairingOverrides, string][] = [
    ['a heat pump has a bidirectional TXV coil', { outdoor: hp }, 'none'],
    ['a heat pump has a one-way TXV coil', { outdoor: hp, indoorCoil: { meteringBidirectional: false } }, 'blocker'],
    ['a heat pump has a piston that does not pass both ways', { outdoor: hp, indoorCoil: { ...pistonCoil, meteringBidirectional: false } }, 'blocker'],
    ['a heat pump has a flowrator-style piston listed bidirectional', { outdoor: hp, indoorCoil: pistonCoil }, 'none'],
    ['a heat pump has a one-way coil TXV but a bidirectional field kit', { outdoor: hp, indoorCoil: { meteringBidirectional: false }, metering: txvKit() }, 'none'],
    ['a heat pump has a one-way field kit on a bidirectional coil', { outdoor: hp, metering: txvKit({ bidirectional: false }) }, 'blocker'],
    ['the heat pump metering direction is unknown', { outdoor: hp, indoorCoil: { meteringBidirectional: undefined } }, 'missing'],
    ['an AC has a one-way TXV', { indoorCoil: { meteringBidirectional: false } }, 'none'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(heatPumpBidirectional, makePairing(overrides)))).toBe(expected);
  });
});

// A kit's listed tonnage range governs (kit maker's data, invented here): common practice (no source).
describe('metering.capacity-range', () => {
  const cases: [string, PairingOverrides, string][] = [
    ['a 2.5–3.5 ton kit on 3 tons', { metering: txvKit() }, 'none'],
    ['a 2.5–3.5 ton kit on 3.5 tons (edge)', { outdoor: { nominalTons: 3.5 }, metering: txvKit() }, 'none'],
    ['a 2.5–3.5 ton kit on 4 tons', { outdoor: { nominalTons: 4 }, metering: txvKit() }, 'blocker'],
    ['a 2.5–3.5 ton kit on 2 tons', { outdoor: { nominalTons: 2 }, metering: txvKit() }, 'blocker'],
    ['the kit gives no range', { metering: txvKit({ minTons: undefined, maxTons: undefined }) }, 'missing'],
    ['there is no field kit', {}, 'none'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(capacityRange, makePairing(overrides)))).toBe(expected);
  });
});

// A hard-shutoff TXV keeps pressures apart during the off cycle; a single-phase compressor then
// needs start assist: common practice (no source).
describe('metering.start-assist', () => {
  const nonBleed = { meteringBleed: false } as const;
  const cases: [string, PairingOverrides, string][] = [
    ['a non-bleed coil TXV on a single-phase unit without start assist', { indoorCoil: nonBleed }, 'caution'],
    ['a non-bleed TXV on a single-phase unit with start assist', { indoorCoil: nonBleed, outdoor: { startAssist: true } }, 'none'],
    ['a bleed TXV on a single-phase unit', {}, 'none'],
    ['a non-bleed TXV on a three-phase unit', { indoorCoil: nonBleed, outdoor: { phase: 3, voltage: '460' } }, 'none'],
    ['a non-bleed TXV, phase not given, single 230 V rating', { indoorCoil: nonBleed, outdoor: { phase: undefined, voltage: '230' } }, 'caution'],
    ['a non-bleed TXV, phase not given, 460 V rating', { indoorCoil: nonBleed, outdoor: { phase: undefined, voltage: '460' } }, 'missing'],
    ['a non-bleed TXV, neither phase nor voltage given', { indoorCoil: nonBleed, outdoor: { phase: undefined, voltage: undefined } }, 'missing'],
    ['a TXV whose bleed type is unknown', { indoorCoil: { meteringBleed: undefined } }, 'missing'],
    ['a non-bleed field kit on a bleed coil', { metering: txvKit({ bleed: false }) }, 'caution'],
    ['a piston', { indoorCoil: pistonCoil }, 'none'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(startAssist, makePairing(overrides)))).toBe(expected);
  });

  it('when the phase is presumed from a 230 V rating, then the detail says so', () => {
    const [f] = runRule(startAssist, makePairing({ indoorCoil: nonBleed, outdoor: { phase: undefined, voltage: '230' } }));
    expect(f.detail).toContain('presumed single-phase');
  });
});
