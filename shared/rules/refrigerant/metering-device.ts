import { normalizeRefrigerantName } from '../../schemas/fields';
import { defineRule } from '../define-rule';
import { describeMetering, meteringInUse } from '../facts';
import { capitalize, withArticle } from '../text';

/** The metering device in use must be rated for the system's refrigerant (DESIGN §3). */
export const meteringDevice = defineRule({
  id: 'refrigerant.metering-device',
  title: 'Metering device refrigerant',
  basis: { kind: 'common-practice', citation: "Equipment installation instructions: metering device rated for the system's refrigerant" },
  evaluate(pairing, _context, tools) {
    const system = pairing.outdoor.spec.refrigerant;
    const m = meteringInUse(pairing);
    if (!m) return pairing.airHandler ? [tools.missing('indoor coil or metering device', 'metering device refrigerant not checked')] : [];
    const name = describeMetering(m);
    if (m.type === 'none') {
      return [
        tools.finding({
          severity: 'caution',
          title: 'The indoor coil has no metering device',
          detail: `The indoor coil has no metering device and no field kit is given; ${withArticle(system)} system needs one.`,
          fix: `Fit a metering device kit rated for ${system} and the outdoor unit's tonnage, per the equipment instructions.`,
          values: { systemRefrigerant: system, meteringType: 'none' },
        }),
      ];
    }
    if (!m.refrigerant) {
      if (m.type === 'piston') {
        return [
          tools.finding({
            severity: 'caution',
            title: `${capitalize(name)}: refrigerant not known`,
            detail: `The refrigerant of ${name} is not given; a piston sized for another refrigerant meters the ${system} system wrongly.`,
            fix: `Check the piston's marking against the outdoor unit's specified piston for ${system} and swap it if it differs.`,
            values: { systemRefrigerant: system, meteringType: m.type, meteringRefrigerant: null },
          }),
        ];
      }
      return [tools.missing('metering device refrigerant', `${name} not checked against ${system}`)];
    }
    const rated = String(normalizeRefrigerantName(m.refrigerant));
    if (rated === system) return [];
    return [
      tools.finding({
        severity: 'blocker',
        title: `${m.type === 'piston' ? 'Piston' : 'Valve'} is for ${rated}; the unit runs ${system}`,
        detail: `${capitalize(name)} is rated for ${rated}, but the outdoor unit runs ${system}.`,
        fix: `Replace it with ${m.type === 'piston' ? 'a piston' : 'a valve'} rated for ${system} (match the outdoor unit's tonnage); recover the refrigerant and braze under a nitrogen purge, by certified technicians.`,
        values: { systemRefrigerant: system, meteringRefrigerant: rated, meteringType: m.type, source: m.source },
      }),
    ];
  },
});
