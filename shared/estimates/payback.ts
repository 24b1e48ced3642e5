// Simple payback = first cost / annual saving (no discounting, no price escalation): the usual
// definition in energy-efficiency screening, e.g. ENERGY STAR's calculators; common practice.
import { formatDollars } from './money';

/** Simple payback in years (one decimal) from a price and an annual saving, both in cents; null when nothing is saved. */
export function simplePaybackYears(priceCents: number, annualSavingCents: number): number | null {
  if (annualSavingCents <= 0) return null;
  return Math.round((priceCents / annualSavingCents) * 10) / 10;
}

/** The payback in words with its arithmetic. */
export function paybackText(priceCents: number, annualSavingCents: number): string {
  const years = simplePaybackYears(priceCents, annualSavingCents);
  if (years === null)
    return `No energy saving over the existing system, so no payback from energy alone (price ${formatDollars(priceCents)}).`;
  return `${formatDollars(priceCents)} ÷ ${formatDollars(annualSavingCents)} saved a year = ${years} years simple payback.`;
}
