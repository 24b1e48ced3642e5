import { NO_RATED_SEER2, type EnergyLeg, type OptionView } from '@/shared/schemas/options';
import { verdictWords } from '@/components/check/verdict-words';
import { moneyText, numberText, type FigureRow } from './option-words';

/** The rated figures in one line ("SEER2 16 · EER2 12.5 · HSPF2 8.1"), or a dash when none is known. */
export function ratedText(o: Pick<OptionView, 'efficiency'>): string {
  const e = o.efficiency;
  const parts = [
    e.seer2 !== undefined ? `SEER2 ${numberText(e.seer2)}` : null,
    e.eer2 !== undefined ? `EER2 ${numberText(e.eer2)}` : null,
    e.hspf2 !== undefined ? `HSPF2 ${numberText(e.hspf2)}` : null,
  ].filter(Boolean);
  return parts.length ? parts.join(' · ') : 'Not rated';
}

export function regionalText(o: Pick<OptionView, 'regional'>): string {
  const r = o.regional;
  if (r.meets === null) return 'Not known (state or figures missing)';
  if (r.meets) return `Meets the ${r.regionName ?? r.state} minimum`;
  return `Below the ${r.regionName ?? r.state} minimum${r.shortfalls.length ? `: ${r.shortfalls.join('; ')}` : ''}`;
}

export function rebateText(o: Pick<OptionView, 'rebateTiers'>): string {
  if (o.rebateTiers.length === 0) return 'No rebate tiers set up';
  const met = o.rebateTiers.filter((t) => t.met).map((t) => t.name);
  return met.length ? `Meets: ${met.join(', ')}` : 'Meets none';
}

export function pricingText(o: Pick<OptionView, 'price'>): string {
  return o.price.pricing === 'margin' ? `Target margin ${numberText(o.price.pct)}%` : `Markup ${numberText(o.price.pct)}%`;
}

export function laborText(o: Pick<OptionView, 'laborHours' | 'laborRateCents' | 'price'>): string {
  return `${numberText(o.laborHours, 2)} h × ${moneyText(o.laborRateCents)} = ${moneyText(o.price.laborCostCents)}`;
}

export function taxText(o: Pick<OptionView, 'price'>): string {
  return `${numberText(o.price.taxRatePct, 3)}% of ${moneyText(o.price.taxableSellCents)} = ${moneyText(o.price.taxCents)}`;
}

/** What an energy row says when the server left the figure out, with its reason. */
export function notWorkedOutText(o: Pick<OptionView, 'energy'>): string {
  return `Not worked out: ${o.energy.notComputed ?? NO_RATED_SEER2}`;
}

/** Whether the option's energy figures mean anything: without a rated SEER2 the server leaves them out. */
export function hasEnergyFigures(o: Pick<OptionView, 'energy'>): boolean {
  return o.energy.cooling !== null;
}

/** "$X a year (now $Y)" for one season, or a dash when the option has no such season. */
function seasonText(season: EnergyLeg | null | undefined): string {
  if (!season) return '—';
  return `${moneyText(season.newCostCents, 0)} a year, ${numberText(season.newKwh, 0)} kWh (now ${moneyText(season.existingCostCents, 0)})`;
}

/** Yearly energy cost of an option: cooling plus heating where compared (cents); null when not worked out. */
export function annualCostCents(o: Pick<OptionView, 'energy'>): number | null {
  if (!o.energy.cooling) return null;
  return o.energy.cooling.newCostCents + (o.energy.heating?.newCostCents ?? 0);
}

/** Yearly energy cost of the existing system, as the first option with a cooling comparison states it (cents). */
export function existingAnnualCostCents(options: Pick<OptionView, 'energy'>[]): number | null {
  const first = options.find((o) => o.energy.cooling !== null);
  if (!first?.energy.cooling) return null;
  return first.energy.cooling.existingCostCents + (first.energy.heating?.existingCostCents ?? 0);
}

/**
 * Every figure the option cards show, one row per figure and one value per option, in card order.
 * The screen marks the rows whose values differ between options.
 */
export function optionFigureRows(options: OptionView[]): FigureRow[] {
  const row = (key: string, label: string, value: (o: OptionView) => string): FigureRow => ({ key, label, values: options.map(value) });
  return [
    row('total', 'Customer price', (o) => moneyText(o.price.totalCents)),
    row('outdoor', 'Outdoor unit', (o) => o.parts.outdoor.model),
    row('indoorCoil', 'Indoor coil', (o) => (o.parts.indoorCoil ? `${o.parts.indoorCoil.model}${o.parts.indoorCoil.kept ? ' (kept)' : ''}` : '—')),
    row('airHandler', 'Air handler or furnace', (o) => (o.parts.airHandler ? `${o.parts.airHandler.model}${o.parts.airHandler.kept ? ' (kept)' : ''}` : '—')),
    row('verdict', 'Check', (o) => verdictWords(o.check).word),
    row('rated', 'Rated', ratedText),
    row('regional', 'Regional minimum', regionalText),
    row('rebate', 'Rebate tiers', rebateText),
    row('materials', 'Parts and materials (cost)', (o) => moneyText(o.price.materialCostCents)),
    row('labor', 'Labor (cost)', laborText),
    row('pricing', 'Pricing', pricingText),
    row('tax', 'Tax', taxText),
    row('cooling', 'Cooling energy', (o) => (hasEnergyFigures(o) ? seasonText(o.energy.cooling) : notWorkedOutText(o))),
    row('heating', 'Heating energy', (o) => (hasEnergyFigures(o) ? seasonText(o.energy.heating) : notWorkedOutText(o))),
    row('saving', 'Saving a year', (o) => (o.energy.annualSavingCents !== null ? moneyText(o.energy.annualSavingCents, 0) : notWorkedOutText(o))),
    row('payback', 'Payback', (o) => (o.energy.annualSavingCents !== null ? o.energy.paybackText : notWorkedOutText(o))),
  ];
}
