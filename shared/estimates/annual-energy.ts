// Source: SEER2 and HSPF2 are seasonal Btu delivered per watt-hour (10 CFR 430 Subpart B, Appendix M1), so
// kWh/yr = capacity (Btu/h) × full-load hours / (rating × 1000) — the same method ENERGY STAR's savings
// calculators use. Heating load is approximated by the heat pump's rated cooling capacity (an assumption, said so).
import { annualCoolingKwh } from '../efficiency/energy';
import type { EnergyLeg } from '../schemas/options';
import { roundCents } from './money';

export type { EnergyLeg };

/** Annual heating energy in kWh from capacity (Btu/h), full-load heating hours (h/yr) and HSPF2 (Btu/Wh). */
export function annualHeatingKwh(capacityBtuh: number, fullLoadHours: number, hspf2: number): number {
  return (capacityBtuh * fullLoadHours) / (hspf2 * 1000);
}

const oneDecimal = (n: number) => Math.round(n * 10) / 10;

/** One season compared: kWh (one decimal) and cost (cents) of the existing rating vs the new one. */
export function compareSeason(
  kind: 'cooling' | 'heating',
  capacityBtuh: number,
  hours: number,
  existingRating: number,
  newRating: number,
  centsPerKwh: number,
): EnergyLeg {
  const kwh = kind === 'cooling' ? annualCoolingKwh : annualHeatingKwh;
  const existingKwh = kwh(capacityBtuh, hours, existingRating);
  const newKwh = kwh(capacityBtuh, hours, newRating);
  const existingCostCents = roundCents(existingKwh * centsPerKwh);
  const newCostCents = roundCents(newKwh * centsPerKwh);
  return {
    existingKwh: oneDecimal(existingKwh),
    newKwh: oneDecimal(newKwh),
    savingKwh: oneDecimal(existingKwh - newKwh),
    existingCostCents,
    newCostCents,
    savingCents: existingCostCents - newCostCents,
  };
}
