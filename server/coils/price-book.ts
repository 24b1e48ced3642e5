import type { DataSource } from 'typeorm';
import type { KindIndex } from '../catalog/catalog-index';
import { catalogVersions } from '../catalog/catalog-version';
import { PriceEntry } from '../catalog/price-entry.entity';
import type { CurrentPrice } from '../catalog/prices.service';
import type { CoilBestPrice } from '../../shared/schemas/coils';
import { pickBestPrice } from './best-price';

/** Best current price of every priced model (by normalised model) on one day. */
export type PriceBook = Map<string, CoilBestPrice>;

interface Held {
  key: string;
  book: Promise<PriceBook>;
}

/**
 * Held per coil index object: a write that rolls back drops every catalog index, and with it any book
 * read while that write's rows were visible on the shared connection.
 */
const held = new WeakMap<KindIndex, Held>();

/**
 * The best price of every model as of `today`, read in one query and kept until a price import commits
 * or reverts (the `prices` catalog version, read once per request) or the day changes. The same pick
 * as `currentPricesBatch` + `pickBestPrice`: per distributor the latest entry not after today, then
 * the cheapest, ties to the most recent, then the distributor's name.
 */
export async function priceBook(dataSource: DataSource, coils: KindIndex, today: string): Promise<PriceBook> {
  const key = `${(await catalogVersions(dataSource)).get('prices') ?? 0}|${today}`;
  const current = held.get(coils);
  if (current && current.key === key) return current.book;
  const book = readPriceBook(dataSource, today);
  held.set(coils, { key, book });
  book.catch(() => held.get(coils)?.book === book && held.delete(coils));
  return book;
}

async function readPriceBook(dataSource: DataSource, today: string): Promise<PriceBook> {
  const rows = await dataSource
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
    .where('p.effectiveFrom <= :today', { today })
    .orderBy('p.effectiveFrom', 'DESC')
    .getRawMany<{ normalizedModel: string; distributorId: number; distributor: string; priceCents: number; currency: string; effectiveFrom: string }>();
  const current = new Map<string, CurrentPrice[]>();
  const seen = new Set<string>();
  for (const r of rows) {
    const key = `${r.normalizedModel}|${r.distributorId}`;
    if (seen.has(key)) continue; // rows come latest first: the first per distributor is current
    seen.add(key);
    const list = current.get(r.normalizedModel);
    const price = { distributor: r.distributor, priceCents: Number(r.priceCents), currency: r.currency, effectiveFrom: r.effectiveFrom };
    if (list) list.push(price);
    else current.set(r.normalizedModel, [price]);
  }
  const book: PriceBook = new Map();
  for (const [model, list] of current) {
    const best = pickBestPrice(list);
    if (best) book.set(model, best);
  }
  return book;
}
