// Pricing an option: cost of the lines and labor, a markup or a target margin, then sales tax on the
// taxable (equipment and material) lines only. Markup vs margin: sell = cost × (1 + m) vs cost / (1 − g)
// (the textbook definitions of markup on cost and gross margin on price; common practice (no source)).
import type { OptionLine, OptionPrice } from '../schemas/options';
import { roundCents } from './money';

/** What pricing reads of a line: the option line's own fields. */
export type PriceLine = Pick<OptionLine, 'quantity' | 'unitPriceCents' | 'taxable'>;

/** The option's terms: labor, and the pricing, percent and tax rate the option view reports. */
export type PriceTerms = Pick<OptionPrice, 'pricing' | 'pct' | 'taxRatePct'> & {
  laborHours: number;
  laborRateCents: number;
};

/** The breakdown is the option view's `price` itself (shared/schemas/options.ts), so the two never drift. */
export type PriceBreakdown = OptionPrice;

/** A line's amount in cents: quantity × unit price (cents), rounded half up to the cent. */
export function lineExtendedCents(quantity: number, unitPriceCents: number): number {
  return roundCents(quantity * unitPriceCents);
}

/** The factor from cost to selling price: 1 + markup, or 1 / (1 − margin). */
export function sellFactor(pricing: 'markup' | 'margin', pct: number): number {
  if (pricing === 'markup') return 1 + pct / 100;
  if (pct >= 100) throw new RangeError('a target margin must be below 100 %');
  return 1 / (1 - pct / 100);
}

/** The customer price of an option in cents, with each step kept and described. */
export function priceOption(lines: PriceLine[], terms: PriceTerms): PriceBreakdown {
  let taxableCost = 0;
  let otherCost = 0;
  for (const line of lines) {
    const amount = lineExtendedCents(line.quantity, line.unitPriceCents);
    if (line.taxable) taxableCost += amount;
    else otherCost += amount;
  }
  const laborCostCents = roundCents(terms.laborHours * terms.laborRateCents);
  const factor = sellFactor(terms.pricing, terms.pct);
  const taxableSellCents = roundCents(taxableCost * factor);
  const otherSellCents = roundCents(otherCost * factor);
  const laborSellCents = roundCents(laborCostCents * factor);
  const materialSellCents = taxableSellCents + otherSellCents;
  const subtotalCents = materialSellCents + laborSellCents;
  const taxCents = roundCents((taxableSellCents * terms.taxRatePct) / 100);
  const costCents = taxableCost + otherCost + laborCostCents;
  const grossMarginPct = subtotalCents > 0 ? Math.round(((subtotalCents - costCents) / subtotalCents) * 1000) / 10 : 0;
  const how = terms.pricing === 'markup' ? `a ${terms.pct} % markup on cost` : `a ${terms.pct} % target margin on the selling price`;
  return {
    materialCostCents: taxableCost + otherCost,
    laborCostCents,
    costCents,
    pricing: terms.pricing,
    pct: terms.pct,
    materialSellCents,
    laborSellCents,
    subtotalCents,
    taxableSellCents,
    taxRatePct: terms.taxRatePct,
    taxCents,
    totalCents: subtotalCents + taxCents,
    grossMarginPct,
    notes: [
      `Lines and labor are priced at ${how}.`,
      `Sales tax of ${terms.taxRatePct} % applies to the equipment and material lines at their selling price; labor and fee lines are not taxed (check your state's rules for contractors).`,
      'Amounts are rounded half up to the cent at each step: each line, each marked-up subtotal, the tax.',
    ],
  };
}
