import { describe, expect, it } from 'vitest';
import { chargeAdjustment, chargeAdjustmentSource } from '../../../shared/lineset/charge-adjustment';
import { liquidLineOzPerFt, tubeContentRatio } from '../../../shared/lineset/liquid-content';
import { checkLineSize } from '../../../shared/lineset/size-check';
import { formatLineSize, lineSizeSteps } from '../../../shared/lineset/tube-sizes';

describe('liquid-line content per foot', () => {
  // Computed from ASTM B280 bore × CoolProp 8.0.0 saturated-liquid density at 90 °F, ±10 % —
  // values.json LS-01 (R-410A) and LS-02.
  it.each([
    ['R-410A', 0.25, 0.2],
    ['R-410A', 0.3125, 0.34],
    ['R-410A', 0.375, 0.54],
    ['R-410A', 0.5, 1.06],
    ['R-22', 0.25, 0.23],
    ['R-22', 0.3125, 0.39],
    ['R-22', 0.375, 0.61],
    ['R-22', 0.5, 1.2],
  ])('when %s fills a %s in liquid line, then it holds about %s oz/ft', (refrigerant, od, expected) => {
    const oz = liquidLineOzPerFt(refrigerant, od) as number;
    expect(Math.abs(oz - expected) / expected).toBeLessThan(0.1);
  });

  it('when R-32 and R-454B fill a 3/8 in line, then they hold about 9 % and 6 % less than R-410A', () => {
    // LS-02 notes: R-32 ~9 % and R-454B ~6 % less per foot than R-410A (CoolProp 8.0.0 densities)
    const r410a = liquidLineOzPerFt('R-410A', 0.375) as number;
    expect(1 - (liquidLineOzPerFt('R-32', 0.375) as number) / r410a).toBeCloseTo(0.09, 2);
    expect(1 - (liquidLineOzPerFt('R-454B', 0.375) as number) / r410a).toBeCloseTo(0.064, 2);
  });

  it('when the tube is not a standard size, then no content is given', () => {
    expect(liquidLineOzPerFt('R-410A', 0.44)).toBeUndefined();
  });

  it('when 1/2 in is compared with 3/8 in, then it holds the bore-area ratio more', () => {
    // (0.436 / 0.311)² from ASTM B280 bores — values.json LS-01 inputs
    expect(tubeContentRatio(0.5, 0.375)).toBeCloseTo((0.436 / 0.311) ** 2, 6);
  });
});

describe('charge adjustment', () => {
  it('when 40 ft of 3/8 in R-410A line and the unit says 0.6 oz/ft past 15 ft, then add 15 oz', () => {
    // (40 − 15) × 0.6 = 15 oz: common practice (no source) — values.json LS-03
    const adj = chargeAdjustment({ refrigerant: 'R-410A', liquidOdIn: 0.375, lengthFt: 40, chargedLineLengthFt: 15, unitChargePerFtOz: 0.6, unitLiquidOdIn: 0.375 });
    expect(adj?.ounces).toBeCloseTo(15, 9);
    expect(adj?.method).toBe('unit');
  });

  it('when the line is 10 ft, then 3 oz come out', () => {
    // (10 − 15) × 0.6 = −3 oz — values.json LS-03
    const adj = chargeAdjustment({ refrigerant: 'R-410A', liquidOdIn: 0.375, lengthFt: 10, chargedLineLengthFt: 15, unitChargePerFtOz: 0.6 });
    expect(adj?.ounces).toBeCloseTo(-3, 9);
  });

  it('when no unit figure is given, then 27 ft past a 15 ft charge on 3/8 in R-22 uses the tube content', () => {
    // 0.61 oz/ft ±10 % (LS-02, published computation); 12 ft × that
    const adj = chargeAdjustment({ refrigerant: 'R-22', liquidOdIn: 0.375, lengthFt: 27 });
    expect(adj?.method).toBe('tube-content');
    expect(adj?.chargedLengthAssumed).toBe(true);
    expect(adj!.ounces / 12).toBeGreaterThan(0.61 * 0.9);
    expect(adj!.ounces / 12).toBeLessThan(0.61 * 1.1);
  });

  it('when the unit figure is for 3/8 in and 5/16 in is installed, then it is scaled down and the note says so', () => {
    // bore ratio (0.248/0.311)² from ASTM B280 bores — values.json LS-01 inputs
    const input = { refrigerant: 'R-410A', liquidOdIn: 0.3125, lengthFt: 35, chargedLineLengthFt: 15, unitChargePerFtOz: 0.6, unitLiquidOdIn: 0.375 };
    const adj = chargeAdjustment(input);
    expect(adj?.method).toBe('unit-scaled');
    expect(adj?.ozPerFt).toBeCloseTo(0.6 * (0.248 / 0.311) ** 2, 6);
    expect(chargeAdjustmentSource(adj!, input)).toContain('scaled ×0.64');
  });

  it('when the refrigerant is unknown and no unit figure is given, then there is no result', () => {
    expect(chargeAdjustment({ refrigerant: 'R-999', liquidOdIn: 0.375, lengthFt: 30 })).toBeUndefined();
  });
});

describe('tube sizes', () => {
  it('when sizes are counted, then 5/8 to 7/8 is two steps and 7/8 to 1-1/8 is one', () => {
    // ACR standard size list (ASTM B280, from memory): …5/8, 3/4, 7/8, 1-1/8…
    expect(lineSizeSteps(0.625, 0.875)).toBe(2);
    expect(lineSizeSteps(0.875, 1.125)).toBe(1);
  });

  it('when a size is typed as a rounded decimal, then it reads as its fraction', () => {
    expect(formatLineSize(0.38)).toBe('3/8');
    expect(formatLineSize(1.125)).toBe('1-1/8');
  });

  it('when a non-standard OD is checked, then it is never "allowed"', () => {
    expect(checkLineSize(0.44, [0.375]).steps).toBeGreaterThanOrEqual(1);
    expect(checkLineSize(0.44, [0.375]).nonStandard).toBe(true);
  });
});
