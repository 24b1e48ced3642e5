import { regionalMinimum } from '../../shared/efficiency';
import { efficiencyFigures, type EfficiencyFigures } from '../../shared/efficiency/pairing-figures';
import { priceOption } from '../../shared/estimates/option-price';
import type { Pairing } from '../../shared/rules/types';
import type { EnergyQuery, OptionPartSummary, OptionView, ShopRebateTier, ShopSettings } from '../../shared/schemas/options';
import type { AppContext } from '../context';
import type { JobRow } from '../jobs/job.entity';
import { checkOption } from './option-check';
import { energyComparison } from './option-energy';
import { viewLines } from './option-lines';
import type { JobOptionRow } from './option.entity';

type Figures = Pick<EfficiencyFigures, 'seer2' | 'eer2' | 'hspf2'>;
const METRICS = [
  ['seer2', 'SEER2'],
  ['eer2', 'EER2'],
  ['hspf2', 'HSPF2'],
] as const;

/** Each minimum the figures miss, in words ("SEER2 14.3 needed, has 13.4"; "HSPF2 not known"). */
function shortfalls(min: Figures, has: Figures): { short: string[]; unknown: string[] } {
  const short: string[] = [];
  const unknown: string[] = [];
  for (const [key, label] of METRICS) {
    const need = min[key];
    if (need === undefined) continue;
    const value = has[key];
    if (value === undefined) unknown.push(`${label} not known (${need} needed)`);
    else if (value < need) short.push(`${label} ${need} needed, has ${value}`);
  }
  return { short, unknown };
}

/** The regional minimum for the job's state and whether the option's figures meet it. */
export function regionalView(state: string, systemType: 'ac' | 'heat-pump', figures: EfficiencyFigures): OptionView['regional'] {
  const min = regionalMinimum({ state, systemType, coolingBtuh: figures.coolingBtuh, seer2: figures.seer2 });
  if (!min) return { state, meets: null, shortfalls: [`No regional minimum known for ${state}.`] };
  const { short, unknown } = shortfalls(min, figures);
  return {
    state,
    regionName: min.regionName,
    minimum: { seer2: min.seer2, eer2: min.eer2, hspf2: min.hspf2, basis: min.basis },
    meets: short.length > 0 ? false : unknown.length > 0 ? null : true,
    shortfalls: [...short, ...unknown],
  };
}

/** Whether the figures meet each of the shop's rebate tiers (an unknown figure does not meet a tier). */
export function rebateView(tiers: ShopRebateTier[], figures: Figures): OptionView['rebateTiers'] {
  return tiers.map((tier) => {
    const { short, unknown } = shortfalls(tier, figures);
    return { name: tier.name, met: short.length === 0 && unknown.length === 0, missing: [...short, ...unknown] };
  });
}

function partSummary(
  part: Pairing['outdoor'] | Pairing['indoorCoil'] | Pairing['airHandler'] | Pairing['metering'],
): OptionPartSummary | undefined {
  if (!part) return undefined;
  const spec = part.spec as { model?: string; brand?: string };
  const model = spec.model ?? 'typed from the nameplate';
  return {
    ...(part.id !== undefined ? { id: part.id } : {}),
    model,
    ...(spec.brand ? { brand: spec.brand } : {}),
    kept: part.kept,
    description: `${[spec.brand, model].filter(Boolean).join(' ')}${part.kept ? ' (kept)' : ' (new)'}`,
  };
}

/** The full view of a saved option: price, check, rated figures, compliance, rebates, energy and payback. */
export async function optionView(
  ctx: AppContext,
  row: JobOptionRow,
  job: JobRow,
  settings: ShopSettings,
  energy: EnergyQuery,
): Promise<OptionView> {
  const { pairing, check } = await checkOption(ctx, row.content, job.state);
  const figures = efficiencyFigures(pairing);
  const systemType = pairing.outdoor.spec.systemType;
  const lines = await viewLines(ctx, row.lines);
  const c = row.content;
  const pricing = c.targetMarginPct !== undefined ? 'margin' : c.markupPct !== undefined ? 'markup' : settings.pricing;
  const pct = pricing === 'margin' ? (c.targetMarginPct ?? settings.targetMarginPct) : (c.markupPct ?? settings.markupPct);
  const laborHours = c.laborHours ?? 0;
  const laborRateCents = c.laborRateCents ?? settings.laborRateCents;
  const taxRatePct = c.taxRatePct ?? settings.taxRatePct;
  const price = priceOption(lines, { laborHours, laborRateCents, pricing, pct, taxRatePct });
  const { verdict, rulesVersion, findings, coverage } = check;
  return {
    id: row.id,
    jobId: row.jobId,
    name: row.name,
    notes: c.notes ?? null,
    revision: row.revision,
    chosen: row.chosenAt !== null,
    input: { ...c, lines: row.lines.map((l) => ({ ...l })) },
    parts: {
      outdoor: partSummary(pairing.outdoor)!,
      ...(pairing.indoorCoil ? { indoorCoil: partSummary(pairing.indoorCoil) } : {}),
      ...(pairing.airHandler ? { airHandler: partSummary(pairing.airHandler) } : {}),
      ...(pairing.metering ? { metering: partSummary(pairing.metering) } : {}),
    },
    systemType,
    lines,
    laborHours,
    laborRateCents,
    markupPct: c.markupPct ?? null,
    targetMarginPct: c.targetMarginPct ?? null,
    taxRatePct,
    price,
    check: { verdict, rulesVersion, findings, coverage },
    efficiency: figures,
    regional: regionalView(job.state, systemType, figures),
    rebateTiers: rebateView(settings.rebateTiers, figures),
    energy: energyComparison(figures, systemType === 'heat-pump', price.totalCents, energy, settings),
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
  };
}
