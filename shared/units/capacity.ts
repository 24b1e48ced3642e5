/**
 * Capacity units. 1 ton of refrigeration = 12,000 Btu/h (288,000 Btu per 24 h);
 * 1 Btu/h = 0.29307107 W (definition of the refrigeration ton and the IT Btu).
 */
export const BTUH_PER_TON = 12000;
export const WATTS_PER_BTUH = 0.29307107;

/** Tons of refrigeration → Btu/h. */
export function tonsToBtuh(tons: number): number {
  return tons * BTUH_PER_TON;
}

/** Btu/h → tons of refrigeration. */
export function btuhToTons(btuh: number): number {
  return btuh / BTUH_PER_TON;
}

/** Tons of refrigeration → kW. */
export function tonsToKw(tons: number): number {
  return (tons * BTUH_PER_TON * WATTS_PER_BTUH) / 1000;
}

/** Btu/h → kW. */
export function btuhToKw(btuh: number): number {
  return (btuh * WATTS_PER_BTUH) / 1000;
}
