import { getRefrigerant } from '../../refrigerants';
import { defineRule } from '../define-rule';
import { holdsRefrigerantIndoors } from '../facts';
import { listOf, withArticle } from '../text';
import type { Finding } from '../types';

/**
 * A kept part that carried a mineral-oil refrigerant, going to a POE-oil one: mineral oil
 * left behind does not mix with POE and can log in the evaporator and starve the compressor. Only
 * parts that carried refrigerant count: the line set, a kept coil, an air handler with its own coil
 * — never a furnace or a blower cabinet whose coil is a separate part.
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
        findings.push(tools.missing('refrigerant the kept line set ran before', 'oil compatibility of the line set not checked'));
      }
    }
    const indoor: { part: string; p?: { kept: boolean; spec: { refrigerants?: string[] } } }[] = [{ part: 'indoor coil', p: pairing.indoorCoil }];
    if (pairing.airHandler && holdsRefrigerantIndoors(pairing.airHandler.spec, pairing.indoorCoil !== undefined)) indoor.push({ part: 'air handler', p: pairing.airHandler });
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
      const olds = [...new Set(kept.map((k) => k.old))];
      const parts = listOf(kept.map((k, i) => (i === 0 ? k.part : `the ${k.part}`)));
      const ran = kept.length === 1 ? `, which ran ${olds[0]},` : olds.length === 1 ? `, which both ran ${olds[0]},` : '';
      const from = olds.length === 1 ? '' : ` from ${listOf(olds)}`;
      findings.push(
        tools.finding({
          severity: 'caution',
          title: `Kept ${listOf(kept.map((k) => k.part))} ${kept.length === 1 ? 'holds' : 'hold'} mineral oil from ${listOf(olds)}`,
          detail: `The kept ${parts}${ran} ${kept.length === 1 ? 'carries' : 'carry'} mineral oil${from} into ${withArticle(system)} system that runs POE oil.`,
          fix: `Flush the kept ${listOf(kept.map((k) => k.part))} with an approved flush and blow out with dry nitrogen, fit a new filter-drier${pairing.outdoor.spec.systemType === 'heat-pump' ? ' (bi-flow)' : ''}, and evacuate to 500 microns; follow the equipment instructions, which may require new parts. Work by certified technicians; recover all refrigerant.`,
          values: { systemRefrigerant: system, keptParts: kept.map((k) => k.part).join(';'), previousRefrigerant: kept[0].old },
        }),
      );
    }
    for (const part of unsure) {
      findings.push(tools.missing(`refrigerant the kept ${part} ran before`, `mineral-oil residue in the ${part} not checked`));
    }
    return findings;
  },
});

function isMineral(refrigerant: string): boolean {
  return getRefrigerant(refrigerant)?.oil === 'mineral';
}

