import type { ShopSettings } from '../schemas/options';

/**
 * Shop defaults until an admin saves their own. Hours and the kWh price are placeholders for the shop to set
 * (from memory, typical orders of magnitude).
 */
export const DEFAULT_SHOP_SETTINGS: ShopSettings = {
  laborRateCents: 9500,
  pricing: 'markup',
  markupPct: 35,
  targetMarginPct: 30,
  taxRatePct: 0,
  repairReplaceThreshold: 5000,
  coolingHoursPerYear: 1000,
  heatingHoursPerYear: 1000,
  centsPerKwh: 15,
  // No tiers until the shop enters its programs': they are also what every check is judged against.
  rebateTiers: [],
};
