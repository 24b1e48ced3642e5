import Fuse from 'fuse.js';
import type { IndoorCoil } from '../catalog/indoor-coil.entity';
import type { CoilsQuery } from '../../shared/schemas/coils';
import type { CoilCatalog } from './coil-catalog';

/**
 * Positions of the coils that can pass at all: listed for the outdoor unit's refrigerant and whose
 * tonnage range holds its nominal tons (catalog order, kept per catalog). Every other coil gets the
 * engine's refrigerant-listing or coil-range blocker, so skipping them changes no answer.
 */
export function narrowCandidates(catalog: CoilCatalog, refrigerant: string, nominalTons: number): Int32Array {
  const key = `${refrigerant}|${nominalTons}`;
  let narrowed = catalog.narrowed.get(key);
  if (!narrowed) {
    const listed = catalog.byRefrigerant.get(refrigerant) ?? new Int32Array(0);
    narrowed = listed.filter((i) => nominalTons >= catalog.rows[i].minTons && nominalTons <= catalog.rows[i].maxTons);
    catalog.narrowed.set(key, narrowed);
  }
  return narrowed;
}

/** The positions narrowing left out (for "why not this one?"), in catalog order. */
export function leftOutCandidates(catalog: CoilCatalog, kept: Int32Array): number[] {
  const isKept = new Uint8Array(catalog.rows.length);
  for (const i of kept) isKept[i] = 1;
  const out: number[] = [];
  for (let i = 0; i < isKept.length; i++) if (!isKept[i]) out.push(i);
  return out;
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

interface CoilDoc {
  position: number;
  modelKey: string;
  brand: string;
  configuration: string;
  description: string;
}
const docs = new WeakMap<IndoorCoil, CoilDoc>();
function docOf(catalog: CoilCatalog, position: number): CoilDoc {
  const coil = catalog.rows[position];
  let doc = docs.get(coil);
  if (!doc) {
    doc = { position, modelKey: squash(coil.model), brand: coil.brand ?? '', configuration: coil.configuration ?? '', description: coil.description ?? '' };
    docs.set(coil, doc);
  }
  return doc;
}

const FUSE_OPTIONS = {
  keys: [
    { name: 'modelKey', weight: 3 },
    { name: 'brand', weight: 1 },
    { name: 'configuration', weight: 1 },
    { name: 'description', weight: 1 },
  ],
  threshold: 0.34,
  ignoreLocation: true,
  isCaseSensitive: false,
};

/**
 * Positions fuzzy-matching q (fuse.js) on model, brand, configuration and description; case, dashes and
 * a missing or wrong character are forgiven. Whether fuse.js keeps a document depends on that document
 * alone, so running it over the filtered candidates only changes no answer. Keeps the given order.
 */
export function fuzzyFilter(catalog: CoilCatalog, positions: readonly number[], q: string): number[] {
  const fuse = new Fuse(
    positions.map((p) => docOf(catalog, p)),
    FUSE_OPTIONS,
  );
  const hits = new Set<number>();
  for (const term of new Set([q.trim(), squash(q)])) {
    if (term) for (const r of fuse.search(term)) hits.add(r.item.position);
  }
  return positions.filter((p) => hits.has(p));
}
