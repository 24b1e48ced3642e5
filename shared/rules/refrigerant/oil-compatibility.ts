import { getRefrigerant } from '../../refrigerants';
import { defineRule } from '../define-rule';
import type { Finding } from '../types';

/**
 * A kept line set or coil that ran a mineral-oil refrigerant, going to a POE-oil one:
 * mineral oil left behind does not mix with POE and can log in the evaporator and starve the compressor.
 */
export const oilCompatibility = defineRule({
  id: 'refrigerant.oil-compatibility',
  title: 'Oil left in kept parts',
  basis: { kind: 'common-practice', citation: 'Refrigerant retrofit practice: mineral-oil residue in a POE system; equipment installation instructions' },
  evaluate(pairing, _context, tools) {
    const system = pairing.outdoor.spec.refrigerant;
    if (getRefrigerant(system)?.oil !== 'poe') return [];
    const findings: Finding[] = [];
    const previous = pairing.lineSet?.previousRefrigerant;
    const kept: { part: string; old: string }[] = [];
    const unsure: string[] = [];

    if (pairing.lineSet?.reused) {
      if (previous) {
        if (isMineral(previous)) kept.push({ part: 'line set', old: previous });
      } else {
        findings.push(tools.missing('previous refrigerant of the kept line set', 'oil compatibility of the line set not checked'));
      }
    }
    const indoor = [
      { part: 'indoor coil', p: pairing.indoorCoil },
      { part: 'air handler', p: pairing.airHandler },
    ];
    for (const { part, p } of indoor) {
      if (!p?.kept) continue;
      const listing = p.spec.refrigerants ?? [];
      if (previous) {
        if (isMineral(previous)) kept.push({ part, old: previous });
      } else if (listing.length > 0 && listing.every(isMineral)) {
        // Listed only for mineral-oil refrigerants: that is what it ran.
        kept.push({ part, old: listing.join('/') });
      } else if (listing.some(isMineral)) {
        unsure.push(part);
      }
    }

    if (kept.length > 0) {
      const parts = kept.map((k) => `${k.part} (ran ${k.old})`).join(' and ');
      findings.push(
        tools.finding({
          severity: 'caution',
          detail: `The kept ${parts} carries mineral oil into a ${system} system that runs POE oil.`,
          fix: `Flush the kept ${kept.map((k) => k.part).join(' and ')} with an approved flush and blow out with dry nitrogen, fit a new filter-drier${pairing.outdoor.spec.systemType === 'heat-pump' ? ' (bi-flow)' : ''}, and evacuate to 500 microns; follow the equipment instructions, which may require new parts. Work by certified technicians; recover all refrigerant.`,
          values: { systemRefrigerant: system, keptParts: kept.map((k) => k.part).join(';'), previousRefrigerant: kept[0].old },
        }),
      );
    }
    for (const part of unsure) {
      findings.push(tools.missing(`refrigerant the kept ${part} ran before (line set previous refrigerant)`, `mineral-oil residue in the ${part} not checked`));
    }
    return findings;
  },
});

function isMineral(refrigerant: string): boolean {
  return getRefrigerant(refrigerant)?.oil === 'mineral';
}
