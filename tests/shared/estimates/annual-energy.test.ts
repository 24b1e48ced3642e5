import { describe, expect, it } from 'vitest';
import { annualHeatingKwh, compareSeason } from '../../../shared/estimates/annual-energy';
import { estimateExistingEfficiency } from '../../../shared/estimates/existing-efficiency';
import { paybackText, simplePaybackYears } from '../../../shared/estimates/payback';

// Worked example by hand from the SEER2/HSPF2 definition (Btu per watt-hour, 10 CFR 430 Subpart B App. M1):
// kWh = capacity × hours / (rating × 1000), the ENERGY STAR calculator method.
describe('annual energy and payback', () => {
  it('when a 36,000 Btu/h system runs 1,000 h at 13.4 vs 17 SEER2 and 15 ¢/kWh, then it saves $85.34 a year', () => {
    const c = compareSeason('cooling', 36000, 1000, 13.4, 17, 15);
    expect(c.existingKwh).toBe(2686.6); // 36,000,000 / 13,400 = 2686.57
    expect(c.newKwh).toBe(2117.6); // 36,000,000 / 17,000 = 2117.65
    expect(c.existingCostCents).toBe(40299); // 2686.567 × 15 = 40298.5
    expect(c.newCostCents).toBe(31765); // 2117.647 × 15 = 31764.7
    expect(c.savingCents).toBe(8534);
  });

  it('when a heat pump heats 1,000 h at 7.5 HSPF2, then it uses 4,800 kWh', () => {
    expect(annualHeatingKwh(36000, 1000, 7.5)).toBe(4800); // 36,000,000 / 7,500, by hand
    expect(compareSeason('heating', 36000, 1000, 7.5, 8.5, 15).savingKwh).toBe(564.7); // 4800 − 4235.29, by hand
  });

  it('when the price is $6,266.06 and the saving $85.34 a year, then simple payback is 73.4 years', () => {
    expect(simplePaybackYears(626606, 8534)).toBe(73.4); // 626606 / 8534 = 73.42, by hand
    expect(paybackText(626606, 8534)).toContain('73.4 years');
    expect(simplePaybackYears(626606, 0)).toBeNull();
  });

  it('when only the age is known, then the estimate assumes the federal minimum of the install year and says so', () => {
    // 2026 − 20 = 2006: 13 SEER / 7.7 HSPF (10 CFR 430.32(c) history, from memory) × 14.3/15 and 7.5/8.8 (from memory).
    const e = estimateExistingEfficiency(20, 2026, true);
    expect(e.installYear).toBe(2006);
    expect(e.seer2).toBe(12.39); // 13 × 0.9533
    expect(e.hspf2).toBe(6.56); // 7.7 × 0.8523
    expect(e.assumption).toMatch(/assumed to meet that year's federal minimum/);
    expect(estimateExistingEfficiency(40, 2026, false).seer2).toBe(7.63); // before 1992: 8 SEER (from memory) × 0.9533
  });
});
