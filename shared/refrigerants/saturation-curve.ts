/**
 * A saturation curve sampled once from its model (ancillary equation or equation of state) and then
 * read by cubic Hermite interpolation both ways: ln p on a uniform temperature grid, and T on a
 * uniform ln p grid. Every node is computed from the model when the curve is first used (nothing is
 * typed in); every 2 K is plenty (between nodes the error is under 0.005 °F, tested), and a
 * lookup costs one logarithm or one exponential, so the Readings screen can recompute on every keystroke.
 */
export class SaturationCurve {
  /** Extra nodes sampled beyond each end of the range. */
  static readonly PAD_NODES = 3;
  private readonly t0K: number;
  private readonly stepK: number;
  private readonly lnP: Float64Array;
  private readonly dLnP: Float64Array;
  private readonly u0: number;
  private readonly stepU: number;
  private readonly tOfU: Float64Array;
  private readonly dTOfU: Float64Array;
  /** Absolute pressure in kPa at the low and high ends of the valid range. */
  readonly minPressureKpa: number;
  readonly maxPressureKpa: number;

  /**
   * Samples pressureKpaAt (K → kPa absolute) from minK to maxK (K) every stepK, with three extra nodes
   * each side so the fourth-order slopes at the ends stay accurate (the model must hold there too).
   */
  constructor(pressureKpaAt: (tempK: number) => number, readonly minK: number, readonly maxK: number, stepK = 2) {
    const pad = SaturationCurve.PAD_NODES;
    const count = Math.ceil((maxK - minK) / stepK) + 1 + 2 * pad;
    this.t0K = minK - pad * stepK;
    this.stepK = stepK;
    this.lnP = new Float64Array(count);
    for (let i = 0; i < count; i++) {
      this.lnP[i] = Math.log(pressureKpaAt(this.t0K + i * stepK));
      if (!Number.isFinite(this.lnP[i])) throw new Error(`saturation model gave no pressure at ${(this.t0K + i * stepK).toFixed(2)} K`);
    }
    this.dLnP = slopes(this.lnP, stepK);

    this.minPressureKpa = this.pressureKpa(minK);
    this.maxPressureKpa = this.pressureKpa(maxK);
    // Inverse grid over the valid range plus a margin, so a reading at the very edge interpolates.
    const uLow = Math.log(this.pressureKpa(minK - stepK));
    const uHigh = Math.log(this.pressureKpa(maxK + stepK));
    const inverseCount = 2 * count;
    this.u0 = uLow;
    this.stepU = (uHigh - uLow) / (inverseCount - 1);
    this.tOfU = new Float64Array(inverseCount);
    this.dTOfU = new Float64Array(inverseCount);
    let guessK = minK - stepK;
    for (let j = 0; j < inverseCount; j++) {
      const u = this.u0 + j * this.stepU;
      guessK = this.solveTempK(u, guessK);
      this.tOfU[j] = guessK;
      this.dTOfU[j] = 1 / this.slopeAt(guessK);
    }
  }

  /** Saturation pressure in kPa (absolute) at a temperature in K (inside the sampled range). */
  pressureKpa(tempK: number): number {
    return Math.exp(hermite(this.lnP, this.dLnP, this.t0K, this.stepK, tempK));
  }

  /** Saturation temperature in K at an absolute pressure in kPa (inside the sampled range). */
  tempK(pressureKpa: number): number {
    return hermite(this.tOfU, this.dTOfU, this.u0, this.stepU, Math.log(pressureKpa));
  }

  /** d ln p / dT in 1/K of the interpolant at tempK. */
  private slopeAt(tempK: number): number {
    const h = 1e-4;
    return (Math.log(this.pressureKpa(tempK + h)) - Math.log(this.pressureKpa(tempK - h))) / (2 * h);
  }

  /** Temperature in K where the interpolated ln p equals u (Newton from a nearby guess). */
  private solveTempK(u: number, guessK: number): number {
    let t = guessK;
    for (let iter = 0; iter < 50; iter++) {
      const step = (Math.log(this.pressureKpa(t)) - u) / this.slopeAt(t);
      t -= step;
      if (Math.abs(step) < 1e-12) break;
    }
    return t;
  }
}

/** Fourth-order centred slopes of equally spaced values (second-order one-sided at the two ends). */
function slopes(y: Float64Array, h: number): Float64Array {
  const n = y.length;
  const d = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    if (i >= 2 && i <= n - 3) d[i] = (y[i - 2] - 8 * y[i - 1] + 8 * y[i + 1] - y[i + 2]) / (12 * h);
    else if (i === 0) d[i] = (-3 * y[0] + 4 * y[1] - y[2]) / (2 * h);
    else if (i === n - 1) d[i] = (3 * y[n - 1] - 4 * y[n - 2] + y[n - 3]) / (2 * h);
    else d[i] = (y[i + 1] - y[i - 1]) / (2 * h);
  }
  return d;
}

/** Cubic Hermite interpolation of values y with slopes d on a uniform grid starting at x0, step h. */
function hermite(y: Float64Array, d: Float64Array, x0: number, h: number, x: number): number {
  const pos = (x - x0) / h;
  let i = Math.floor(pos);
  if (i < 0) i = 0;
  else if (i > y.length - 2) i = y.length - 2;
  const t = pos - i;
  const t2 = t * t;
  const t3 = t2 * t;
  return (2 * t3 - 3 * t2 + 1) * y[i] + (t3 - 2 * t2 + t) * h * d[i] + (-2 * t3 + 3 * t2) * y[i + 1] + (t3 - t2) * h * d[i + 1];
}
