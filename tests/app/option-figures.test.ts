import { describe, expect, it } from 'vitest';
import type { OptionView } from '@/shared/schemas/options';
import { annualCostCents, existingAnnualCostCents, optionFigureRows, ratedText, regionalText } from '@/components/options/option-figures';
import { differingKeys } from '@/components/options/option-words';

const season = (existingCostCents: number, newCostCents: number) => ({
  existingKwh: 0,
  newKwh: 0,
  savingKwh: 0,
  existingCostCents,
  newCostCents,
  savingCents: existingCostCents - newCostCents,
});

/** Only the fields the figures read; the numbers are made up for the test (no source needed: no computation checked). */
const option = (name: string, coil: string, totalCents: number, cooling: [number, number], heating?: [number, number]): OptionView =>
  ({
    id: name.length,
    name,
    parts: { outdoor: { model: 'HP-36', kept: false, description: '' }, indoorCoil: { model: coil, kept: false, description: '' } },
    check: { verdict: 'compatible', findings: [] },
    efficiency: { source: 'rated-combination', sourceText: '', seer2: 16, eer2: 12.4, coolingBtuh: 36_000 },
    regional: { state: 'GA', regionName: 'Southeast', meets: true, shortfalls: [] },
    rebateTiers: [{ name: 'Shop tier A', met: true, missing: [] }],
    price: { materialCostCents: 1, laborCostCents: 2, pricing: 'markup', pct: 35, taxRatePct: 7, taxableSellCents: 100_000, taxCents: 7_000, totalCents },
    laborHours: 6,
    laborRateCents: 9_500,
    energy: { cooling: season(...cooling), heating: heating ? season(...heating) : undefined, annualSavingCents: 0, paybackYears: null, paybackText: 'No saving' },
  }) as unknown as OptionView;

describe('option figures', () => {
  it('when two options differ only in coil and price, then exactly those rows (and the costs that follow) are marked', () => {
    const rows = optionFigureRows([option('A', 'C-1', 900_000, [50_000, 30_000]), option('B', 'C-2', 1_125_000, [50_000, 30_000])]);
    expect([...differingKeys(rows)].sort()).toEqual(['indoorCoil', 'total']);
  });

  it('when a heat pump is compared, then the yearly cost adds cooling and heating, for the option and the existing system', () => {
    const hp = option('A', 'C-1', 1, [50_000, 30_000], [70_000, 45_000]);
    // 30,000 + 45,000 and 50,000 + 70,000 cents (arithmetic).
    expect(annualCostCents(hp)).toBe(75_000);
    expect(existingAnnualCostCents([hp])).toBe(120_000);
    expect(existingAnnualCostCents([])).toBeNull();
  });

  it('when figures are missing, then the words say so rather than showing a number', () => {
    expect(ratedText({ efficiency: { source: 'outdoor-unit', sourceText: '', coolingBtuh: 1 } })).toBe('Not rated');
    expect(regionalText({ regional: { state: 'GA', meets: null, shortfalls: [] } })).toMatch(/Not known/);
    expect(regionalText({ regional: { state: 'AZ', meets: false, shortfalls: ['EER2 11.2 < 11.7'] } })).toBe('Below the AZ minimum: EER2 11.2 < 11.7');
  });
});

describe('an option with no rated SEER2', () => {
  it('when the server leaves the cooling figure out, then the cost is null and every energy row gives its reason rather than $0', () => {
    const unrated = {
      ...option('U', 'C-9', 1, [50_000, 0]),
      efficiency: { source: 'outdoor-unit', sourceText: '', coolingBtuh: 36_000 },
      energy: { cooling: null, annualSavingCents: null, paybackYears: null, paybackText: 'Payback not worked out', notComputed: 'no rated SEER2 for this combination' },
    } as unknown as OptionView;
    expect(annualCostCents(unrated)).toBeNull();
    const rows = optionFigureRows([unrated]);
    for (const key of ['cooling', 'saving', 'payback'])
      expect(rows.find((r) => r.key === key)?.values[0]).toBe('Not worked out: no rated SEER2 for this combination');
  });

  it('when the first option is unrated, then the existing system cost comes from the next option that has a cooling comparison', () => {
    const unrated = { ...option('U', 'C-9', 1, [50_000, 0]), energy: { cooling: null, annualSavingCents: null } } as unknown as OptionView;
    // 50,000 cents: the rated option's existing-system figure as given above (arithmetic).
    expect(existingAnnualCostCents([unrated, option('R', 'C-1', 1, [50_000, 30_000])])).toBe(50_000);
    expect(existingAnnualCostCents([unrated])).toBeNull();
  });
});
