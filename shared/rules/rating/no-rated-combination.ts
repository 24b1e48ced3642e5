import { defineRule } from '../define-rule';
import { findRatedCombination, ratingModelsMissing } from '../rated-match';

/** No certified combination for these exact models: it may run, but efficiency and rebate claims need a certified match. */
export const noRatedCombination = defineRule({
  id: 'rating.no-rated-combination',
  title: 'Certified rated combination',
  basis: { kind: 'regulation', citation: '10 CFR 429.16 (certification of split-system combinations); AHRI 210/240 ratings' },
  evaluate(pairing, _context, tools) {
    if (pairing.ratedCombinations === undefined) return [tools.missing('rated-combination lookup (offline)', 'certified rating not checked')];
    const missingModels = ratingModelsMissing(pairing);
    if (missingModels) return [tools.missing(missingModels, 'certified rating not looked up')];
    if (findRatedCombination(pairing)) return [];
    const ah = pairing.indoorCoil ? pairing.airHandler?.spec.model : undefined;
    return [
      tools.finding({
        severity: 'caution',
        title: 'No certified rating found for these models',
        detail: `No certified rating found for ${pairing.outdoor.spec.model} with ${pairing.indoorCoil?.spec.model ?? pairing.airHandler?.spec.model}${ah ? ` on ${ah}` : ''}: its SEER2/EER2/HSPF2 are not established.`,
        fix: 'Do not quote efficiency figures or promise a rebate for this combination; pick a coil (and air handler) with a certified rating, or confirm one with the manufacturer.',
        values: { outdoorModel: pairing.outdoor.spec.model ?? null, indoorModel: pairing.indoorCoil?.spec.model ?? pairing.airHandler?.spec.model ?? null, airHandlerModel: ah ?? null },
      }),
    ];
  },
});
