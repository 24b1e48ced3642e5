// Source: UL 60335-2-40, 3rd edition (2019), Annex GG, clause GG.1 — m1 = 4 m³ × LFL, and for A2L
// refrigerants the standard multiplies m1 by 1.5, i.e. 6 m³ × LFL. At or below m1 no refrigerant
// detection system is required and the room-area limits of GG.2 do not apply; above it, a detection
// system that starts the mitigation airflow is required. For R-454B (LFL 0.296 kg/m³) m1 = 1.776 kg
// (3.91 lb), the figure commonly cited for it. Kept as data so the office can update it.

/** m1 multiplier in m³ for A2L refrigerants: 4 m³ × 1.5 (UL 60335-2-40 3rd ed., GG.1). */
export const DETECTION_THRESHOLD_M3 = 6;

export const DETECTION_CITATION = 'UL 60335-2-40, 3rd ed. (2019), Annex GG, clause GG.1: m1 = 6 m³ × LFL for A2L refrigerants (4 m³ × LFL × 1.5)';

/** Charge in kg above which a refrigerant detection system is needed, m1 (LFL in kg/m³). */
export function detectionThresholdKg(lflKgM3: number): number {
  return DETECTION_THRESHOLD_M3 * lflKgM3;
}

/** m1 in kg for an A2L: at or below it no detection system and no room-area limit apply (LFL in kg/m³). */
export function a2lM1Kg(lflKgM3: number): number {
  return detectionThresholdKg(lflKgM3);
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
