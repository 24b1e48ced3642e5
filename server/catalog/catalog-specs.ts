import type { EntityManager, Repository } from 'typeorm';
import type {
  AirHandlerSpec,
  CatalogKind,
  IndoorCoilSpec,
  MeteringDeviceSpec,
  OutdoorUnitSpec,
  RatedCombinationSpec,
} from '../../shared/schemas/equipment';
import { modelMatches } from '../../shared/rules/rated-match';
import { normalizeModel } from '../../shared/schemas/fields';
import type { AppContext } from '../context';
import { kindIndex } from './catalog-index';
import { AirHandler } from './air-handler.entity';
import { KINDS } from './catalog-kinds';
import { IndoorCoil } from './indoor-coil.entity';
import { MeteringDevice } from './metering-device.entity';
import { OutdoorUnit } from './outdoor-unit.entity';
import { RatedCombination } from './rated-combination.entity';

/** The spec type each catalog kind resolves to. */
export interface SpecByKind {
  'outdoor-units': OutdoorUnitSpec;
  'indoor-coils': IndoorCoilSpec;
  'air-handlers': AirHandlerSpec;
  'metering-devices': MeteringDeviceSpec;
  'rated-combinations': RatedCombinationSpec;
}
export interface EntityByKind {
  'outdoor-units': OutdoorUnit;
  'indoor-coils': IndoorCoil;
  'air-handlers': AirHandler;
  'metering-devices': MeteringDevice;
  'rated-combinations': RatedCombination;
}

const BOOKKEEPING = new Set(['id', 'importId', 'normalizedModel', 'normalizedOutdoorModel', 'normalizedIndoorModel', 'normalizedAirHandlerModel']);

// Each row's spec, worked out once: the catalog index's rows are never changed in place (a catalog change
// builds a new index), and a check resolves the same few rows on every request. Frozen, as callers share it.
const specOfRow = new WeakMap<object, object>();

/** The plain spec of a catalog row: its spec fields without id, import bookkeeping or nulls (frozen, shared). */
export function toSpec<K extends CatalogKind>(kind: K, entity: EntityByKind[K]): SpecByKind[K] {
  const known = specOfRow.get(entity);
  if (known) return known as SpecByKind[K];
  const spec: Record<string, unknown> = {};
  for (const field of KINDS[kind].fields) {
    const value = (entity as unknown as Record<string, unknown>)[field];
    if (value !== null && value !== undefined && !BOOKKEEPING.has(field)) spec[field] = value;
  }
  specOfRow.set(entity, Object.freeze(spec));
  return spec as SpecByKind[K];
}

/** The spec plus its id, as the catalog API lists items. */
export function toItem<K extends CatalogKind>(kind: K, entity: EntityByKind[K]): SpecByKind[K] & { id: number } {
  return { id: entity.id, ...toSpec(kind, entity) };
}

/** The repository of each catalog kind (optionally inside a transaction's manager). */
export function catalogRepositories(source: AppContext | EntityManager) {
  const manager = 'dataSource' in source ? source.dataSource.manager : source;
  return {
    'outdoor-units': manager.getRepository(OutdoorUnit),
    'indoor-coils': manager.getRepository(IndoorCoil),
    'air-handlers': manager.getRepository(AirHandler),
    'metering-devices': manager.getRepository(MeteringDevice),
    'rated-combinations': manager.getRepository(RatedCombination),
  } as { [K in CatalogKind]: Repository<EntityByKind[K]> };
}

/** One catalog row by kind and id, or null. */
export async function findCatalogItem<K extends CatalogKind>(ctx: AppContext, kind: K, id: number): Promise<EntityByKind[K] | null> {
  // Served from the in-memory catalog index (kept current with imports) rather than a query per part.
  const index = await kindIndex(ctx.dataSource, kind);
  return (index.byId.get(id) as EntityByKind[K] | undefined) ?? null;
}

/** Rows whose outdoor model is a family pattern (`*`, `?`), found once per catalog index. */
const familyRows = new WeakMap<object, RatedCombination[]>();
/** Each outdoor model's rated combinations, per catalog index (a check asks for the same few models). */
const byModel = new WeakMap<object, Map<string, readonly RatedCombinationSpec[]>>();
const MODELS_KEPT = 5000;

/**
 * Rated combinations whose outdoor model matches (normalised), as specs: rows for the exact model
 * plus rows whose outdoor model is a family pattern that matches it (the engine picks the most specific).
 * The list is shared between callers: read it, do not change it.
 */
export async function findRatedCombinations(ctx: AppContext, outdoorModel: string): Promise<readonly RatedCombinationSpec[]> {
  const key = normalizeModel(outdoorModel);
  const index = await kindIndex(ctx.dataSource, 'rated-combinations');
  let models = byModel.get(index);
  if (!models) byModel.set(index, (models = new Map()));
  const known = models.get(key);
  if (known) return known;
  const rows = (index.byOutdoorModel.get(key) ?? []) as unknown as RatedCombination[];
  let families = familyRows.get(index);
  if (!families) {
    families = (index.rows as unknown as RatedCombination[]).filter((row) => /[*?]/.test(row.outdoorModel));
    familyRows.set(index, families);
  }
  const matched = families.filter((row) => modelMatches(row.outdoorModel, key));
  const specs = Object.freeze([...rows, ...matched].map((row) => toSpec('rated-combinations', row)));
  if (models.size >= MODELS_KEPT) models.clear();
  models.set(key, specs);
  return specs;
}
