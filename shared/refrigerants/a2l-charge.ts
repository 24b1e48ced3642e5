// Source: UL 60335-2-40, 3rd edition (2019), Annex GG, clause GG.2 — maximum charge in an
// unventilated area m_max = 2.5 × LFL^(5/4) × h0 × A^(1/2) (kg, kg/m³, m, m²); the same formula is
// in ASHRAE 15.2-2022. Release heights h0: floor 0.6 m, wall 1.8 m, ceiling 2.2 m (same clause).
// The 3rd edition is the one EPA SNAP Rule 23 (86 FR 24444) incorporates for A2L use conditions.

export const A2L_CHARGE_EDITION = 'UL 60335-2-40, 3rd ed. (2019), Annex GG.2 (ASHRAE 15.2-2022)';

export type ReleaseLocation = 'floor' | 'wall' | 'ceiling';

/** Installation (release) height h0 in metres for each mounting location. */
export const RELEASE_HEIGHT_M: Record<ReleaseLocation, number> = { floor: 0.6, wall: 1.8, ceiling: 2.2 };

export const KG_PER_OZ = 0.028349523125;
export const M2_PER_SQFT = 0.09290304;

/** Maximum A2L charge in kg for an unventilated area: LFL in kg/m³, h0 in m, area in m². */
export function maxChargeUnventilatedKg(lflKgM3: number, releaseHeightM: number, areaM2: number): number {
  return 2.5 * lflKgM3 ** 1.25 * releaseHeightM * Math.sqrt(areaM2);
}

/** Same limit in ounces from an area in square feet (oz, kg/m³, m, ft²). */
export function maxChargeUnventilatedOz(lflKgM3: number, releaseHeightM: number, areaSqFt: number): number {
  return maxChargeUnventilatedKg(lflKgM3, releaseHeightM, areaSqFt * M2_PER_SQFT) / KG_PER_OZ;
}

/** Total system charge in oz: factory charge plus the adjustment for line beyond the charged length (may be negative below it). */
export function totalChargeOz(factoryChargeOz: number, lineLengthFt: number, chargedLineLengthFt: number, chargePerFtOz: number): number {
  return factoryChargeOz + (lineLengthFt - chargedLineLengthFt) * chargePerFtOz;
}

/** Total charge in oz when the unit's charge facts and the line length (ft) are all known, else undefined. */
export function systemChargeOz(
  outdoor: { factoryChargeOz?: number; chargedLineLengthFt?: number; chargePerFtOz?: number },
  lineLengthFt: number | undefined,
): number | undefined {
  const { factoryChargeOz, chargedLineLengthFt, chargePerFtOz } = outdoor;
  if (factoryChargeOz === undefined || lineLengthFt === undefined || chargedLineLengthFt === undefined || chargePerFtOz === undefined) return undefined;
  return totalChargeOz(factoryChargeOz, lineLengthFt, chargedLineLengthFt, chargePerFtOz);
}
