import { describe, expect, it } from 'vitest';
import { heatPumpThermostat } from '../../../shared/rules/controls/heat-pump-thermostat';
import { makePairing, outcome, runRule, type PairingOverrides } from './pairing-builder';

// A heat pump needs an O/B reversing-valve output and, with strips, an auxiliary stage:
// thermostat and heat pump wiring practice, common practice (no source).
describe('controls.heat-pump-thermostat', () => {
  const hp = { systemType: 'heat-pump' } as const;
  const cases: [string, PairingOverrides, string][] = [
    ['a heat pump has a heat-pump thermostat', { outdoor: hp }, 'none'],
    ['a heat pump has a thermostat that cannot run one', { outdoor: hp, controls: { thermostatHeatPump: false } }, 'blocker'],
    ['the thermostat type is not given', { outdoor: hp, controls: {} }, 'missing'],
    ['a heat kit has no auxiliary stage', { outdoor: hp, airHandler: { kind: 'air-handler', heatKitKw: 10 }, controls: { thermostatHeatPump: true, auxHeatStages: 0 } }, 'caution'],
    ['a heat kit has an auxiliary stage', { outdoor: hp, airHandler: { kind: 'air-handler', heatKitKw: 10 }, controls: { thermostatHeatPump: true, auxHeatStages: 1 } }, 'none'],
    ['an AC has a cooling-only thermostat', { controls: { thermostatHeatPump: false } }, 'none'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(heatPumpThermostat, makePairing(overrides)))).toBe(expected);
  });
});
