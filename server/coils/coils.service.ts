import { fixedFindings, runChecks, type KnownFindings } from '../../shared/rules/engine';
import type { Pairing, RuleContext } from '../../shared/rules/types';
import type { CoilsQuery, CompatibleCoil, CompatibleCoilsResponse } from '../../shared/schemas/coils';
import { efficiencyFigures } from '../../shared/efficiency/pairing-figures';
import { kindIndex } from '../catalog/catalog-index';
import { toSpec } from '../catalog/catalog-specs';
import type { IndoorCoil } from '../catalog/indoor-coil.entity';
import { currentPricesBatch } from '../catalog/prices.service';
import { normalizeModel } from '../../shared/schemas/fields';
import { resolvePairing } from '../checks/checks.service';
import type { AppContext } from '../context';
import { notFound } from '../lib/errors';
import { loadRuleContext } from '../settings/settings.service';
import { pickBestPrice } from './best-price';
import { fuzzyFilter, leftOutCandidates, matchesSpecFilters, narrowCandidates } from './coil-candidates';

/** A coil row's spec, worked out once per row object (rows live as long as their catalog index). */
const specs = new WeakMap<IndoorCoil, ReturnType<typeof toSpec<'indoor-coils'>>>();
function specOf(coil: IndoorCoil) {
  let spec = specs.get(coil);
  if (!spec) specs.set(coil, (spec = toSpec('indoor-coils', coil)));
  return spec;
}

const withCoil = (base: Pairing, coil: IndoorCoil): Pairing => ({ ...base, indoorCoil: { spec: specOf(coil), kept: false, id: coil.id } });

/**
 * The check of one coil with the fixed parts: the same engine, settings and scope as POST /api/checks.
 * `known` holds the findings of the rules that never read the coil, worked out once per search.
 */
function checkCoil(base: Pairing, context: RuleContext, known: KnownFindings, coil: IndoorCoil, state: string | undefined): CompatibleCoil {
  const pairing = withCoil(base, coil);
  const spec = pairing.indoorCoil!.spec;
  const result = runChecks(pairing, context, undefined, known);
  const item: CompatibleCoil = { coil: { id: coil.id, ...spec, model: coil.model }, verdict: result.verdict, findings: result.findings };
  const combo = result.computed.ratedCombination as CompatibleCoil['ratedCombination'];
  if (combo) item.ratedCombination = combo;
  if (state && result.computed.regionalMinimum && efficiencyFigures(pairing).seer2 !== undefined) {
    item.meetsRegionalMinimum = !result.findings.some((f) => f.ruleId === 'efficiency.regional-minimum' && f.severity === 'blocker');
  }
  return item;
}

/** Cautions per item, counted once: the sort compares each item many times. */
const cautionCounts = new WeakMap<CompatibleCoil, number>();
function cautionsOf(item: CompatibleCoil): number {
  let n = cautionCounts.get(item);
  if (n === undefined) {
    n = 0;
    for (const f of item.findings) if (f.severity === 'caution') n++;
    cautionCounts.set(item, n);
  }
  return n;
}

/** Rated combination first, then fewer cautions, then price (no price last), then model for a stable order. */
export function compareCoils(a: CompatibleCoil, b: CompatibleCoil): number {
  const rated = Number(!a.ratedCombination) - Number(!b.ratedCombination);
  if (rated !== 0) return rated;
  const cautions = cautionsOf(a) - cautionsOf(b);
  if (cautions !== 0) return cautions;
  const pa = a.bestPrice?.priceCents ?? Infinity;
  const pb = b.bestPrice?.priceCents ?? Infinity;
  if (pa !== pb) return pa < pb ? -1 : 1;
  return a.coil.model.localeCompare(b.coil.model);
}

/**
 * GET /api/coils/compatible: every catalog coil that passes with the outdoor unit (and the kept air
 * handler or furnace), with rating and best price. Candidates are narrowed by refrigerant listing and
 * tonnage through the catalog index, then each is run through the shared engine; incompatible coils
 * come after the passing ones only when asked for.
 */
export async function compatibleCoils(ctx: AppContext, query: CoilsQuery, today?: string): Promise<CompatibleCoilsResponse> {
  const [outdoors, handlers, coils, context] = await Promise.all([
    kindIndex(ctx.dataSource, 'outdoor-units'),
    kindIndex(ctx.dataSource, 'air-handlers'),
    kindIndex(ctx.dataSource, 'indoor-coils'),
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

  const narrowed = narrowCandidates(coils, base.outdoor.spec.refrigerant, base.outdoor.spec.nominalTons);
  const select = (list: IndoorCoil[]) => {
    const filtered = list.filter((c) => matchesSpecFilters(c, query));
    return query.q ? fuzzyFilter(filtered, query.q) : filtered;
  };

  const candidates = select(narrowed);
  const leftOut = query.includeIncompatible ? select(leftOutCandidates(coils, narrowed)) : [];
  // The rules that never read the coil (line set, electrical, controls…) give the same findings for every candidate.
  const probe = candidates[0] ?? leftOut[0];
  const known = probe ? fixedFindings(withCoil(base, probe), context, 'indoorCoil') : [];
  const passing: CompatibleCoil[] = [];
  const failing: CompatibleCoil[] = [];
  for (const coil of candidates) {
    const item = checkCoil(base, context, known, coil, query.state);
    (item.verdict === 'incompatible' ? failing : passing).push(item);
  }
  for (const coil of leftOut) failing.push(checkCoil(base, context, known, coil, query.state));

  const shown = query.includeIncompatible ? [...passing, ...failing] : passing;
  const prices = await currentPricesBatch(ctx, shown.map((i) => i.coil.model), today);
  for (const item of shown) {
    const best = pickBestPrice(prices.get(normalizeModel(item.coil.model)));
    if (best) item.bestPrice = best;
  }
  const kept = (list: CompatibleCoil[]) => list.filter((i) => (!query.ratedOnly || i.ratedCombination) && (!query.inStock || i.bestPrice)).sort(compareCoils);
  const items = [...kept(passing), ...(query.includeIncompatible ? kept(failing) : [])];
  return { items: items.slice(0, query.limit), total: items.length };
}
