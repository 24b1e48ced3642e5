import type { ShopSettings } from '../schemas/options';

/**
 * Shop defaults until an admin saves their own. The rebate tiers are INVENTED demo tiers (not any real
 * program); hours and the kWh price are placeholders for the shop to set (from memory, typical orders of magnitude).
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
  rebateTiers: [
    { name: 'Demo utility tier 1 (invented)', seer2: 15.2, eer2: 11, note: "Invented demo tier; replace with your program's figures." },
    {
      name: 'Demo utility tier 2 (invented)',
      seer2: 17,
      hspf2: 8.5,
      note: "Invented demo tier; replace with your program's figures.",
    },
  ],
};
