// Sources: NEC 440.32/440.33 (MCA: 125 % of the largest motor-compressor RLA plus other loads) and
// NEC 440.22(A) with the UL 60335-2-40 nameplate method (MOCP: 225 % of RLA plus other loads,
// rounded down to a standard size; if that falls below the MCA, the next standard size at or above
// the MCA) — values.json EL-04, EL-05.
import { standardBreakerAtOrAbove, standardBreakerAtOrBelow } from './standard-ratings';

export interface MotorLoads {
  /** Rated load amps of the largest motor-compressor. */
  largestRlaAmps: number;
  /** Sum of the other motors' FLA and other loads, amps. */
  otherLoadsAmps?: number;
}

/** Minimum circuit ampacity in amps: 1.25 × largest RLA + other loads. */
export function minimumCircuitAmpacity(loads: MotorLoads): number {
  return 1.25 * loads.largestRlaAmps + (loads.otherLoadsAmps ?? 0);
}

/** MOCP before rounding, amps: 2.25 × largest RLA + other loads. */
export function mocpRawAmps(loads: MotorLoads): number {
  return 2.25 * loads.largestRlaAmps + (loads.otherLoadsAmps ?? 0);
}

/** Maximum overcurrent protection in amps: the raw value rounded down to a standard size, never below the MCA's standard size. */
export function maximumOvercurrentProtection(loads: MotorLoads): number {
  const raw = mocpRawAmps(loads);
  const mca = minimumCircuitAmpacity(loads);
  const down = standardBreakerAtOrBelow(raw);
  if (down !== undefined && down >= mca) return down;
  return standardBreakerAtOrAbove(mca) ?? raw;
}
