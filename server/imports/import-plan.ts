import type { EntityManager } from 'typeorm';
import type { CatalogKind, ImportKind } from '../../shared/schemas/equipment';
import { normalizeModel } from '../../shared/schemas/fields';
import { EQUIPMENT_KINDS, KINDS } from '../catalog/catalog-kinds';
import { PriceEntry } from '../catalog/price-entry.entity';
import type { ParsedRow } from './import-parse';

type Row = Record<string, unknown> & { id: number; importId: number | null };

/** What a commit would do with a file's valid rows against the tables as they are now. */
export interface ImportPlan {
  kind: ImportKind;
  inserts: ParsedRow[];
  updates: { row: ParsedRow; existing: Row }[];
  unchanged: number;
  unmatched: number;
}

const same = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

/** Plans a catalog import: a row is new, or changes an existing one, or leaves it as it is (by normalised key). */
export async function planCatalog(manager: EntityManager, kind: CatalogKind, rows: ParsedRow[]): Promise<ImportPlan> {
  const info = KINDS[kind];
  const existing = (await manager.getRepository(info.entity).find()) as unknown as Row[];
  const byKey = new Map(existing.map((e) => [Object.values(info.keyColumns(e)).join('|'), e]));
  const plan: ImportPlan = { kind, inserts: [], updates: [], unchanged: 0, unmatched: 0 };
  for (const row of rows) {
    const found = byKey.get(row.key);
    if (!found) plan.inserts.push(row);
    else if (Object.entries(row.values).every(([f, v]) => same(found[f], v))) plan.unchanged++;
    else plan.updates.push({ row, existing: found });
  }
  return plan;
}

/** Normalised models of every equipment kind, to count price rows that match nothing as unmatched. */
async function catalogModels(manager: EntityManager): Promise<Set<string>> {
  const models = new Set<string>();
  for (const kind of EQUIPMENT_KINDS) {
    const rows: { normalizedModel: string }[] = await manager
      .getRepository(KINDS[kind].entity)
      .createQueryBuilder('e')
      .select('e.normalizedModel', 'normalizedModel')
      .getRawMany();
    for (const r of rows) models.add(r.normalizedModel);
  }
  return models;
}

// Selected by property name so the raw rows keep camelCase keys on PostgreSQL too (TypeORM quotes them).
const PRICE_PLAN_COLUMNS = ['normalizedModel', 'effectiveFrom', 'priceCents', 'currency', 'description', 'model', 'importId'] as const;

/**
 * Plans a price import for one distributor (null: not yet created, so nothing exists). A blank
 * description keeps the stored one, so it is not a change.
 */
export async function planPrices(manager: EntityManager, distributorId: number | null, rows: ParsedRow[]): Promise<ImportPlan> {
  const existing: Row[] =
    distributorId === null
      ? []
      : await PRICE_PLAN_COLUMNS.reduce((qb, c) => qb.addSelect(`p.${c}`, c), manager.getRepository(PriceEntry).createQueryBuilder('p').select('p.id', 'id'))
          .where('p.distributorId = :distributorId', { distributorId })
          .getRawMany();
  const byKey = new Map(existing.map((e) => [`${e.normalizedModel}|${e.effectiveFrom}`, e]));
  const models = await catalogModels(manager);
  const plan: ImportPlan = { kind: 'prices', inserts: [], updates: [], unchanged: 0, unmatched: 0 };
  for (const row of rows) {
    const v = row.values;
    if (!models.has(normalizeModel(String(v.model)))) plan.unmatched++;
    const found = byKey.get(row.key);
    if (!found) plan.inserts.push(row);
    else if (found.priceCents === v.price && found.currency === v.currency && (v.description === undefined || same(found.description, v.description)))
      plan.unchanged++;
    else plan.updates.push({ row, existing: found });
  }
  return plan;
}
