// Source: DOE, Enforcement of Regional Standards for Central Air Conditioners, 81 FR 45387
// (Jul 14, 2016; 10 CFR 429/430): split ACs in the Southeast and Southwest comply by installation
// date; split ACs in the North, heat pumps and single-package units comply by manufacture date
// (values.json EFF-12).
import type { DoeRegion } from './regions';
import type { ProductClass } from './minimums';

export const STANDARDS_2023_FROM = '2023-01-01';

export type DateBasis = 'installation' | 'manufacture';

/** Which date decides whether the 2023 levels apply. */
export function complianceDateBasis(productClass: ProductClass, region: DoeRegion): DateBasis {
  return productClass === 'split-ac' && region !== 'north' ? 'installation' : 'manufacture';
}

/**
 * Whether the 2023 levels apply to this unit: by the governing date (ISO strings). With a
 * manufacture-date basis and no manufacture date given, the 2023 levels are assumed to apply.
 */
export function levels2023Apply(basis: DateBasis, installDate: string, manufactureDate: string | undefined): boolean {
  if (basis === 'installation') return installDate >= STANDARDS_2023_FROM;
  return manufactureDate === undefined || manufactureDate >= STANDARDS_2023_FROM;
}
