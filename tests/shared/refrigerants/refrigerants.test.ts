import { describe, expect, it } from 'vitest';
import { blendGwp, getRefrigerant, isA2L, listRefrigerants, usesPoeOil } from '../../../shared/refrigerants';
import { maxChargeUnventilatedKg, maxChargeUnventilatedOz, RELEASE_HEIGHT_M, systemChargeOz, totalChargeOz } from '../../../shared/refrigerants/a2l-charge';
import { a2lListingOf, detectionThresholdKg } from '../../../shared/refrigerants/a2l-detection';

describe('refrigerant reference data', () => {
  it.each([
    // ANSI/ASHRAE Standard 34 Tables 4-1/4-2 safety groups; IPCC AR4 WG1 Table 2.14 GWPs (values.json RP-01..RP-05)
    ['R-22', 'A1', 1810, 0],
    ['R-410A', 'A1', 2088, 1],
    ['R-32', 'A2L', 675, 0],
    ['R-454B', 'A2L', 466, 2],
    ['R-407C', 'A1', 1774, 1],
  ])('when %s is looked up, then its ASHRAE 34 class is %s and its AR4 GWP is %d', (id, cls, gwp, tol) => {
    const r = getRefrigerant(id)!;
    expect(r.safetyClass).toBe(cls);
    expect(Math.abs(r.gwp100Ar4 - gwp)).toBeLessThanOrEqual(tol);
  });

  it('when blend GWPs are computed from composition, then they match the mass-weighted sums', () => {
    // IPCC AR4 Table 2.14 component GWPs with ASHRAE 34 compositions (values.json RP-09)
    expect(blendGwp({ 'R-32': 50, 'R-125': 50 })).toBeCloseTo(2087.5, 1);
    expect(blendGwp({ 'R-32': 23, 'R-125': 25, 'R-134a': 52 })).toBeCloseTo(1773.85, 1);
    // R-454B 68.9/31.1 R-32/R-1234yf (EES help page composition; R-1234yf GWP 4 from memory) — RP-09
    expect(Math.abs(blendGwp({ 'R-32': 68.9, 'R-1234yf': 31.1 }) - 466.3)).toBeLessThanOrEqual(1);
  });

  it('when a refrigerant is named the trade ways, then the same entry comes back', () => {
    expect(getRefrigerant('410a')?.id).toBe('R-410A');
    expect(getRefrigerant('R410A')?.id).toBe('R-410A');
    expect(getRefrigerant(' r-32 ')?.id).toBe('R-32');
    expect(getRefrigerant('R-12')).toBeUndefined();
    expect(getRefrigerant(undefined)).toBeUndefined();
  });

  it('when A2L is asked, then only R-32 and R-454B are A2L', () => {
    // ANSI/ASHRAE Standard 34 safety groups (values.json RP-03, RP-04)
    expect(listRefrigerants().filter((r) => isA2L(r.id)).map((r) => r.id).sort()).toEqual(['R-32', 'R-454B']);
    expect(isA2L('454b')).toBe(true);
    expect(isA2L('R-410A')).toBe(false);
  });

  it('when oils are asked, then R-22 runs mineral oil and the HFCs POE', () => {
    // common practice (no source): R-22 mineral/alkylbenzene, HFC and HFO blends POE
    expect(getRefrigerant('R-22')?.oil).toBe('mineral');
    expect(usesPoeOil('R-410A')).toBe(true);
    expect(usesPoeOil('R-454B')).toBe(true);
    expect(usesPoeOil('R-99')).toBeUndefined();
  });

  it('when zeotropy is asked, then blends are zeotropic and pure fluids are not', () => {
    // ASHRAE 34 numbering: 400-series blends are zeotropic (R-410A, R-407C, R-454B); pure
    expect(listRefrigerants().filter((r) => r.zeotropic).map((r) => r.id).sort()).toEqual(['R-407C', 'R-410A', 'R-454B']);
  });

  it('when the A2L LFLs are read, then they are the ASHRAE 34 figures', () => {
    // ANSI/ASHRAE Standard 34 LFL — from memory: R-32 0.307, R-454B 0.296 kg/m³
    expect(getRefrigerant('R-32')?.lflKgM3).toBe(0.307);
    expect(getRefrigerant('R-454B')?.lflKgM3).toBe(0.296);
    expect(getRefrigerant('R-410A')?.lflKgM3).toBeUndefined();
  });
});

describe('A2L charge limit (UL 60335-2-40 3rd ed. GG.2)', () => {
  it('when the formula is evaluated by hand, then the function agrees', () => {
    // m_max = 2.5 × LFL^(5/4) × h0 × A^(1/2), UL 60335-2-40 3rd ed. Annex GG.2; worked by hand:
    // R-32 LFL 0.307 (ASHRAE 34, from memory): 0.307^1.25 = 0.22851; × 2.5 × 0.6 × √20 = 1.5330 kg
    expect(maxChargeUnventilatedKg(0.307, 0.6, 20)).toBeCloseTo(1.5330, 3);
    // h0 floor 0.6 m, wall 1.8 m, ceiling 2.2 m (UL 60335-2-40 3rd ed. GG.2)
    expect(RELEASE_HEIGHT_M).toEqual({ floor: 0.6, wall: 1.8, ceiling: 2.2 });
  });

  it('when the area is in square feet and the result in ounces, then the units convert', () => {
    // 1 ft² = 0.09290304 m², 1 oz = 0.028349523125 kg (NIST SP 811 exact conversions)
    const kg = maxChargeUnventilatedKg(0.296, 2.2, 1500 * 0.09290304);
    expect(maxChargeUnventilatedOz(0.296, 2.2, 1500)).toBeCloseTo(kg / 0.028349523125, 6);
    // four times the area doubles the limit (A^(1/2) in GG.2)
    expect(maxChargeUnventilatedOz(0.296, 0.6, 4000) / maxChargeUnventilatedOz(0.296, 0.6, 1000)).toBeCloseTo(2, 9);
  });

  it('when the line is longer or shorter than the charged length, then charge is added or removed', () => {
    // (40 − 15) × 0.6 = 15 oz added — values.json LS-03, trade practice
    expect(totalChargeOz(100, 40, 15, 0.6)).toBeCloseTo(115, 9);
    // 10 ft line: 3 oz removed — LS-03
    expect(totalChargeOz(100, 10, 15, 0.6)).toBeCloseTo(97, 9);
    expect(systemChargeOz({ factoryChargeOz: 100, chargedLineLengthFt: 15 }, 40)).toBeUndefined();
  });

  it('when the detection threshold is computed for R-454B, then it is m1 = 6 m³ × LFL = 1.776 kg (3.91 lb)', () => {
    // UL 60335-2-40 3rd ed., clause GG.1: m1 = 4 m³ × LFL × 1.5 for A2L; R-454B LFL 0.296 kg/m³ (ASHRAE 34, from memory)
    expect(detectionThresholdKg(0.296)).toBeCloseTo(1.776, 6);
    // 1.776 kg / 0.45359237 kg/lb = 3.915 lb (the figure commonly cited for R-454B)
    expect(detectionThresholdKg(0.296) / 0.45359237).toBeCloseTo(3.915, 3);
  });

  it('when a part lists an A2L refrigerant and says nothing else, then it counts as A2L-listed', () => {
    // DESIGN §2: a2lListed is implied by a listing for R-32 or R-454B
    expect(a2lListingOf({ refrigerants: ['R-410A', 'R-454B'] }, isA2L)).toBe(true);
    expect(a2lListingOf({ refrigerants: ['R-410A'] }, isA2L)).toBeUndefined();
    expect(a2lListingOf({ a2lListed: false, refrigerants: ['R-32'] }, isA2L)).toBe(false);
  });
});
