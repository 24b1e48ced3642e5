import type { DataSource } from 'typeorm';
import type { AppContext } from '../context';
import { normalizeModel } from '../../shared/schemas/fields';
import { todayIso } from './dates';
import { PriceEntry } from './price-entry.entity';

/** A distributor's current price of a model. */
export interface CurrentPrice {
  distributor: string;
  priceCents: number;
  currency: string;
  effectiveFrom: string;
}

const IN_CHUNK = 500;

/**
 * Current prices of many models at once, keyed by normalised model: per distributor the entry with
 * the latest effectiveFrom not after `today` (a future-dated row is scheduled, not current).
 * Each list is cheapest first.
 */
export async function currentPricesBatch(ctx: AppContext, models: string[], today = todayIso()): Promise<Map<string, CurrentPrice[]>> {
  const keys = [...new Set(models.map(normalizeModel))];
  const result = new Map<string, CurrentPrice[]>();
  for (let i = 0; i < keys.length; i += IN_CHUNK) {
    for (const [model, list] of await readCurrentPrices(ctx.dataSource, today, keys.slice(i, i + IN_CHUNK))) result.set(model, list);
  }
  return result;
}

/**
 * Per normalised model, each distributor's current entry as of `today`, cheapest first: of the models
 * given, or of every priced model when none are given (the coil search's price book).
 */
export async function readCurrentPrices(dataSource: DataSource, today: string, models?: string[]): Promise<Map<string, CurrentPrice[]>> {
  const query = dataSource
    .getRepository(PriceEntry)
    .createQueryBuilder('p')
    .innerJoin('distributors', 'd', 'd.id = p.distributorId')
    // Aliases through select(column, alias), which quotes them: PostgreSQL folds a bare alias to lower case.
    .select('p.normalizedModel', 'normalizedModel')
    .addSelect('p.distributorId', 'distributorId')
    .addSelect('d.name', 'distributor')
    .addSelect('p.priceCents', 'priceCents')
    .addSelect('p.currency', 'currency')
    .addSelect('p.effectiveFrom', 'effectiveFrom')
    .where('p.effectiveFrom <= :today', { today });
  if (models) query.andWhere('p.normalizedModel IN (:...models)', { models });
  const rows = await query
    .orderBy('p.effectiveFrom', 'DESC')
    .getRawMany<{ normalizedModel: string; distributorId: number; distributor: string; priceCents: number; currency: string; effectiveFrom: string }>();
  const result = new Map<string, CurrentPrice[]>();
  const seen = new Set<string>();
  for (const r of rows) {
    const key = `${r.normalizedModel}|${r.distributorId}`;
    if (seen.has(key)) continue; // rows come latest first: the first per distributor is current
    seen.add(key);
    const list = result.get(r.normalizedModel) ?? [];
    list.push({ distributor: r.distributor, priceCents: Number(r.priceCents), currency: r.currency, effectiveFrom: r.effectiveFrom });
    result.set(r.normalizedModel, list);
  }
  for (const list of result.values()) list.sort((a, b) => a.priceCents - b.priceCents || a.distributor.localeCompare(b.distributor));
  return result;
}

/** Current prices of one model, one per distributor, cheapest first. */
export async function currentPrices(ctx: AppContext, model: string, today = todayIso()): Promise<CurrentPrice[]> {
  return (await currentPricesBatch(ctx, [model], today)).get(normalizeModel(model)) ?? [];
}
