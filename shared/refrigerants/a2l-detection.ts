// Source: UL 60335-2-40, 3rd edition (2019), Annex GG — appliances with an A2L charge above m1 need
// a refrigerant detection system that starts the mitigation airflow. m1 = 4 m³ × LFL is from memory
// (some readings give A2Ls a 1.5 factor, 6 m³ × LFL); we use the lower figure, which asks for a
// sensor more often. Kept as data so the office can update it.

/** m1 multiplier in m³: charges above m1 = this × LFL (kg) need a refrigerant detection system. */
export const DETECTION_THRESHOLD_M3 = 4;

export const DETECTION_CITATION = 'UL 60335-2-40, 3rd ed. (2019), Annex GG refrigerant detection systems';

/** Charge in kg above which a refrigerant detection system is needed (LFL in kg/m³). */
export function detectionThresholdKg(lflKgM3: number): number {
  return DETECTION_THRESHOLD_M3 * lflKgM3;
}

/**
 * Whether an indoor part is listed for A2L: its own a2lListed flag, else implied by a listing for an
 * A2L refrigerant (DESIGN §2); undefined when neither tells.
 */
export function a2lListingOf(part: { a2lListed?: boolean; refrigerants?: string[] }, isA2L: (r: string) => boolean): boolean | undefined {
  if (part.a2lListed !== undefined) return part.a2lListed;
  if (part.refrigerants?.some(isA2L)) return true;
  return undefined;
}
