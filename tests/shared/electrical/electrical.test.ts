import { describe, expect, it } from 'vitest';
import {
  conductorAmpacity,
  heaterOutputKw,
  isStandardBreaker,
  maximumOvercurrentProtection,
  minimumCircuitAmpacity,
  mocpRawAmps,
  nameplateVoltageRange,
  SMALL_CONDUCTOR_MAX_OCPD_AMPS,
  standardBreakersBetween,
  STANDARD_BREAKER_AMPS,
  terminalColumnC,
} from '../../../shared/electrical';

describe('NEC 240.6(A) standard ratings', () => {
  it('when the list is read, then it is the NEC 240.6(A) list', () => {
    // NEC 240.6(A), Table 240.6(A) (values.json EL-03)
    expect(STANDARD_BREAKER_AMPS.slice(0, 16)).toEqual([15, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 90, 100, 110, 125, 150]);
    expect(STANDARD_BREAKER_AMPS).toHaveLength(37);
    expect(STANDARD_BREAKER_AMPS[STANDARD_BREAKER_AMPS.length - 1]).toBe(6000);
  });

  it.each([55, 65, 75, 85, 32])('when %d A is asked, then it is not standard', (a) => {
    // NEC 240.6(A): 55, 65, 75, 85 A are not standard sizes (values.json EL-03 notes)
    expect(isStandardBreaker(a)).toBe(false);
  });

  it('when sizes between an MCA and MOCP are asked, then the ends are included', () => {
    // NEC 240.6(A) list
    expect(standardBreakersBetween(21.2, 35)).toEqual([25, 30, 35]);
    expect(standardBreakersBetween(25, 25)).toEqual([25]);
    expect(standardBreakersBetween(51, 59)).toEqual([]);
  });
});

describe('NEC Table 310.16 ampacity', () => {
  it.each([
    // NFPA 70 Table 310.16 copper (values.json EL-01)
    [14, 15, 20, 25],
    [12, 20, 25, 30],
    [10, 30, 35, 40],
    [8, 40, 50, 55],
    [6, 55, 65, 75],
    [4, 70, 85, 95],
    [3, 85, 100, 115],
    [2, 95, 115, 130],
  ])('when %s AWG copper is looked up, then 60/75/90 °C give %d/%d/%d A', (awg, a60, a75, a90) => {
    expect(conductorAmpacity(awg, 'copper', 60)).toBe(a60);
    expect(conductorAmpacity(awg, 'copper', 75)).toBe(a75);
    expect(conductorAmpacity(awg, 'copper', 90)).toBe(a90);
  });

  it('when the larger copper sizes are looked up, then they follow the table', () => {
    // NEC Table 310.16 copper 1–4/0 AWG — from memory
    expect(conductorAmpacity(1, 'copper', 75)).toBe(130);
    expect(conductorAmpacity('1/0', 'copper', 75)).toBe(150);
    expect(conductorAmpacity('4/0', 'copper', 60)).toBe(195);
    expect(conductorAmpacity('4/0', 'copper', 90)).toBe(260);
  });

  it('when aluminum is looked up, then it follows the table and 14 AWG has none', () => {
    // NEC Table 310.16 aluminum/copper-clad aluminum — from memory
    expect(conductorAmpacity(12, 'aluminum', 60)).toBe(15);
    expect(conductorAmpacity(10, 'aluminum', 75)).toBe(30);
    expect(conductorAmpacity(6, 'aluminum', 75)).toBe(50);
    expect(conductorAmpacity('2/0', 'aluminum', 75)).toBe(135);
    expect(conductorAmpacity('4/0', 'aluminum', 75)).toBe(180);
    expect(conductorAmpacity(14, 'aluminum', 60)).toBeUndefined();
  });

  it('when the table rises with size, then every column is monotonic', () => {
    // structure of NEC Table 310.16: larger conductors carry more current, 90 °C ≥ 75 °C ≥ 60 °C
    const sizes = [14, 12, 10, 8, 6, 4, 3, 2, 1, '1/0', '2/0', '3/0', '4/0'];
    for (const material of ['copper', 'aluminum'] as const) {
      for (const col of [60, 75, 90] as const) {
        const amps = sizes.map((s) => conductorAmpacity(s, material, col)).filter((a): a is number => a !== undefined);
        expect([...amps].sort((a, b) => a - b)).toEqual(amps);
      }
      for (const s of sizes) {
        const [a, b, c] = [60, 75, 90].map((col) => conductorAmpacity(s, material, col as 60 | 75 | 90));
        if (a !== undefined) expect(a <= b! && b! <= c!).toBe(true);
      }
    }
  });

  it('when the terminal rating is asked, then 60 °C is used unless both ends are 75 °C', () => {
    // NEC 110.14(C)(1): 60 °C column for ≤100 A terminations unless marked 75 °C
    expect(terminalColumnC(undefined)).toBe(60);
    expect(terminalColumnC(60)).toBe(60);
    expect(terminalColumnC(75)).toBe(75);
    // a 90 °C marking still sizes at 75 °C — common practice (no source)
    expect(terminalColumnC(90)).toBe(75);
  });

  it('when the small-conductor limits are read, then they are NEC 240.4(D)', () => {
    // NEC 240.4(D) (values.json EL-02)
    expect(SMALL_CONDUCTOR_MAX_OCPD_AMPS.copper).toEqual({ '14': 15, '12': 20, '10': 30 });
  });
});

describe('MCA and MOCP (NEC Article 440)', () => {
  it.each([
    // NEC 440.32/440.33: 1.25 × RLA + others (values.json EL-04)
    [16.0, 1.2, 21.2],
    [12.8, 0.8, 16.8],
    [26.4, 1.5, 34.5],
    [18.0, 0, 22.5],
  ])('when RLA is %d A and other loads %d A, then the MCA is %d A', (rla, other, mca) => {
    expect(minimumCircuitAmpacity({ largestRlaAmps: rla, otherLoadsAmps: other })).toBeCloseTo(mca, 2);
  });

  it.each([
    // NEC 440.22(A) / UL 60335-2-40 nameplate method: 2.25 × RLA + others, rounded down (values.json EL-05)
    [16.0, 1.2, 37.2, 35],
    [12.8, 0.8, 29.6, 25],
    [26.4, 1.5, 60.9, 60],
    [18.0, 0, 40.5, 40],
    [9.0, 0.6, 20.85, 20],
  ])('when RLA is %d A and other loads %d A, then the raw MOCP is %d A and the MOCP %d A', (rla, other, raw, mocp) => {
    const loads = { largestRlaAmps: rla, otherLoadsAmps: other };
    expect(mocpRawAmps(loads)).toBeCloseTo(raw, 2);
    expect(maximumOvercurrentProtection(loads)).toBe(mocp);
  });

  it('when rounding down would fall below the MCA, then the next standard size at or above the MCA is used', () => {
    // values.json EL-05 formula note: "if that is below MCA, use the next standard size >= MCA"
    // RLA 10, other loads 6.5: MCA 19, raw 29 → 25 ≥ 19 stays; RLA 4, other 14: MCA 19, raw 23 → 20 ≥ 19
    expect(maximumOvercurrentProtection({ largestRlaAmps: 4, otherLoadsAmps: 14 })).toBe(20);
    // RLA 2, other 14.5: MCA 17, raw 19 → rounded down 15 < 17 → 20
    expect(maximumOvercurrentProtection({ largestRlaAmps: 2, otherLoadsAmps: 14.5 })).toBe(20);
  });
});

describe('voltage and heater output', () => {
  it('when the nameplate is 208/230, then the range is 187–253 V', () => {
    // ±10 % utilization range printed on nameplates (common practice): 208 × 0.9, 230 × 1.1
    expect(nameplateVoltageRange('208/230')).toMatchObject({ minV: 187, maxV: 253, ratedLowV: 208, ratedHighV: 230 });
    expect(nameplateVoltageRange(230)).toMatchObject({ minV: 207, maxV: 253 });
    expect(nameplateVoltageRange('abc')).toBeUndefined();
  });

  it('when a 10 kW kit rated 240 V runs on 208 V, then it gives about 7.51 kW', () => {
    // resistive heater P = V²/R (Ohm's law): 10 × (208/240)² = 7.511
    expect(heaterOutputKw(10, 208, 240)).toBeCloseTo(7.511, 3);
  });
});
