import { describe, expect, it } from 'vitest';
import { lineExtendedCents, priceOption, sellFactor } from '../../../shared/estimates/option-price';

// Worked by hand (markup on cost / margin on price: textbook definitions, common practice (no source)).
const lines = [
  { quantity: 1, unitPriceCents: 250000, taxable: true }, // outdoor unit
  { quantity: 1, unitPriceCents: 90000, taxable: true }, // coil
  { quantity: 25, unitPriceCents: 450, taxable: true }, // line set, 25 ft
  { quantity: 3, unitPriceCents: 1500, taxable: true }, // refrigerant, 3 lb
  { quantity: 1, unitPriceCents: 7500, taxable: false }, // permit fee
];

describe('option price', () => {
  it('when a line has a fractional amount, then it rounds half up to the cent', () => {
    expect(lineExtendedCents(2.5, 1999)).toBe(4998); // 4997.5 → 4998, by hand
    expect(lineExtendedCents(1.15, 100)).toBe(115); // 114.999… in binary → 115, by hand
  });

  it('when priced at a 35 % markup and 7 % tax, then tax falls on the equipment and material lines only', () => {
    const p = priceOption(lines, { laborHours: 8, laborRateCents: 9500, pricing: 'markup', pct: 35, taxRatePct: 7 });
    // By hand: material cost 250000 + 90000 + 11250 + 4500 + 7500 = 363250; labor 8 × 9500 = 76000.
    expect(p.materialCostCents).toBe(363250);
    expect(p.laborCostCents).toBe(76000);
    expect(p.costCents).toBe(439250);
    // Taxable 355750 × 1.35 = 480262.5 → 480263; fee 7500 × 1.35 = 10125; labor 76000 × 1.35 = 102600.
    expect(p.taxableSellCents).toBe(480263);
    expect(p.materialSellCents).toBe(490388);
    expect(p.laborSellCents).toBe(102600);
    expect(p.subtotalCents).toBe(592988);
    // Tax 480263 × 0.07 = 33618.41 → 33618; total 592988 + 33618 = 626606.
    expect(p.taxCents).toBe(33618);
    expect(p.totalCents).toBe(626606);
    // Margin (592988 − 439250) / 592988 = 25.93 % → 25.9, by hand.
    expect(p.grossMarginPct).toBe(25.9);
    expect(p.notes.join(' ')).toMatch(/labor and fee lines are not taxed/);
  });

  it('when priced at a 30 % target margin, then the margin on the selling price is 30 %', () => {
    expect(sellFactor('margin', 30)).toBeCloseTo(1 / 0.7, 12); // sell = cost / (1 − g), by definition
    const p = priceOption([{ quantity: 1, unitPriceCents: 70000, taxable: true }], {
      laborHours: 0,
      laborRateCents: 0,
      pricing: 'margin',
      pct: 30,
      taxRatePct: 0,
    });
    expect(p.subtotalCents).toBe(100000); // 70000 / 0.7, by hand
    expect(p.grossMarginPct).toBe(30);
  });
});
