import { tubeBoreIn } from './tube-sizes';

/**
 * Saturated-liquid density at 90 °F liquid temperature, lb/ft³. R-410A 63.7 and R-22 72.5 are the
 * CoolProp 8.0.0 figures behind values.json LS-01/LS-02; R-32 58.0 and R-454B 59.6 are from the
 * LS-02 notes (CoolProp 8.0.0); R-407C 70.5 is from memory.
 */
export const LIQUID_DENSITY_90F_LB_FT3: Readonly<Record<string, number>> = {
  'R-410A': 63.7,
  'R-22': 72.5,
  'R-32': 58.0,
  'R-454B': 59.6,
  'R-407C': 70.5,
};

const SQ_IN_PER_SQ_FT = 144;
const OZ_PER_LB = 16;

/** Refrigerant held by one foot of liquid-full line, oz/ft = bore area (ft²) × liquid density × 16. */
export function liquidLineOzPerFt(refrigerant: string, liquidOdIn: number): number | undefined {
  const density = LIQUID_DENSITY_90F_LB_FT3[refrigerant];
  const bore = tubeBoreIn(liquidOdIn);
  if (density === undefined || bore === undefined) return undefined;
  const areaFt2 = (Math.PI / 4) * bore * bore / SQ_IN_PER_SQ_FT;
  return areaFt2 * density * OZ_PER_LB;
}

/** Ratio of what two liquid-line sizes hold per foot (bore area ratio), for ODs in inches. */
export function tubeContentRatio(toOdIn: number, fromOdIn: number): number | undefined {
  const to = tubeBoreIn(toOdIn);
  const from = tubeBoreIn(fromOdIn);
  if (to === undefined || from === undefined) return undefined;
  return (to * to) / (from * from);
}
