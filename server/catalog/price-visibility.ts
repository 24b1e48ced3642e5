import { roleAtLeast, type Role } from '../../shared/schemas/auth';
import type { CurrentPrice } from './prices.service';

/** What a role sees of one distributor's current price: estimators and admins the amount, techs only that it is stocked. */
export type VisiblePrice = Partial<Pick<CurrentPrice, 'priceCents' | 'currency'>> & Pick<CurrentPrice, 'distributor' | 'effectiveFrom'> & { inStock: true };

/** Whether a role may see distributor prices (Issue 7: pricing stays with the office). */
export const seesPrices = (role: Role) => roleAtLeast(role, 'estimator');

/** A current price means the distributor stocks the part; the amount is left out for a tech. */
export function visiblePrices(role: Role, prices: CurrentPrice[]): VisiblePrice[] {
  if (seesPrices(role)) return prices.map((p) => ({ ...p, inStock: true }));
  return prices.map((p) => ({ distributor: p.distributor, effectiveFrom: p.effectiveFrom, inStock: true }));
}
