import { REGION_NAMES, regionOfState } from '../../efficiency/regions';
import { defineRule } from '../define-rule';
import { findRatedCombination, ratingModelsMissing } from '../rated-match';

/** Certified combination basis: the certification rule and the regional standard it serves. */
const REGIONAL_BASIS = {
  kind: 'regulation' as const,
  citation: '10 CFR 430.32(c) regional standards for split air conditioners apply to the installed combination; 10 CFR 429.16 (certification of split-system combinations)',
};

/**
 * No certified combination for these models: it may run, but efficiency and rebate claims need a
 * certified match (a caution). In the Southeast and Southwest the regional standard applies to the
 * installed split air conditioner, which then cannot be shown to meet it (a blocker).
 */
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
    const models = `${pairing.outdoor.spec.model} with ${pairing.indoorCoil?.spec.model ?? pairing.airHandler?.spec.model}${ah ? ` on ${ah}` : ''}`;
    const values = { outdoorModel: pairing.outdoor.spec.model ?? null, indoorModel: pairing.indoorCoil?.spec.model ?? pairing.airHandler?.spec.model ?? null, airHandlerModel: ah ?? null };
    const region = regionOfState(pairing.site?.state);
    if (pairing.outdoor.spec.systemType === 'ac' && (region === 'southeast' || region === 'southwest')) {
      const name = REGION_NAMES[region];
      return [
        tools.finding({
          severity: 'blocker',
          title: `No certified rating: this split air conditioner cannot be shown to meet the ${name} regional standard`,
          detail: `No certified rating found for ${models}; in ${pairing.site!.state} (${name} region) the regional standard applies to the installed combination, so without one it cannot be shown to meet the regional standard.`,
          fix: 'Choose an outdoor unit, coil (and air handler or furnace) whose certified combination meets the regional minimum, or confirm a certified rating for these models with the manufacturer.',
          basis: REGIONAL_BASIS,
          values: { ...values, state: pairing.site!.state ?? null, region: name },
        }),
      ];
    }
    return [
      tools.finding({
        severity: 'caution',
        title: 'No certified rating found for these models',
        detail: `No certified rating found for ${models}: its SEER2/EER2/HSPF2 are not established.`,
        fix: 'Do not quote efficiency figures or promise a rebate for this combination; pick a coil (and air handler) with a certified rating, or confirm one with the manufacturer.',
        values,
      }),
    ];
  },
});
