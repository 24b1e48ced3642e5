import { describe, expect, it } from 'vitest';
import { btuhToKw, btuhToTons, tonsToBtuh, tonsToKw } from '../../../shared/units/capacity';

// 12,000 Btu/h per ton and 3.51685 kW per ton: definition of the refrigeration ton — values.json CM-11
describe('capacity units', () => {
  it.each([
    [1, 12000],
    [1.5, 18000],
    [2.5, 30000],
    [3.5, 42000],
    [5, 60000],
  ])('when %s tons are converted, then they are %s Btu/h and back', (tons, btuh) => {
    expect(tonsToBtuh(tons)).toBe(btuh);
    expect(btuhToTons(btuh)).toBe(tons);
  });

  it('when 1 ton is converted to kW, then it is 3.51685 kW', () => {
    expect(tonsToKw(1)).toBeCloseTo(3.51685, 4);
  });

  it('when 3.5 tons is converted, then it sits below the 45,000 Btu/h class boundary and 4 tons above', () => {
    // 10 CFR 430.32(c) splits at 45,000 Btu/h — values.json CM-11 / EFF-02
    expect(tonsToBtuh(3.5)).toBeLessThan(45000);
    expect(tonsToBtuh(4)).toBeGreaterThanOrEqual(45000);
  });

  it('when 10,000 Btu/h is converted, then it is 2.9307 kW', () => {
    // 1 Btu/h = 0.29307107 W — values.json CM-11
    expect(btuhToKw(10000)).toBeCloseTo(2.9307107, 6);
  });
});
