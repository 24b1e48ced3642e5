/**
 * Ancillary vapor-pressure equations of the reference equations of state, in the Wagner-type form
 * ln(p / p_r) = (T_r / T) × Σ n_k × θ^t_k with θ = 1 − T / T_r (T in K, p in kPa).
 * The coefficients live with each refrigerant in saturation-models.ts, with their sources.
 */
export interface AncillaryEquation {
  /** Reducing temperature in K (the critical or pseudo-critical temperature). */
  reducingTempK: number;
  /** Reducing pressure in kPa. */
  reducingPressureKpa: number;
  n: readonly number[];
  t: readonly number[];
}

/** Saturation pressure in kPa (absolute) at a temperature in K from an ancillary equation. */
export function ancillaryPressureKpa(eq: AncillaryEquation, tempK: number): number {
  const theta = 1 - tempK / eq.reducingTempK;
  let sum = 0;
  for (let k = 0; k < eq.n.length; k++) sum += eq.n[k] * theta ** eq.t[k];
  return eq.reducingPressureKpa * Math.exp((eq.reducingTempK / tempK) * sum);
}
