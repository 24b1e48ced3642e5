import { defineRule } from '../define-rule';
import { describeMetering, isHeatPump, meteringInUse } from '../facts';
import { capitalize } from '../text';

/**
 * In heating the indoor coil is the condenser and liquid leaves it backwards through the indoor
 * metering device. It must pass flow that way: a piston in a flowrator-style body that lifts off its
 * seat, a bidirectional TXV/EEV, or a one-way TXV with a check-valve bypass. Only the spec's own
 * `bidirectional` flag says which.
 */
export const heatPumpBidirectional = defineRule({
  id: 'metering.heat-pump-bidirectional',
  title: 'Heat pump metering passes both ways',
  basis: { kind: 'common-practice', citation: 'Heat pump refrigerant circuit (reverse flow through the indoor metering device in heating); outdoor unit installation instructions' },
  evaluate(pairing, _context, tools) {
    if (!isHeatPump(pairing)) return [];
    const m = meteringInUse(pairing);
    if (!m || m.type === 'none') return [];
    if (m.bidirectional === true) return [];
    if (m.bidirectional === undefined) {
      return [tools.missing(`whether ${describeMetering(m)} passes flow both ways`, 'heat-pump metering not checked')];
    }
    return [
      tools.finding({
        severity: 'blocker',
        title: `${capitalize(describeMetering(m))} passes flow one way only; a heat pump needs both`,
        detail: `Heat pump: ${describeMetering(m)} passes flow one way only, so in heating the liquid leaving the indoor coil is metered a second time (low heating capacity, high head, possible compressor damage).`,
        fix:
          m.type === 'piston'
            ? 'Use a piston in a bidirectional (flowrator-style) body, or the heat-pump metering kit the outdoor unit lists.'
            : 'Fit a bidirectional expansion valve listed for this refrigerant, or add a check-valve bypass around the valve as its maker shows.',
        values: { meteringInUse: m.type, meteringSource: m.source, bidirectional: false },
      }),
    ];
  },
});
