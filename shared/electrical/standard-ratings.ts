// Source: NFPA 70 (NEC) 240.6(A), Table 240.6(A) (2017+): standard ampere ratings of fuses and
// inverse-time circuit breakers. Additional standard fuse ratings 1, 3, 6, 10 and 601 A.

/** Standard ratings of fuses and inverse-time breakers, amps. */
export const STANDARD_BREAKER_AMPS: readonly number[] = [
  15, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 90, 100, 110, 125, 150, 175, 200, 225, 250, 300, 350, 400, 450, 500, 600, 700, 800,
  1000, 1200, 1600, 2000, 2500, 3000, 4000, 5000, 6000,
];

/** Fuse-only standard ratings, amps. */
export const ADDITIONAL_FUSE_AMPS: readonly number[] = [1, 3, 6, 10, 601];

/** True when the breaker size (A) is a NEC 240.6(A) standard rating. */
export function isStandardBreaker(amps: number): boolean {
  return STANDARD_BREAKER_AMPS.includes(amps);
}

/** Standard breaker ratings (A) from minAmps to maxAmps inclusive. */
export function standardBreakersBetween(minAmps: number, maxAmps: number): number[] {
  return STANDARD_BREAKER_AMPS.filter((a) => a >= minAmps && a <= maxAmps);
}

/** Largest standard rating (A) not above the given amps; undefined below 15 A. */
export function standardBreakerAtOrBelow(amps: number): number | undefined {
  return [...STANDARD_BREAKER_AMPS].reverse().find((a) => a <= amps);
}

/** Smallest standard rating (A) not below the given amps. */
export function standardBreakerAtOrAbove(amps: number): number | undefined {
  return STANDARD_BREAKER_AMPS.find((a) => a >= amps);
}
