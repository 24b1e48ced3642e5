import { defineRule } from '../define-rule';
import { isHeatPump } from '../facts';

/** A heat pump needs a thermostat that drives the reversing valve (O/B) and, with a heat kit, auxiliary heat (W2/AUX). */
export const heatPumpThermostat = defineRule({
  id: 'controls.heat-pump-thermostat',
  title: 'Heat pump thermostat',
  basis: { kind: 'common-practice', citation: 'Heat pump control wiring (O/B reversing valve, auxiliary/emergency heat); outdoor unit and thermostat instructions' },
  evaluate(pairing, _context, tools) {
    if (!isHeatPump(pairing)) return [];
    const controls = pairing.controls;
    if (controls?.thermostatHeatPump === undefined) return [tools.missing('whether the thermostat can run a heat pump', 'controls not checked')];
    if (controls.thermostatHeatPump === false) {
      return [
        tools.finding({
          severity: 'blocker',
          title: 'Thermostat cannot run a heat pump',
          detail: 'The thermostat cannot run a heat pump: it has no reversing-valve (O/B) output, so the system will not heat with the heat pump.',
          fix: 'Fit a heat-pump thermostat (O/B output, auxiliary heat stage), with enough thermostat wire conductors for it; switch power off before rewiring.',
          values: { thermostatHeatPump: false },
        }),
      ];
    }
    const heatKitKw = pairing.airHandler?.spec.heatKitKw;
    if (heatKitKw !== undefined && heatKitKw > 0 && controls.auxHeatStages === 0) {
      return [
        tools.finding({
          severity: 'caution',
          title: `${heatKitKw} kW heat kit, but no auxiliary heat stage on the thermostat`,
          detail: `The air handler has a ${heatKitKw} kW heat kit but the thermostat is set up with no auxiliary heat stage: the strips will never be called (no backup or defrost heat).`,
          fix: 'Configure or fit a thermostat with an auxiliary heat stage (W2/AUX) and wire it to the heat kit.',
          values: { heatKitKw, auxHeatStages: 0 },
        }),
      ];
    }
    return [];
  },
});
