// Fits k_ij of the R-454B Peng–Robinson mixture (shared/refrigerants/saturation-models.ts) to the
// R-454B bubble and dew points of ../shared/reference/values.json PT-04 (computed with CoolProp 8.0.0,
// an open reference library). Least squares in psi; prints the fitted value and the residuals.
// Run: npx tsx scripts/fit-r454b-kij.ts
import { atmosphericPsia, fToKelvin, KPA_PER_PSI } from '../shared/refrigerants/atmosphere';
import { prBubblePressureKpa, prDewPressureKpa } from '../shared/refrigerants/peng-robinson';
import { r454bMixture } from '../shared/refrigerants/saturation-models';
import { referenceValue } from '../tests/shared/refrigerants/reference-values';

const pt04 = referenceValue('PT-04').expected as Record<string, { bubble_psig: number; dew_psig: number }>;
const points = Object.entries(pt04).map(([f, v]) => ({ tempK: fToKelvin(Number(f)), bubblePsig: v.bubble_psig, dewPsig: v.dew_psig }));
const atm = atmosphericPsia(0);

function residuals(kij: number): number[] {
  const mix = r454bMixture(kij);
  return points.flatMap((p) => [prBubblePressureKpa(mix, p.tempK) / KPA_PER_PSI - atm - p.bubblePsig, prDewPressureKpa(mix, p.tempK) / KPA_PER_PSI - atm - p.dewPsig]);
}

const sse = (kij: number) => residuals(kij).reduce((s, r) => s + r * r, 0);

// Golden-section search on [0, 0.1].
let lo = 0;
let hi = 0.1;
const g = (Math.sqrt(5) - 1) / 2;
for (let i = 0; i < 60; i++) {
  const a = hi - g * (hi - lo);
  const b = lo + g * (hi - lo);
  if (sse(a) < sse(b)) hi = b;
  else lo = a;
}
const kij = (lo + hi) / 2;
console.log(`k_ij = ${kij.toFixed(5)}; rms ${Math.sqrt(sse(kij) / (2 * points.length)).toFixed(3)} psi`);
console.log('residuals psi (bubble, dew per point):', residuals(kij).map((r) => r.toFixed(2)).join(' '));
