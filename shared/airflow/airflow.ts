/**
 * Airflow relations for standard air (0.075 lb/ft³): 0.075 × 60 min/h × 0.24 Btu/lb·°F = 1.08
 * (ASHRAE Handbook—Fundamentals load-calculation chapters). At altitude the factor is lower.
 */
export const SENSIBLE_FACTOR_STD_AIR = 1.08;

/** Airflow per ton: CFM ÷ nominal tons (CFM/ton). */
export function cfmPerTon(airflowCfm: number, tons: number): number {
  return airflowCfm / tons;
}

/** Sensible capacity of an air stream, Btu/h = 1.08 × CFM × ΔT (°F). */
export function sensibleCapacityBtuh(airflowCfm: number, deltaTF: number, factor = SENSIBLE_FACTOR_STD_AIR): number {
  return factor * airflowCfm * deltaTF;
}

/** Temperature split (°F) an airflow (CFM) needs to carry a sensible load (Btu/h). */
export function temperatureSplitF(sensibleBtuh: number, airflowCfm: number, factor = SENSIBLE_FACTOR_STD_AIR): number {
  return sensibleBtuh / (factor * airflowCfm);
}

/** Airflow (CFM) that carries a sensible load (Btu/h) at a temperature split (°F). */
export function airflowForSensibleCfm(sensibleBtuh: number, deltaTF: number, factor = SENSIBLE_FACTOR_STD_AIR): number {
  return sensibleBtuh / (factor * deltaTF);
}
