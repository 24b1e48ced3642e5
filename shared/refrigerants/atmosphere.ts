// Source: U.S. Standard Atmosphere 1976 (the ICAO standard atmosphere), troposphere barometric formula
// P = 101.325 kPa × (1 − 2.25577e-5 × h[m])^5.25588, as printed in ASHRAE Handbook—Fundamentals ch. 1.
// Gauges read against the local atmosphere, so every saturation lookup converts through it.

export const KPA_PER_PSI = 6.894757293168;
export const M_PER_FT = 0.3048;
const SEA_LEVEL_KPA = 101.325;

/** Standard-atmosphere pressure in psia at an altitude in feet (0 ft = 14.696 psia). */
export function atmosphericPsia(altitudeFt = 0): number {
  const base = 1 - 2.25577e-5 * altitudeFt * M_PER_FT;
  return (SEA_LEVEL_KPA * base ** 5.25588) / KPA_PER_PSI;
}

/** Absolute pressure in psia from a gauge reading in psig at an altitude in feet. */
export function gaugeToAbsolutePsia(psig: number, altitudeFt = 0): number {
  return psig + atmosphericPsia(altitudeFt);
}

/** Gauge pressure in psig from an absolute pressure in psia at an altitude in feet. */
export function absoluteToGaugePsig(psia: number, altitudeFt = 0): number {
  return psia - atmosphericPsia(altitudeFt);
}

/** °F from kelvin. */
export function kelvinToF(tempK: number): number {
  return tempK * 1.8 - 459.67;
}

/** Kelvin from °F. */
export function fToKelvin(tempF: number): number {
  return (tempF + 459.67) / 1.8;
}
