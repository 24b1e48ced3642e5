import { defineRule } from '../define-rule';
import { describeMetering, meteringInUse } from '../facts';

/** An outdoor unit whose instructions call for an expansion valve, metered by a fixed orifice. */
export const typeRequired = defineRule({
  id: 'metering.type-required',
  title: 'Metering device type',
  basis: { kind: 'common-practice', citation: "Outdoor unit installation instructions (required indoor metering device); AHRI 210/240 ratings are for the listed metering" },
  evaluate(pairing, _context, tools) {
    const m = meteringInUse(pairing);
    if (!m) return [];
    const required = pairing.outdoor.spec.meteringRequired;
    // A coil with no metering device and no kit is reported once, by refrigerant.metering-device.
    if (m.type !== 'piston') return [];
    if (required === undefined) return [tools.missing('metering device the outdoor unit requires', 'piston use not checked')];
    if (required !== 'txv') return [];
    return [
      tools.finding({
        severity: 'blocker',
        title: `The unit needs an expansion valve, not ${m.source === 'kit' ? 'a field piston kit' : "the coil's piston"}`,
        detail: `The outdoor unit requires an expansion valve; ${describeMetering(m)} is a fixed orifice.`,
        fix: "Replace the piston with the TXV kit listed for this outdoor unit and refrigerant (braze with a nitrogen purge, then pressure test and evacuate).",
        values: { meteringInUse: m.type, meteringSource: m.source, meteringRequired: required },
      }),
    ];
  },
});
