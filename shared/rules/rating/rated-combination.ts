import { defineRule } from '../define-rule';
import { findRatedCombination } from '../rated-match';

/** Info: the certified figures of the matched combination. */
export const ratedCombination = defineRule({
  id: 'rating.rated-combination',
  title: 'Certified rating of this combination',
  basis: { kind: 'regulation', citation: '10 CFR 429.16 (certification of split-system combinations); AHRI 210/240 ratings' },
  evaluate(pairing, _context, tools) {
    const combo = findRatedCombination(pairing);
    if (!combo) return [];
    const parts: string[] = [];
    if (combo.coolingBtuh !== undefined) parts.push(`${combo.coolingBtuh} Btu/h cooling`);
    if (combo.seer2 !== undefined) parts.push(`SEER2 ${combo.seer2}`);
    if (combo.eer2 !== undefined) parts.push(`EER2 ${combo.eer2}`);
    if (combo.hspf2 !== undefined) parts.push(`HSPF2 ${combo.hspf2}`);
    return [
      tools.finding({
        severity: 'info',
        title: parts.length ? `Certified rating: ${parts.join(', ')}` : 'Certified combination found',
        detail: `Certified combination${combo.reference ? ` ${combo.reference}` : ''} (row ${combo.outdoorModel} with ${combo.indoorModel}${combo.airHandlerModel ? ` on ${combo.airHandlerModel}` : ''}): ${parts.length ? parts.join(', ') : 'no figures given'}.`,
        fix: '',
        values: {
          reference: combo.reference ?? null,
          matchedOutdoorModel: combo.outdoorModel,
          matchedIndoorModel: combo.indoorModel,
          matchedAirHandlerModel: combo.airHandlerModel ?? null,
          coolingBtuh: combo.coolingBtuh ?? null,
          seer2: combo.seer2 ?? null,
          eer2: combo.eer2 ?? null,
          hspf2: combo.hspf2 ?? null,
        },
      }),
    ];
  },
});
