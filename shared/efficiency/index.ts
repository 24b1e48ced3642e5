// Sources: 10 CFR 430.32(c) (2023 regional minimums, regions), 81 FR 45387 (which date governs),
// SEER2 definition for annual energy (values.json SZ-03).
import { CAPACITY_SPLIT_BTUH, levelFor, type ProductClass } from './minimums';
import { REGION_NAMES, regionOfState, type DoeRegion } from './regions';

export * from './regions';
export * from './minimums';
export * from './compliance-date';
export * from './energy';

export const REGIONAL_MINIMUM_BASIS = '10 CFR 430.32(c) (2023 levels, DOE direct final rule 82 FR 1786)';

export interface RegionalMinimum {
  region: DoeRegion;
  regionName: string;
  productClass: ProductClass;
  seer2: number;
  /** EER2 floor that applies (chosen by the unit's SEER2 when given; else the stricter one). */
  eer2?: number;
  hspf2?: number;
  basis: string;
}

/**
 * The 2023 DOE minimum for a site's state, system type and cooling capacity (Btu/h); `seer2` picks the
 * Southwest EER2 floor (9.8 at SEER2 ≥ 15.2). Undefined for an unknown state.
 */
export function regionalMinimum(input: {
  state: string;
  systemType: 'ac' | 'heat-pump';
  coolingBtuh: number;
  seer2?: number;
  singlePackage?: boolean;
}): RegionalMinimum | undefined {
  const region = regionOfState(input.state);
  if (!region) return undefined;
  const productClass: ProductClass = `${input.singlePackage ? 'single-package' : 'split'}-${input.systemType}` as ProductClass;
  const capacity = input.coolingBtuh < CAPACITY_SPLIT_BTUH ? 'under-45k' : '45k-and-over';
  const level = levelFor(productClass, region, capacity);
  if (!level) return undefined;
  let eer2 = level.eer2;
  if (eer2 !== undefined && level.eer2HighSeer2 !== undefined && level.eer2HighSeer2At !== undefined && input.seer2 !== undefined && input.seer2 >= level.eer2HighSeer2At) {
    eer2 = level.eer2HighSeer2;
  }
  return { region, regionName: REGION_NAMES[region], productClass, seer2: level.seer2, eer2, hspf2: level.hspf2, basis: REGIONAL_MINIMUM_BASIS };
}
