import { lineSizeIndex, STANDARD_LINE_SIZES } from './tube-sizes';

/**
 * Equivalent length of one 90° short-radius copper elbow, ft, by tube OD: ASHRAE Handbook—
 * Refrigeration, chapter 1 (fitting losses in equivalent feet of pipe) — figures from memory for
 * 1/2 in and up; 1/4–3/8 in extrapolated from them (common practice, no source).
 */
export const ELBOW_EQUIVALENT_FT: Readonly<Record<string, number>> = {
  '1/4': 0.7,
  '5/16': 0.8,
  '3/8': 1.0,
  '1/2': 1.4,
  '5/8': 1.6,
  '3/4': 1.8,
  '7/8': 2.0,
  '1-1/8': 2.6,
  '1-3/8': 3.3,
  '1-5/8': 4.0,
};

export const ELBOW_EQUIVALENT_CITATION = 'ASHRAE Handbook—Refrigeration, chapter 1, fitting losses in equivalent feet of pipe (90° elbows)';

/** Equivalent feet of one 90° elbow for a tube OD (in); undefined for a non-standard size. */
export function elbowEquivalentFt(odIn: number): number | undefined {
  const i = lineSizeIndex(odIn);
  return i < 0 ? undefined : ELBOW_EQUIVALENT_FT[STANDARD_LINE_SIZES[i].label];
}

/** Equivalent length, ft = measured length + elbows × equivalent feet per elbow at the tube OD (in). */
export function equivalentLengthFt(lengthFt: number, elbows: number, odIn: number): number | undefined {
  if (elbows === 0) return lengthFt;
  const per = elbowEquivalentFt(odIn);
  return per === undefined ? undefined : lengthFt + elbows * per;
}
