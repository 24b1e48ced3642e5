import type { CoilBestPrice } from '../../shared/schemas/coils';
import type { CurrentPrice } from '../catalog/prices.service';

/**
 * The best of the distributors' current prices (each already the latest not in the future): the
 * cheapest; on a tie the most recently effective, then the distributor's name so the pick is stable.
 */
export function pickBestPrice(prices: CurrentPrice[] | undefined): CoilBestPrice | undefined {
  let best: CurrentPrice | undefined;
  for (const p of prices ?? []) {
    if (
      !best ||
      p.priceCents < best.priceCents ||
      (p.priceCents === best.priceCents && (p.effectiveFrom > best.effectiveFrom || (p.effectiveFrom === best.effectiveFrom && p.distributor.localeCompare(best.distributor) < 0)))
    ) {
      best = p;
    }
  }
  return best && { distributor: best.distributor, priceCents: best.priceCents, effectiveFrom: best.effectiveFrom };
}
