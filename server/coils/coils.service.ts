import type { CoilsQuery, CompatibleCoil, CompatibleCoilsResponse } from '../../shared/schemas/coils';
import { kindIndex } from '../catalog/catalog-index';
import { todayIso } from '../catalog/dates';
import { resolvePairing } from '../checks/checks.service';
import type { AppContext } from '../context';
import { notFound } from '../lib/errors';
import { loadRuleContext } from '../settings/settings.service';
import { coilCatalog, type CoilCatalog } from './coil-catalog';
import { fuzzyFilter, leftOutCandidates, matchesSpecFilters, narrowCandidates } from './coil-candidates';
import { CoilEvaluations, cautionsIn, evaluationsFor, isBlocked, isRated, objectId } from './coil-evaluations';
import { priceBook, type PriceBook } from './price-book';

/** One candidate with its sort keys (rated first, fewer cautions, cheaper, model, then the order given). */
interface Ranked {
  position: number;
  seq: number;
  unrated: number;
  cautions: number;
  priceCents: number;
  modelRank: number;
}

const byRank = (a: Ranked, b: Ranked) =>
  a.unrated - b.unrated || a.cautions - b.cautions || (a.priceCents === b.priceCents ? 0 : a.priceCents < b.priceCents ? -1 : 1) || a.modelRank - b.modelRank || a.seq - b.seq;

/**
 * Sorts the passing and the failing coils apart by rating, cautions, price (none last) and model, with
 * the ratedOnly and inStock filters; the order given breaks what the model leaves tied, as a stable sort did.
 */
function rank(catalog: CoilCatalog, evaluations: CoilEvaluations, book: PriceBook, positions: readonly number[], query: CoilsQuery) {
  const passing: Ranked[] = [];
  const failing: Ranked[] = [];
  for (let seq = 0; seq < positions.length; seq++) {
    const position = positions[seq];
    const packed = evaluations.summary(position);
    const blocked = isBlocked(packed);
    if (blocked && !query.includeIncompatible) continue;
    if (query.ratedOnly && !isRated(packed)) continue;
    const priceCents = book.get(catalog.priceKey(position))?.priceCents ?? Infinity;
    if (query.inStock && priceCents === Infinity) continue;
    (blocked ? failing : passing).push({ position, seq, unrated: isRated(packed) ? 0 : 1, cautions: cautionsIn(packed), priceCents, modelRank: catalog.modelRank[position] });
  }
  return { passing: passing.sort(byRank), failing: failing.sort(byRank) };
}

/** The positions a query's own filters keep (spec filters, then the fuzzy search). */
function select(catalog: CoilCatalog, positions: Iterable<number>, query: CoilsQuery): number[] {
  const kept: number[] = [];
  for (const p of positions) if (matchesSpecFilters(catalog.rows[p], query)) kept.push(p);
  return query.q ? fuzzyFilter(catalog, kept, query.q) : kept;
}

/**
 * GET /api/coils/compatible: every catalog coil that passes with the outdoor unit (and the kept air
 * handler or furnace), with rating and best price. Candidates are narrowed by refrigerant listing and
 * tonnage through the catalog index; each is summarised by the shared engine (rules that read no coil
 * identity run once per group of like coils, results kept per search context); only the page shown gets
 * its full findings. Incompatible coils come after the passing ones only when asked for.
 */
export async function compatibleCoils(ctx: AppContext, query: CoilsQuery, today?: string): Promise<CompatibleCoilsResponse> {
  const [outdoors, handlers, coils, combos, context] = await Promise.all([
    kindIndex(ctx.dataSource, 'outdoor-units'),
    kindIndex(ctx.dataSource, 'air-handlers'),
    kindIndex(ctx.dataSource, 'indoor-coils'),
    kindIndex(ctx.dataSource, 'rated-combinations'),
    loadRuleContext(ctx),
  ]);
  const outdoor = outdoors.byId.get(query.outdoorUnitId);
  if (!outdoor) throw notFound('Outdoor unit');
  if (query.airHandlerId !== undefined && !handlers.byId.get(query.airHandlerId)) throw notFound('Air handler or furnace');

  const base = await resolvePairing(
    ctx,
    {
      scope: 'component-replacement',
      site: query.state ? { state: query.state } : undefined,
      outdoor: { id: query.outdoorUnitId },
      airHandler: query.airHandlerId !== undefined ? { id: query.airHandlerId, kept: true } : undefined,
    },
    today,
  );
  const catalog = coilCatalog(coils);
  const book = await priceBook(ctx.dataSource, coils, today ?? todayIso());
  const generation = [outdoors, handlers, coils, combos, context.settings, context.transitionRules].map(objectId).join('|');
  const key = [query.outdoorUnitId, query.airHandlerId ?? '', query.state ?? '', base.installDate].join('|');
  const evaluations = evaluationsFor(ctx.dataSource, generation, key, () => new CoilEvaluations(catalog, base, context, query.state));

  const narrowed = narrowCandidates(catalog, base.outdoor.spec.refrigerant, base.outdoor.spec.nominalTons);
  const candidates = select(catalog, narrowed, query);
  const leftOut = query.includeIncompatible ? select(catalog, leftOutCandidates(catalog, narrowed), query) : [];
  const { passing, failing } = rank(catalog, evaluations, book, [...candidates, ...leftOut], query);
  const ordered = query.includeIncompatible ? [...passing, ...failing] : passing;

  // Pagination before the full findings: only the coils shown are checked in full.
  const items = ordered.slice(0, query.limit).map(({ position }): CompatibleCoil => {
    const best = book.get(catalog.priceKey(position));
    const checked = evaluations.check(position);
    return best ? { ...checked, bestPrice: best } : { ...checked };
  });
  return { items, total: ordered.length };
}
