import type { DataSource } from 'typeorm';
import type { KindIndex } from '../catalog/catalog-index';
import { catalogVersions } from '../catalog/catalog-version';
import { readCurrentPrices } from '../catalog/prices.service';
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
  const book: PriceBook = new Map();
  for (const [model, list] of await readCurrentPrices(dataSource, today)) {
    const best = pickBestPrice(list);
    if (best) book.set(model, best);
  }
  return book;
}
