import { describe, expect, it } from 'vitest';
import { adviseRepairOrReplace } from '../../../shared/estimates/repair-or-replace';

// Age × repair dollars against a threshold of 5,000: common practice (no source). Arithmetic by hand.
const facts = {
  ageYears: 12,
  repairQuoteCents: 85000,
  refrigerant: 'R-22',
  refrigerantLbs: 4,
  refrigerantCentsPerLb: 9000,
  threshold: 5000,
};

describe('repair or replace', () => {
  it('when a 12-year-old system needs $850 plus 4 lb at $90, then 12 × 1,210 = 14,520 says replace', () => {
    const a = adviseRepairOrReplace(facts, [
      { optionId: 1, name: 'Keep the furnace', totalCents: 600000, annualSavingCents: 10000, paybackYears: 60, compatible: true },
      { optionId: 2, name: 'All new', totalCents: 900000, annualSavingCents: 20000, paybackYears: 45, compatible: true },
    ]);
    expect(a.refrigerantCostCents).toBe(36000);
    expect(a.repairTotalCents).toBe(121000);
    expect(a.product).toBe(14520);
    expect(a.recommendation).toBe('replace');
    expect(a.recommendationText).toContain('"All new" pays back fastest: 45 years');
    expect(a.arithmetic.join('\n')).toContain('12 years × 1,210 dollars = 14,520');
    expect(a.notes.join(' ')).toMatch(/R-22/);
  });

  it('when 5 years × $300 = 1,500, then repair', () => {
    expect(adviseRepairOrReplace({ ...facts, ageYears: 5, repairQuoteCents: 30000, refrigerantLbs: 0 }, []).recommendation).toBe('repair');
  });

  it('when 10 years × $420 = 4,200 (at least 80 % of 5,000), then either', () => {
    const a = adviseRepairOrReplace({ ...facts, ageYears: 10, repairQuoteCents: 42000, refrigerantLbs: 0 }, []);
    expect(a.product).toBe(4200);
    expect(a.recommendation).toBe('either');
  });
});
