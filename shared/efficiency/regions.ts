// Source: 10 CFR 430.32(c) regional definitions (the same regions as the 2015 standards,
// 76 FR 37408, June 27, 2011). Southeast includes TX, OK and HI; DC and the territories are
// Southeast; every other state is North. Kept as data so the office can update it.

export type DoeRegion = 'north' | 'southeast' | 'southwest';

export const SOUTHEAST_STATES = ['AL', 'AR', 'DE', 'FL', 'GA', 'HI', 'KY', 'LA', 'MD', 'MS', 'NC', 'OK', 'SC', 'TN', 'TX', 'VA', 'DC'] as const;
/** US territories (USPS codes), Southeast by the regulation. */
export const SOUTHEAST_TERRITORIES = ['PR', 'VI', 'GU', 'AS', 'MP'] as const;
export const SOUTHWEST_STATES = ['AZ', 'CA', 'NV', 'NM'] as const;
export const NORTH_STATES = [
  'AK', 'CO', 'CT', 'ID', 'IL', 'IN', 'IA', 'KS', 'ME', 'MA', 'MI', 'MN', 'MO', 'MT', 'NE', 'NH', 'NJ', 'NY', 'ND', 'OH', 'OR', 'PA', 'RI',
  'SD', 'UT', 'VT', 'WA', 'WV', 'WI', 'WY',
] as const;

const REGION_BY_STATE = new Map<string, DoeRegion>([
  ...SOUTHEAST_STATES.map((s) => [s, 'southeast'] as const),
  ...SOUTHEAST_TERRITORIES.map((s) => [s, 'southeast'] as const),
  ...SOUTHWEST_STATES.map((s) => [s, 'southwest'] as const),
  ...NORTH_STATES.map((s) => [s, 'north'] as const),
]);

export const REGION_NAMES: Record<DoeRegion, string> = { north: 'North', southeast: 'Southeast', southwest: 'Southwest' };

/** DOE region of a two-letter state or territory code; undefined for an unknown code. */
export function regionOfState(state: string | undefined): DoeRegion | undefined {
  if (!state) return undefined;
  return REGION_BY_STATE.get(state.trim().toUpperCase());
}
