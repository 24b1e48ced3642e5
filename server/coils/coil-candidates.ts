import Fuse from 'fuse.js';
import type { KindIndex } from '../catalog/catalog-index';
import type { IndoorCoil } from '../catalog/indoor-coil.entity';
import type { CoilsQuery } from '../../shared/schemas/coils';

/** Coils grouped by listed refrigerant, built once per catalog index version. */
const byRefrigerant = new WeakMap<KindIndex, Map<string, IndoorCoil[]>>();

function refrigerantGroups(index: KindIndex): Map<string, IndoorCoil[]> {
  let groups = byRefrigerant.get(index);
  if (!groups) {
    groups = new Map();
    for (const row of index.rows as unknown as IndoorCoil[]) {
      for (const r of row.refrigerants ?? []) {
        const list = groups.get(r);
        if (list) list.push(row);
        else groups.set(r, [row]);
      }
    }
    byRefrigerant.set(index, groups);
  }
  return groups;
}

/**
 * Coils that can pass at all: listed for the outdoor unit's refrigerant and whose tonnage range holds its
 * nominal tons. Every other coil gets the engine's refrigerant-listing or coil-range blocker, so skipping
 * them changes no answer.
 */
export function narrowCandidates(index: KindIndex, refrigerant: string, nominalTons: number): IndoorCoil[] {
  const listed = refrigerantGroups(index).get(refrigerant) ?? [];
  return listed.filter((c) => nominalTons >= c.minTons && nominalTons <= c.maxTons);
}

/** The coils narrowing left out (for "why not this one?"), in catalog order. */
export function leftOutCandidates(index: KindIndex, kept: IndoorCoil[]): IndoorCoil[] {
  const keptIds = new Set(kept.map((c) => c.id));
  return (index.rows as unknown as IndoorCoil[]).filter((c) => !keptIds.has(c.id));
}

/** Filters of the query that read only the coil's own fields (configuration, material, cased, width). */
export function matchesSpecFilters(coil: IndoorCoil, query: CoilsQuery): boolean {
  if (query.configuration && coil.configuration !== query.configuration) return false;
  if (query.material && coil.material !== query.material) return false;
  if (query.cased !== undefined && (coil.cased ?? false) !== query.cased) return false;
  // A coil with no listed width can not be shown to fit a limit, so it is left out when one is asked.
  if (query.maxWidthIn !== undefined && (coil.widthIn == null || coil.widthIn > query.maxWidthIn)) return false;
  return true;
}

/** Lower case without spaces, dashes, dots or slashes: "ab-36 c" and "AB36C" read the same. */
const squash = (s: string) => s.toLowerCase().replace(/[\s\-./]/g, '');

/**
 * Coils fuzzy-matching q (fuse.js) on model, brand, configuration and description; case, dashes and a
 * missing or wrong character are forgiven. Run over the narrowed candidates only, so it stays small.
 */
export function fuzzyFilter(coils: IndoorCoil[], q: string): IndoorCoil[] {
  const docs = coils.map((coil) => ({ coil, modelKey: squash(coil.model), brand: coil.brand ?? '', configuration: coil.configuration ?? '', description: coil.description ?? '' }));
  const fuse = new Fuse(docs, {
    keys: [
      { name: 'modelKey', weight: 3 },
      { name: 'brand', weight: 1 },
      { name: 'configuration', weight: 1 },
      { name: 'description', weight: 1 },
    ],
    threshold: 0.34,
    ignoreLocation: true,
    isCaseSensitive: false,
  });
  const hits = new Set<IndoorCoil>();
  for (const term of new Set([q.trim(), squash(q)])) {
    if (term) for (const r of fuse.search(term)) hits.add(r.item.coil);
  }
  return coils.filter((c) => hits.has(c));
}
