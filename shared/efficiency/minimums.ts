// Source: 10 CFR 430.32(c), DOE energy conservation standards for central air conditioners and heat
// pumps, levels for products manufactured (or, for split ACs in the South, installed) on or after
// 2023-01-01, adopted by DOE direct final rule 82 FR 1786 (Jan 6, 2017), dates confirmed 82 FR 24211.
// Cross-check: 16 CFR 305 App. H (FTC EnergyGuide ranges). Southwest EER2 for >=45,000 Btu/h split
// ACs (11.2) and single-package AC Southwest EER2 (10.6) are from memory. Kept as data so the office
// can update them.
import type { DoeRegion } from './regions';

export type ProductClass = 'split-ac' | 'split-heat-pump' | 'single-package-ac' | 'single-package-heat-pump';
export type CapacityClass = 'under-45k' | '45k-and-over';

export interface MinimumLevel {
  seer2: number;
  /** EER2 floor when the unit's SEER2 is below `eer2HighSeer2At` (Southwest ACs only). */
  eer2?: number;
  /** EER2 floor for units whose SEER2 is at or above `eer2HighSeer2At`. */
  eer2HighSeer2?: number;
  eer2HighSeer2At?: number;
  hspf2?: number;
}

/** The split at 45,000 Btu/h: "less than 45,000" vs "45,000 and greater" (10 CFR 430.32(c)). */
export const CAPACITY_SPLIT_BTUH = 45000;

type Table = Record<ProductClass, Partial<Record<DoeRegion | 'national', Partial<Record<CapacityClass | 'any', MinimumLevel>>>>>;

export const MINIMUMS_2023: Table = {
  'split-ac': {
    north: { any: { seer2: 13.4 } },
    southeast: { 'under-45k': { seer2: 14.3 }, '45k-and-over': { seer2: 13.8 } },
    southwest: {
      'under-45k': { seer2: 14.3, eer2: 11.7, eer2HighSeer2: 9.8, eer2HighSeer2At: 15.2 },
      '45k-and-over': { seer2: 13.8, eer2: 11.2, eer2HighSeer2: 9.8, eer2HighSeer2At: 15.2 },
    },
  },
  // Heat pumps are not regional (compliance by manufacture date).
  'split-heat-pump': { national: { any: { seer2: 14.3, hspf2: 7.5 } } },
  'single-package-ac': { national: { any: { seer2: 13.4 } }, southwest: { any: { seer2: 13.4, eer2: 10.6 } } },
  'single-package-heat-pump': { national: { any: { seer2: 13.4, hspf2: 6.7 } } },
};

/** The 2023 level row for a class, region and capacity class; undefined if the table has none. */
export function levelFor(productClass: ProductClass, region: DoeRegion, capacity: CapacityClass): MinimumLevel | undefined {
  const byRegion = MINIMUMS_2023[productClass];
  const row = byRegion[region] ?? byRegion.national;
  return row?.[capacity] ?? row?.any;
}
