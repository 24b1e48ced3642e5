import type { KindIndex } from '../catalog/catalog-index';
import { toSpec } from '../catalog/catalog-specs';
import type { IndoorCoil } from '../catalog/indoor-coil.entity';
import type { IndoorCoilSpec } from '../../shared/schemas/equipment';
import { normalizeModel } from '../../shared/schemas/fields';

/** Spec fields that name a coil rather than describe it: rules that read them run per coil. */
export const IDENTITY_FIELDS: ReadonlySet<string> = new Set(['model', 'brand', 'description']);

/**
 * The coil kind's rows worked out once per catalog index object (so a rebuilt or dropped index starts
 * afresh): each coil addressed by its position in `rows` (catalog order), with its spec, price key,
 * rank by model and the group of coils whose every non-identity field is equal.
 */
export interface CoilCatalog {
  rows: IndoorCoil[];
  /** Rank of each position in `localeCompare` order of the model (equal models share a rank). */
  modelRank: Int32Array;
  /** Positions listed for each refrigerant, catalog order. */
  byRefrigerant: Map<string, Int32Array>;
  /** Narrowed positions by `refrigerant|tons`, filled on first use. */
  narrowed: Map<string, Int32Array>;
  spec(position: number): IndoorCoilSpec;
  /** normalizeModel of the model, the key prices are stored under. */
  priceKey(position: number): string;
  /** Small integer naming the coil's group (equal non-identity spec fields). */
  groupOf(position: number): number;
  /** How many coils of the catalog are in the group. */
  groupSize(group: number): number;
}

const catalogs = new WeakMap<KindIndex, CoilCatalog>();

/** The coil catalog of one index object (built on first use, dropped with the index). */
export function coilCatalog(index: KindIndex): CoilCatalog {
  let catalog = catalogs.get(index);
  if (!catalog) catalogs.set(index, (catalog = buildCoilCatalog(index.rows as unknown as IndoorCoil[])));
  return catalog;
}

function buildCoilCatalog(rows: IndoorCoil[]): CoilCatalog {
  const n = rows.length;
  // One collator sort per catalog version, so a search compares integers instead of strings.
  const collator = new Intl.Collator();
  const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => collator.compare(rows[a].model, rows[b].model));
  const modelRank = new Int32Array(n);
  let rank = 0;
  for (let k = 0; k < n; k++) {
    if (k > 0 && collator.compare(rows[order[k - 1]].model, rows[order[k]].model) !== 0) rank++;
    modelRank[order[k]] = rank;
  }

  const lists = new Map<string, number[]>();
  rows.forEach((row, i) => {
    for (const r of row.refrigerants ?? []) {
      const list = lists.get(r);
      if (list) list.push(i);
      else lists.set(r, [i]);
    }
  });
  const byRefrigerant = new Map([...lists].map(([r, list]) => [r, Int32Array.from(list)]));

  // Specs and groups up front: every search after an import needs them, and each costs a few microseconds.
  const specs = rows.map((row) => toSpec('indoor-coils', row));
  const groupIds = new Map<string, number>();
  const groups = Int32Array.from(specs, (spec) => {
    const key = groupKey(spec);
    let id = groupIds.get(key);
    if (id === undefined) groupIds.set(key, (id = groupIds.size));
    return id;
  });
  const sizes = new Int32Array(groupIds.size);
  for (const g of groups) sizes[g]++;
  const priceKeys: (string | undefined)[] = new Array(n);
  return {
    rows,
    modelRank,
    byRefrigerant,
    narrowed: new Map(),
    spec: (i) => specs[i],
    priceKey: (i) => (priceKeys[i] ??= normalizeModel(rows[i].model)),
    groupOf: (i) => groups[i],
    groupSize: (g) => sizes[g],
  };
}

/** Every field of the spec but the identity ones, as text (values as JSON, so no two specs collide). */
function groupKey(spec: IndoorCoilSpec): string {
  let key = '';
  for (const [field, value] of Object.entries(spec)) {
    if (!IDENTITY_FIELDS.has(field)) key += `${field}=${JSON.stringify(value)};`;
  }
  return key;
}
