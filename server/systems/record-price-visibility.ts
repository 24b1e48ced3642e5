import type { Role } from '../../shared/schemas/auth';
import { seesPrices } from '../catalog/price-visibility';
import type { PriceSnapshot } from './system-types';

/**
 * A record as a role may see it: a tech learns which parts were stocked and by whom, not what the
 * shop paid (issue 7: pricing stays with the office). The stored snapshot itself is never changed.
 */
export function recordForRole<T extends { prices: PriceSnapshot }>(role: Role, view: T): T {
  if (seesPrices(role)) return view;
  const parts: Record<string, unknown> = {};
  for (const [slot, price] of Object.entries(view.prices.parts)) {
    if (price) parts[slot] = { distributor: price.distributor, effectiveFrom: price.effectiveFrom, inStock: true };
  }
  return { ...view, prices: { asOf: view.prices.asOf, parts } as unknown as PriceSnapshot };
}
