import { adviseRepairOrReplace } from '../../shared/estimates/repair-or-replace';
import type { RepairOrReplaceInput, RepairOrReplaceResult } from '../../shared/schemas/options';
import type { AppContext } from '../context';
import { listOptions } from './options.service';
import { getShopSettings } from './shop-settings.service';

/** POST /api/jobs/:id/repair-or-replace: the rule of thumb on the repair, each option's saving and payback, a recommendation. */
export async function repairOrReplace(ctx: AppContext, jobId: number, input: RepairOrReplaceInput): Promise<RepairOrReplaceResult> {
  const { ageYears, repairQuoteCents, refrigerant, refrigerantLbs = 0, refrigerantCentsPerLb = 0, ...energyFields } = input;
  // The existing system's age drives the energy estimate too, unless its figures are given.
  const energy = { ...energyFields, existingAgeYears: energyFields.existingAgeYears ?? ageYears };
  const [{ items }, { settings }] = await Promise.all([listOptions(ctx, jobId, energy), getShopSettings(ctx)]);
  const options = items.map((o) => ({
    optionId: o.id,
    name: o.name,
    totalCents: o.price.totalCents,
    annualSavingCents: o.energy.annualSavingCents,
    paybackYears: o.energy.paybackYears,
    verdict: o.check.verdict,
    compatible: o.check.verdict !== 'incompatible',
  }));
  const advice = adviseRepairOrReplace(
    { ageYears, repairQuoteCents, refrigerant, refrigerantLbs, refrigerantCentsPerLb, threshold: settings.repairReplaceThreshold },
    options,
  );
  return {
    ageYears,
    repairQuoteCents,
    ...(refrigerant ? { refrigerant } : {}),
    refrigerantLbs,
    refrigerantCentsPerLb,
    refrigerantCostCents: advice.refrigerantCostCents,
    repairTotalCents: advice.repairTotalCents,
    ruleOfThumb: {
      product: advice.product,
      threshold: settings.repairReplaceThreshold,
      exceeds: advice.exceeds,
      basis: 'common practice (no source)',
      text: advice.ruleText,
    },
    options: options.map(({ compatible: _c, ...o }) => o),
    recommendation: advice.recommendation,
    recommendationText: advice.recommendationText,
    arithmetic: advice.arithmetic,
    notes: [...advice.notes, ...(items[0]?.energy.assumptions ?? [])],
  };
}
