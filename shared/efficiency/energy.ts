// Source: the definition of the seasonal rating, SEER2 in Btu per watt-hour:
// kWh/yr = capacity (Btu/h) × full-load hours / (SEER2 × 1000) — values.json SZ-03 (common practice).

/** Annual cooling energy in kWh from capacity (Btu/h), full-load hours (h/yr) and SEER2 (Btu/Wh). */
export function annualCoolingKwh(capacityBtuh: number, fullLoadHours: number, seer2: number): number {
  return (capacityBtuh * fullLoadHours) / (seer2 * 1000);
}

/** Annual cooling cost in dollars from energy (kWh/yr) and price (dollars per kWh). */
export function annualCoolingCostDollars(kwhPerYear: number, dollarsPerKwh: number): number {
  return kwhPerYear * dollarsPerKwh;
}

/** Yearly savings in kWh of a new SEER2 over an old one at the same capacity (Btu/h) and hours; compare like metrics only. */
export function annualSavingsKwh(capacityBtuh: number, fullLoadHours: number, oldSeer2: number, newSeer2: number): number {
  return annualCoolingKwh(capacityBtuh, fullLoadHours, oldSeer2) - annualCoolingKwh(capacityBtuh, fullLoadHours, newSeer2);
}
