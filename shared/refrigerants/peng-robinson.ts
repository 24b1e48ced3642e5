// Source: Peng & Robinson, Ind. Eng. Chem. Fundam. 15 (1976) 59–64: P = RT/(v − b) − a(T)/(v² + 2bv − b²),
// b = 0.07780 R Tc/Pc, van der Waals one-fluid mixing a_m = ΣΣ x_i x_j √(a_i a_j)(1 − k_ij),
// b_m = Σ x_i b_i, and the fugacity coefficients of that paper (eq. 19).
// Instead of the paper's generalized α(T), each pure component's a(T) is solved at every temperature
// so that PR reproduces that component's reference vapor pressure exactly (equal liquid and vapor
// fugacity at the ancillary pressure). The pure fluids are then exact and k_ij carries the mixture.

/** Molar gas constant in kPa·L/(mol·K) (CODATA 2018). */
const R = 8.314462618;
const SQRT2 = Math.SQRT2;

export interface PrComponent {
  id: string;
  criticalTempK: number;
  criticalPressureKpa: number;
  acentric: number;
  /** The component's reference saturation pressure in kPa at a temperature in K. */
  vaporPressureKpa: (tempK: number) => number;
}

export interface PrMixture {
  components: readonly PrComponent[];
  /** Mole fractions of the components (sum 1). */
  moleFractions: readonly number[];
  /** Binary interaction parameters k_ij (symmetric, zero diagonal). */
  kij: readonly (readonly number[])[];
}

/** Co-volume b in L/mol of a component. */
function coVolume(c: PrComponent): number {
  return (0.0778 * R * c.criticalTempK) / c.criticalPressureKpa;
}

/** Smallest and largest real roots of Z³ + c2·Z² + c1·Z + c0 = 0 (equal when only one is real). */
function cubicRoots(c2: number, c1: number, c0: number): [number, number] {
  const p = c1 - (c2 * c2) / 3;
  const q = (2 * c2 * c2 * c2) / 27 - (c2 * c1) / 3 + c0;
  const shift = -c2 / 3;
  const disc = (q * q) / 4 + (p * p * p) / 27;
  if (disc > 0) {
    const s = Math.sqrt(disc);
    const t = Math.cbrt(-q / 2 + s) + Math.cbrt(-q / 2 - s);
    return [t + shift, t + shift];
  }
  const r = 2 * Math.sqrt(-p / 3);
  const phi = Math.acos(Math.max(-1, Math.min(1, (3 * q) / (p * r)))) / 3;
  const roots = [0, 1, 2].map((k) => r * Math.cos(phi - (2 * Math.PI * k) / 3) + shift);
  return [Math.min(...roots), Math.max(...roots)];
}

/** Compressibility roots [liquid, vapor] of PR for dimensionless A and B. */
function prRoots(A: number, B: number): [number, number] {
  return cubicRoots(-(1 - B), A - 3 * B * B - 2 * B, -(A * B - B * B - B * B * B));
}

/** ln((Z + (1+√2)B) / (Z + (1−√2)B)), the attraction term of PR's fugacity coefficient. */
function attractionLog(Z: number, B: number): number {
  return Math.log((Z + (1 + SQRT2) * B) / (Z + (1 - SQRT2) * B));
}

/** ln φ of a pure fluid at compressibility Z. */
function pureLnPhi(Z: number, A: number, B: number): number {
  return Z - 1 - Math.log(Z - B) - (A / (2 * SQRT2 * B)) * attractionLog(Z, B);
}

/** Attraction parameter a in kPa·L²/mol² of the 1976 paper's generalized α(T) (Soave form in ω) at tempK. */
export function standardAttraction(c: PrComponent, tempK: number): number {
  const m = 0.37464 + 1.54226 * c.acentric - 0.26992 * c.acentric ** 2;
  const alpha = (1 + m * (1 - Math.sqrt(tempK / c.criticalTempK))) ** 2;
  return ((0.45724 * (R * c.criticalTempK) ** 2) / c.criticalPressureKpa) * alpha;
}

/**
 * Saturation pressure in kPa of a pure fluid in PR for a given attraction a (kPa·L²/mol²) at tempK:
 * the pressure where liquid and vapor fugacities are equal (Newton on ln p, d ln(φL/φV)/d ln p = ZL − ZV).
 */
export function prPureSaturationKpa(c: PrComponent, tempK: number, attraction: number, estimateKpa: number): number {
  const rt = R * tempK;
  let lnP = Math.log(estimateKpa);
  for (let iter = 0; iter < 100; iter++) {
    const p = Math.exp(lnP);
    const A = (attraction * p) / (rt * rt);
    const B = (coVolume(c) * p) / rt;
    const [zl, zv] = prRoots(A, B);
    if (zv - zl < 1e-9) {
      lnP += zl > 0.3 ? 0.05 : -0.05;
      continue;
    }
    const g = pureLnPhi(zl, A, B) - pureLnPhi(zv, A, B);
    const step = g / (zl - zv);
    lnP -= step;
    if (Math.abs(step) < 1e-12) break;
  }
  return Math.exp(lnP);
}

/**
 * The attraction parameter a in kPa·L²/mol² that makes PR's liquid and vapor fugacities equal at the
 * component's reference vapor pressure at tempK (Newton on A; dg/dA is exact because Z is stationary).
 */
export function matchedAttraction(c: PrComponent, tempK: number): number {
  const pKpa = c.vaporPressureKpa(tempK);
  const rt = R * tempK;
  const B = (coVolume(c) * pKpa) / rt;
  let A = standardAttraction(c, tempK) * (pKpa / (rt * rt));
  for (let iter = 0; iter < 100; iter++) {
    const [zl, zv] = prRoots(A, B);
    if (zv - zl < 1e-9) {
      // One phase only: a vapor-like root means too little attraction, a liquid-like one too much.
      A *= zl > 0.3 ? 1.02 : 0.98;
      continue;
    }
    const g = pureLnPhi(zl, A, B) - pureLnPhi(zv, A, B);
    const dg = -(attractionLog(zl, B) - attractionLog(zv, B)) / (2 * SQRT2 * B);
    const step = g / dg;
    A -= step;
    if (Math.abs(step) < 1e-11 * A) break;
  }
  return (A * rt * rt) / pKpa;
}

interface PhaseTerms {
  lnPhi: number[];
}

/** ln φ_i of every component in one phase of composition z at T, P (roots: 'liquid' smallest, 'vapor' largest). */
function phaseLnPhi(a: number[], b: number[], kij: PrMixture['kij'], z: readonly number[], tempK: number, pKpa: number, phase: 'liquid' | 'vapor'): PhaseTerms {
  const n = z.length;
  const rt = R * tempK;
  let am = 0;
  let bm = 0;
  const sumA: number[] = new Array(n).fill(0);
  for (let i = 0; i < n; i++) {
    bm += z[i] * b[i];
    for (let j = 0; j < n; j++) {
      const aij = Math.sqrt(a[i] * a[j]) * (1 - kij[i][j]);
      sumA[i] += z[j] * aij;
      am += z[i] * z[j] * aij;
    }
  }
  const A = (am * pKpa) / (rt * rt);
  const B = (bm * pKpa) / rt;
  const [zl, zv] = prRoots(A, B);
  const Z = phase === 'liquid' ? zl : zv;
  const lnZB = Math.log(Z - B);
  const att = (A / (2 * SQRT2 * B)) * attractionLog(Z, B);
  const lnPhi = b.map((bi, i) => (bi / bm) * (Z - 1) - lnZB - att * ((2 * sumA[i]) / am - bi / bm));
  return { lnPhi };
}

interface ComponentTerms {
  tempK: number;
  a: number[];
  b: number[];
  psat: number[];
}

/** Pure-component terms at one temperature; the last set is kept since bubble and dew ask for the same T in turn. */
let lastTerms: { mix: PrMixture; terms: ComponentTerms } | undefined;
function componentTerms(mix: PrMixture, tempK: number): ComponentTerms {
  if (lastTerms && lastTerms.mix === mix && lastTerms.terms.tempK === tempK) return lastTerms.terms;
  const terms = {
    tempK,
    a: mix.components.map((c) => matchedAttraction(c, tempK)),
    b: mix.components.map(coVolume),
    psat: mix.components.map((c) => c.vaporPressureKpa(tempK)),
  };
  lastTerms = { mix, terms };
  return terms;
}

/** Successive substitution stops when Σ x·K (or Σ y/K) is this close to 1 (pressure to ~1e-11 relative). */
const FLASH_TOLERANCE = 1e-11;

/** Bubble-point pressure in kPa (absolute) of the mixture's liquid at a temperature in K. */
export function prBubblePressureKpa(mix: PrMixture, tempK: number): number {
  const { a, b, psat } = componentTerms(mix, tempK);
  const x = mix.moleFractions;
  let p = x.reduce((s, xi, i) => s + xi * psat[i], 0);
  let y = x.map((xi, i) => (xi * psat[i]) / p);
  for (let iter = 0; iter < 500; iter++) {
    const liq = phaseLnPhi(a, b, mix.kij, x, tempK, p, 'liquid');
    const vap = phaseLnPhi(a, b, mix.kij, y, tempK, p, 'vapor');
    const kx = x.map((xi, i) => xi * Math.exp(liq.lnPhi[i] - vap.lnPhi[i]));
    const s = kx.reduce((t, v) => t + v, 0);
    y = kx.map((v) => v / s);
    p *= s;
    if (Math.abs(s - 1) < FLASH_TOLERANCE) break;
  }
  return p;
}

/** Dew-point pressure in kPa (absolute) of the mixture's vapor at a temperature in K. */
export function prDewPressureKpa(mix: PrMixture, tempK: number): number {
  const { a, b, psat } = componentTerms(mix, tempK);
  const y = mix.moleFractions;
  let p = 1 / y.reduce((s, yi, i) => s + yi / psat[i], 0);
  let x = y.map((yi, i) => (yi * p) / psat[i]);
  for (let iter = 0; iter < 500; iter++) {
    const liq = phaseLnPhi(a, b, mix.kij, x, tempK, p, 'liquid');
    const vap = phaseLnPhi(a, b, mix.kij, y, tempK, p, 'vapor');
    const yk = y.map((yi, i) => yi / Math.exp(liq.lnPhi[i] - vap.lnPhi[i]));
    const s = yk.reduce((t, v) => t + v, 0);
    x = yk.map((v) => v / s);
    p /= s;
    if (Math.abs(s - 1) < FLASH_TOLERANCE) break;
  }
  return p;
}

/** Mole fractions from mass fractions and molar masses in g/mol. */
export function moleFractionsFromMass(massFractions: readonly number[], molarMassGMol: readonly number[]): number[] {
  const moles = massFractions.map((w, i) => w / molarMassGMol[i]);
  const total = moles.reduce((s, v) => s + v, 0);
  return moles.map((v) => v / total);
}
