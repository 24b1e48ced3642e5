import { defineRule } from '../define-rule';
import { capitalize, listOf, withArticle } from '../text';
import type { Finding } from '../types';
import { cabinetName } from '../words';

/** The indoor coil and air handler must be listed for the system's refrigerant (DESIGN §3). */
export const coilListing = defineRule({
  id: 'refrigerant.coil-listing',
  title: 'Indoor coil refrigerant listing',
  basis: { kind: 'standard', citation: 'UL 60335-2-40 listing and the equipment installation instructions (refrigerants listed on the nameplate)' },
  evaluate(pairing, _context, tools) {
    const system = pairing.outdoor.spec.refrigerant;
    const findings: Finding[] = [];
    const parts = [
      { label: 'indoor coil', spec: pairing.indoorCoil?.spec },
      { label: pairing.airHandler ? cabinetName(pairing.airHandler.spec) : 'air handler', spec: pairing.airHandler?.spec },
    ];
    for (const { label, spec } of parts) {
      const listed = spec?.refrigerants;
      if (!listed || listed.includes(system)) continue;
      findings.push(
        tools.finding({
          severity: 'blocker',
          title: `${capitalize(label)} is listed for ${listOf(listed, 'or')}, not ${system}`,
          detail: `The ${label}${spec.model ? ` ${spec.model}` : ''} is listed for ${listOf(listed)}, not for the outdoor unit's ${system}.`,
          fix: `Use ${withArticle(label)} listed for ${system}; a part outside its listing may not hold the pressure or suit the oil.`,
          values: { part: label, systemRefrigerant: system, listedRefrigerants: listed.join(';') },
        }),
      );
    }
    return findings;
  },
});
