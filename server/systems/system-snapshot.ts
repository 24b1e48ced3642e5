import { normalizeModel } from '../../shared/schemas/fields';
import type { CheckResult } from '../../shared/rules/types';
import { catalogVersions } from '../catalog/catalog-version';
import { currentPricesBatch } from '../catalog/prices.service';
import { today } from '../checks/checks.service';
import type { AppContext } from '../context';
import { checkContent, type CheckedContent } from './record-check-memo';
import { PART_SLOTS, type PartSlot, type PriceSnapshot, type RecordContent, type ResolvedParts } from './system-types';

/** What a save stores besides the tech's input: the check as it stood and the facts it stood on. */
export interface Snapshot {
  check: CheckResult;
  parts: ResolvedParts;
  ratedCombination: Record<string, unknown> | null;
  prices: PriceSnapshot;
  /** The JSON text of the check, parts and rated combination as stored (made once per check, see record-check-memo.ts). */
  json: CheckedContent['json'];
}

/**
 * Re-runs the check for a record's content with today's catalog and rules, and takes the best current
 * price of each catalog part. `installDate` pins the date a record was first saved on when it gave none.
 */
export async function takeSnapshot(ctx: AppContext, content: RecordContent, installDate = today()): Promise<Snapshot> {
  const checked = await checkContent(ctx, content, installDate);
  return { ...checked, prices: await priceSnapshot(ctx, checked.parts) };
}

/** The cheapest current price of each catalog part (typed nameplate parts have no price). */
async function priceSnapshot(ctx: AppContext, parts: ResolvedParts): Promise<PriceSnapshot> {
  const slots = PART_SLOTS.filter((slot) => parts[slot]?.id !== undefined && parts[slot]?.spec.model);
  const models = slots.map((slot) => parts[slot]!.spec.model!);
  const asOf = today();
  const best = await bestPrices(ctx, models, asOf);
  const snapshot: PriceSnapshot = { asOf, parts: {} };
  let totalCents = 0;
  slots.forEach((slot: PartSlot, i) => {
    const price = best[i];
    if (!price) return;
    snapshot.parts[slot] = { ...price };
    totalCents += price.priceCents;
  });
  if (Object.keys(snapshot.parts).length > 0) snapshot.totalCents = totalCents;
  return snapshot;
}

type BestPrice = PriceSnapshot['parts'][PartSlot];

// Best prices per set of models, for one prices version and one day. Prices change only by an import
// of prices, which bumps that version in its own transaction (read once per request, so an import on
// another instance is seen too); a save of the same parts then reads no price rows at all.
interface PriceMemo {
  key: string;
  byModels: Map<string, Promise<BestPrice[]>>;
}
const priceMemos = new WeakMap<object, PriceMemo>();
const MAX_MEMO_ENTRIES = 1000;

/** The cheapest current price of each model (undefined where none), in the order given. */
async function bestPrices(ctx: AppContext, models: string[], asOf: string): Promise<BestPrice[]> {
  if (models.length === 0) return [];
  const key = `${(await catalogVersions(ctx.dataSource)).get('prices') ?? 0}|${asOf}`;
  let memo = priceMemos.get(ctx.dataSource);
  if (!memo || memo.key !== key || memo.byModels.size >= MAX_MEMO_ENTRIES) {
    priceMemos.set(ctx.dataSource, (memo = { key, byModels: new Map() }));
  }
  const wanted = models.map(normalizeModel);
  const modelsKey = wanted.join('\n');
  let found = memo.byModels.get(modelsKey);
  if (!found) {
    found = currentPricesBatch(ctx, models, asOf).then((prices) => wanted.map((model) => prices.get(model)?.[0]));
    memo.byModels.set(modelsKey, found);
    const entries = memo.byModels;
    found.catch(() => entries.delete(modelsKey));
  }
  return found;
}
