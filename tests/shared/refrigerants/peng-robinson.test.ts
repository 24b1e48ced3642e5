import { describe, expect, it } from 'vitest';
import { fToKelvin } from '../../../shared/refrigerants/atmosphere';
import { matchedAttraction, prBubblePressureKpa, prDewPressureKpa, prPureSaturationKpa, standardAttraction, type PrComponent } from '../../../shared/refrigerants/peng-robinson';
import { R454B_COMPONENTS, r454bMixture, R454B_KIJ } from '../../../shared/refrigerants/saturation-models';
import { referenceValue } from './reference-values';

// Critical constants and acentric factors: values.json RP-10..RP-13 (the reference EOS papers).
const component = (id: string, criticalTempK: number, criticalPressureKpa: number, acentric: number): PrComponent => ({
  id,
  criticalTempK,
  criticalPressureKpa,
  acentric,
  vaporPressureKpa: () => NaN,
});
const PURE: Record<string, PrComponent> = {
  'R-22': component('R-22', 369.295, 4990, 0.2208),
  'R-32': component('R-32', 351.255, 5782, 0.2769),
  'R-125': component('R-125', 339.173, 3617.7, 0.3052),
  'R-1234yf': component('R-1234yf', 367.85, 3382.2, 0.276),
};

describe('Peng–Robinson core', () => {
  it('when the 1976 generalized alpha is used, then the pure saturation pressures match the published PR check values', () => {
    // values.json RP-14: PR (Peng & Robinson 1976) with RP-10..RP-13 constants at 40 °F and 100 °F, MPa, ±0.2 %
    const expected = referenceValue('RP-14').expected as Record<string, Record<string, number>>;
    let checked = 0;
    for (const [id, c] of Object.entries(PURE)) {
      for (const tempF of [40, 100]) {
        const tempK = fToKelvin(tempF);
        const mpa = prPureSaturationKpa(c, tempK, standardAttraction(c, tempK), 1000) / 1000;
        expect(Math.abs(mpa / expected[id][String(tempF)] - 1), `${id} at ${tempF} °F`).toBeLessThanOrEqual(0.002);
        checked++;
      }
    }
    expect(checked).toBe(8);
  });

  it('when the attraction is matched to a component’s reference vapor pressure, then PR returns that pressure', () => {
    // Construction check: the matched a(T) reproduces the component's own ancillary pressure (1e-9 relative)
    for (const c of R454B_COMPONENTS) {
      for (const tempF of [-30, 40, 100, 145]) {
        const tempK = fToKelvin(tempF);
        const target = c.vaporPressureKpa(tempK);
        const p = prPureSaturationKpa(c, tempK, matchedAttraction(c, tempK), target * 1.1);
        expect(Math.abs(p / target - 1), `${c.id} at ${tempF} °F`).toBeLessThan(1e-9);
      }
    }
  });

  it('when the mixture is all one component, then bubble and dew equal that component’s vapor pressure', () => {
    // Definition: a pure fluid has no glide
    const [r32] = R454B_COMPONENTS;
    const mix = { ...r454bMixture(R454B_KIJ), moleFractions: [1, 0] };
    const tempK = fToKelvin(60);
    expect(prBubblePressureKpa(mix, tempK) / r32.vaporPressureKpa(tempK)).toBeCloseTo(1, 9);
    expect(prDewPressureKpa(mix, tempK) / r32.vaporPressureKpa(tempK)).toBeCloseTo(1, 9);
  });

  it('when k_ij grows, then the blend’s pressures rise (positive deviation from Raoult)', () => {
    // Peng–Robinson: a larger k_ij weakens unlike attraction, raising the mixture's pressure
    const tempK = fToKelvin(40);
    expect(prBubblePressureKpa(r454bMixture(0.05), tempK)).toBeGreaterThan(prBubblePressureKpa(r454bMixture(0), tempK));
    expect(prDewPressureKpa(r454bMixture(0.05), tempK)).toBeGreaterThan(prDewPressureKpa(r454bMixture(0), tempK));
  });
});
