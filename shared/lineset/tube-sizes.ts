/**
 * Standard ACR copper tube sizes for line sets (outside diameter, inches) with the bore of the
 * annealed tube. Bores for 1/4–1/2 in are the ASTM B280 dimensions quoted in values.json LS-01
 * (0.190, 0.248, 0.311, 0.436 in); larger sizes are ASTM B280 wall thicknesses from memory.
 */
export const STANDARD_LINE_SIZES: readonly { odIn: number; label: string; boreIn: number }[] = [
  { odIn: 0.25, label: '1/4', boreIn: 0.19 },
  { odIn: 0.3125, label: '5/16', boreIn: 0.248 },
  { odIn: 0.375, label: '3/8', boreIn: 0.311 },
  { odIn: 0.5, label: '1/2', boreIn: 0.436 },
  { odIn: 0.625, label: '5/8', boreIn: 0.555 },
  { odIn: 0.75, label: '3/4', boreIn: 0.666 },
  { odIn: 0.875, label: '7/8', boreIn: 0.785 },
  { odIn: 1.125, label: '1-1/8', boreIn: 1.025 },
  { odIn: 1.375, label: '1-3/8', boreIn: 1.265 },
  { odIn: 1.625, label: '1-5/8', boreIn: 1.505 },
];

/** Sizes typed as decimals (0.38 for 3/8) still match: half the smallest gap between sizes. */
const SIZE_MATCH_TOLERANCE_IN = 0.03;

/** Index of a tube OD (in) in STANDARD_LINE_SIZES, or -1 when it is not a standard size. */
export function lineSizeIndex(odIn: number): number {
  for (let i = 0; i < STANDARD_LINE_SIZES.length; i++) {
    if (Math.abs(STANDARD_LINE_SIZES[i].odIn - odIn) <= SIZE_MATCH_TOLERANCE_IN) return i;
  }
  return -1;
}

/** Index of the standard size nearest a tube OD (in). */
export function nearestLineSizeIndex(odIn: number): number {
  let best = 0;
  for (let i = 1; i < STANDARD_LINE_SIZES.length; i++) {
    if (Math.abs(STANDARD_LINE_SIZES[i].odIn - odIn) < Math.abs(STANDARD_LINE_SIZES[best].odIn - odIn)) best = i;
  }
  return best;
}

/** True when two tube ODs (in) name the same standard size. */
export function sameLineSize(aIn: number, bIn: number): boolean {
  return nearestLineSizeIndex(aIn) === nearestLineSizeIndex(bIn) && Math.abs(aIn - bIn) <= 2 * SIZE_MATCH_TOLERANCE_IN;
}

/** Number of standard sizes between two tube ODs (in): 0 same size, 1 next size up or down. */
export function lineSizeSteps(aIn: number, bIn: number): number {
  return Math.abs(nearestLineSizeIndex(aIn) - nearestLineSizeIndex(bIn));
}

/** Trade label of a tube OD in inches ("3/8", "1-1/8"); a decimal with "in" left off when not standard. */
export function formatLineSize(odIn: number): string {
  const i = lineSizeIndex(odIn);
  return i >= 0 ? STANDARD_LINE_SIZES[i].label : String(Math.round(odIn * 1000) / 1000);
}

/** Bore (inside diameter, in) of a standard tube OD (in), or undefined when not standard. */
export function tubeBoreIn(odIn: number): number | undefined {
  const i = lineSizeIndex(odIn);
  return i >= 0 ? STANDARD_LINE_SIZES[i].boreIn : undefined;
}
