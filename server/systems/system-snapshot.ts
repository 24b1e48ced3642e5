import { runChecks } from '../../shared/rules/engine';
import { normalizeModel } from '../../shared/schemas/fields';
import type { CheckResult } from '../../shared/rules/types';
import { currentPricesBatch } from '../catalog/prices.service';
import { resolvePairing, today } from '../checks/checks.service';
import type { AppContext } from '../context';
import { loadRuleContext } from '../settings/settings.service';
import { PART_SLOTS, type PriceSnapshot, type RecordContent, type ResolvedParts } from './system-types';

/** What a save stores besides the tech's input: the check as it stood and the facts it stood on. */
export interface Snapshot {
  check: CheckResult;
  parts: ResolvedParts;
  ratedCombination: Record<string, unknown> | null;
  prices: PriceSnapshot;
}

/**
 * Re-runs the check for a record's content with today's catalog and rules, and takes the best current
 * price of each catalog part. `installDate` pins the date a record was first saved on when it gave none.
 */
export async function takeSnapshot(ctx: AppContext, content: RecordContent, installDate = today()): Promise<Snapshot> {
  const [pairing, ruleContext] = await Promise.all([resolvePairing(ctx, content, installDate), loadRuleContext(ctx)]);
  const check = runChecks(pairing, ruleContext);
  const { ratedCombinations: _list, ...parts } = pairing;
  const combo = check.computed.ratedCombination;
  return {
    check,
    parts,
    ratedCombination: combo && typeof combo === 'object' ? (combo as Record<string, unknown>) : null,
    prices: await priceSnapshot(ctx, parts),
  };
}

/** The cheapest current price of each catalog part (typed nameplate parts have no price). */
async function priceSnapshot(ctx: AppContext, parts: ResolvedParts): Promise<PriceSnapshot> {
  const slots = PART_SLOTS.filter((slot) => parts[slot]?.id !== undefined && parts[slot]?.spec.model);
  const prices = await currentPricesBatch(
    ctx,
    slots.map((slot) => parts[slot]!.spec.model!),
  );
  const snapshot: PriceSnapshot = { asOf: today(), parts: {} };
  let totalCents = 0;
  for (const slot of slots) {
    const model = parts[slot]!.spec.model!;
    const best = prices.get(normalizeModel(model))?.[0];
    if (!best) continue;
    snapshot.parts[slot] = best;
    totalCents += best.priceCents;
  }
  if (Object.keys(snapshot.parts).length > 0) snapshot.totalCents = totalCents;
  return snapshot;
}
