/**
 * The reference Helmholtz equations of state of, evaluated here only to CHECK the
 * saturation code against them (the app does not use these). Residual Helmholtz energy
 * αr(δ, τ) = Σ n δ^d τ^t + Σ n δ^d τ^t exp(−δ^c); saturation from equal pressure and Gibbs energy
 * in both phases (Akasaka's J/K formulation). Coefficients as published:
 * - Kamei, Beyerlein & Jacobsen, Int. J. Thermophys. 16 (1995) 1155.
 * - Tillner-Roth & Yokozeki, J. Phys. Chem. Ref. Data 26 (1997) 1273.
 */
interface HelmholtzEos {
  criticalTempK: number;
  /** Critical molar density in mol/L. */
  criticalDensityMolL: number;
  /** Gas constant used by the EOS in J/(mol·K). */
  gasConstant: number;
  poly: { n: number[]; d: number[]; t: number[] };
  exp: { n: number[]; d: number[]; t: number[]; c: number[] };
}

export const REFERENCE_EOS: Record<'R-22' | 'R-32', HelmholtzEos> = {
  'R-22': {
    criticalTempK: 369.295,
    criticalDensityMolL: 523.8422 / 86.468,
    gasConstant: 8.31451,
    poly: {
      n: [
        0.695645445236e-1, 0.252275419999e2, -0.202351148311e3, 0.350063090302e3, -0.223134648863e3, 0.488345904592e2, 0.108874958556e-1, 0.590315073614, -0.689043767432, 0.284224445844,
        0.125436457897, -0.113338666416e-1, -0.63138895917e-1, 0.974021015232e-2, -0.408406844722e-3, 0.74194877357e-3, 0.315912525922e-3, 0.876009723338e-5, -0.110343340301e-3, -0.705323356879e-4,
      ],
      d: [1, 1, 1, 1, 1, 1, 1, 2, 2, 2, 3, 3, 4, 5, 6, 7, 7, 7, 8, 8],
      t: [-1, 1.75, 2.25, 2.5, 2.75, 3, 5.5, 1.5, 1.75, 3.5, 1, 4.5, 1.5, 0.5, 4.5, 1, 4, 5, -0.5, 3.5],
    },
    exp: {
      n: [
        0.23585073151, -0.192640494729, 0.375218008557e-2, -0.448926036678e-4, 0.198120520635e-1, -0.356958425255e-1, 0.319594161562e-1, 0.260284291078e-5, -0.897629021967e-2, 0.345482791645e-1,
        -0.411831711251e-2, 0.567428536529e-2, -0.563368989908e-2, 0.191384919423e-2, -0.178930036389e-2,
      ],
      d: [2, 2, 2, 2, 3, 4, 4, 4, 4, 6, 6, 6, 8, 8, 8],
      t: [5, 7, 12, 15, 3.5, 3.5, 8, 15, 25, 3, 9, 19, 2, 7, 13],
      c: [2, 2, 2, 2, 3, 2, 2, 2, 4, 2, 2, 4, 2, 2, 4],
    },
  },
  'R-32': {
    criticalTempK: 351.255,
    criticalDensityMolL: 424 / 52.024,
    gasConstant: 8.314471,
    poly: {
      n: [0.1046634e1, -0.5451165, -0.2448595e-2, -0.4877002e-1, 0.3520158e-1, 0.162275e-2, 0.2377225e-4, 0.29149e-1],
      d: [1, 2, 5, 1, 1, 3, 8, 4],
      t: [0.25, 1, -0.25, -1, 2, 2, 0.75, 0.25],
    },
    exp: {
      n: [0.3386203e-2, -0.4202444e-2, 0.4782025e-3, -0.5504323e-2, -0.2418396e-1, 0.4209034, -0.4616537, -0.1200513e1, -0.259155e1, -0.1400145e1, 0.8263017],
      d: [4, 4, 8, 3, 5, 1, 1, 3, 1, 2, 3],
      t: [18, 26, -1, 25, 1.75, 4, 5, 1, 1.5, 1, 0.5],
      c: [4, 3, 1, 4, 1, 2, 2, 1, 1, 1, 1],
    },
  },
};

/** αr and its first two δ-derivatives at (δ, τ). */
function residual(eos: HelmholtzEos, delta: number, tau: number): [number, number, number] {
  let a = 0;
  let ad = 0;
  let add = 0;
  const { poly, exp } = eos;
  for (let k = 0; k < poly.n.length; k++) {
    const term = poly.n[k] * delta ** poly.d[k] * tau ** poly.t[k];
    a += term;
    ad += (term * poly.d[k]) / delta;
    add += (term * poly.d[k] * (poly.d[k] - 1)) / (delta * delta);
  }
  for (let k = 0; k < exp.n.length; k++) {
    const dc = delta ** exp.c[k];
    const term = exp.n[k] * delta ** exp.d[k] * tau ** exp.t[k] * Math.exp(-dc);
    const g = exp.d[k] - exp.c[k] * dc; // δ·∂/∂δ of the log of the term
    a += term;
    ad += (term * g) / delta;
    add += (term * (g * (g - 1) - exp.c[k] * exp.c[k] * dc)) / (delta * delta);
  }
  return [a, ad, add];
}

/** Pressure in kPa at a molar density in mol/L and temperature in K. */
function pressureKpa(eos: HelmholtzEos, rhoMolL: number, tempK: number): number {
  const delta = rhoMolL / eos.criticalDensityMolL;
  const [, ad] = residual(eos, delta, eos.criticalTempK / tempK);
  return rhoMolL * eos.gasConstant * tempK * (1 + delta * ad);
}

/** Density root in mol/L of p(ρ) = pKpa by Newton from a starting density. */
function densityAt(eos: HelmholtzEos, pKpa: number, tempK: number, startMolL: number): number {
  let rho = startMolL;
  for (let i = 0; i < 200; i++) {
    const h = rho * 1e-7;
    const f = pressureKpa(eos, rho, tempK) - pKpa;
    const df = (pressureKpa(eos, rho + h, tempK) - pressureKpa(eos, rho - h, tempK)) / (2 * h);
    const step = f / df;
    rho = Math.max(rho - step, rho / 2);
    if (Math.abs(step) < 1e-12 * rho) break;
  }
  return rho;
}

/** Saturation pressure in kPa of the reference EOS at a temperature in K, starting from an estimate in kPa. */
export function referenceSaturationKpa(id: 'R-22' | 'R-32', tempK: number, estimateKpa: number): number {
  const eos = REFERENCE_EOS[id];
  const tau = eos.criticalTempK / tempK;
  const rt = eos.gasConstant * tempK;
  let dl = densityAt(eos, estimateKpa, tempK, 3 * eos.criticalDensityMolL) / eos.criticalDensityMolL;
  let dv = densityAt(eos, estimateKpa, tempK, estimateKpa / rt) / eos.criticalDensityMolL;
  for (let i = 0; i < 100; i++) {
    const [al, adl, addl] = residual(eos, dl, tau);
    const [av, adv, addv] = residual(eos, dv, tau);
    const jl = dl * (1 + dl * adl);
    const jv = dv * (1 + dv * adv);
    const kl = dl * adl + al + Math.log(dl);
    const kv = dv * adv + av + Math.log(dv);
    const jdl = 1 + 2 * dl * adl + dl * dl * addl;
    const jdv = 1 + 2 * dv * adv + dv * dv * addv;
    const kdl = 2 * adl + dl * addl + 1 / dl;
    const kdv = 2 * adv + dv * addv + 1 / dv;
    // Solve [jdl −jdv; kdl −kdv]·[Δl; Δv] = −[jl − jv; kl − kv].
    const f1 = jl - jv;
    const f2 = kl - kv;
    const det = -jdl * kdv + jdv * kdl;
    const stepL = (-f1 * -kdv - -jdv * -f2) / det;
    const stepV = (jdl * -f2 - kdl * -f1) / det;
    dl += stepL;
    dv += stepV;
    if (Math.abs(stepL) < 1e-13 * dl && Math.abs(stepV) < 1e-13 * dv) break;
  }
  return pressureKpa(eos, dv * eos.criticalDensityMolL, tempK);
}
