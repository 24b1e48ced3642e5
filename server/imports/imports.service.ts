import type { EntityManager } from 'typeorm';
import type { ImportKind } from '../../shared/schemas/equipment';
import { invalidateCatalogIndex } from '../catalog/catalog-index';
import { Distributor } from '../catalog/distributor.entity';
import type { AppContext } from '../context';
import { AppError, conflict, notFound } from '../lib/errors';
import { User } from '../users/user.entity';
import { ColumnMapping } from './column-mapping.entity';
import { applyCatalogPlan, applyPricePlan } from './import-apply';
import { parseImportFile, type ParsedFile, type ParsedRow } from './import-parse';
import { planCatalog, planPrices, type ImportPlan } from './import-plan';
import { revertImportRows } from './import-revert';
import { toImportView, type ImportView } from './import-view';
import { ImportRecord, type ImportRowError } from './import.entity';

/** Row errors kept on an import and returned: enough to fix a file; the rejected count stays exact. */
export const MAX_LISTED_ERRORS = 1000;

export interface UploadInput {
  buffer: Buffer;
  fileName: string;
  kind: ImportKind;
  distributor?: string;
  dryRun: boolean;
  mapping?: Record<string, string>;
  userId: number | null;
  /** ISO date a blank effective date means (tests pin it). */
  today?: string;
}

interface PreviewPayload {
  presentFields: string[];
  rows: ParsedRow[];
}

/**
 * An upload: parse and validate it all first; then either store a preview (dryRun) or, only when
 * every row is valid, commit it in one transaction. A file with a bad row and dryRun=false writes nothing.
 */
export async function uploadImport(ctx: AppContext, input: UploadInput): Promise<ImportView> {
  const distributorName = input.distributor?.trim() || undefined;
  if (input.kind === 'prices' && !distributorName) {
    throw new AppError('validation-failed', 'A price file needs the distributor it comes from.', 422, [{ path: 'distributor', message: 'required for prices' }]);
  }
  const known = distributorName ? await ctx.dataSource.getRepository(Distributor).findOneBy({ name: distributorName }) : null;
  const mapping = { ...(known ? await savedMapping(ctx.dataSource.manager, known.id, input.kind) : {}), ...(input.mapping ?? {}) };
  const parsed = parseImportFile(input.buffer, input.kind, mapping, input.today);

  if (!input.dryRun && parsed.rejected > 0) {
    throw new AppError('rows-rejected', `${parsed.rejected} of ${parsed.rowCount} rows are not valid; nothing was imported. Fix them, or upload as a preview and commit the valid rows.`, 422, {
      counts: { rows: parsed.rowCount, rejected: parsed.rejected },
      errors: parsed.errors.slice(0, MAX_LISTED_ERRORS),
    });
  }

  const view = await ctx.dataSource.transaction(async (manager) => {
    const distributor = distributorName ? await ensureDistributor(manager, distributorName) : null;
    if (distributor && input.mapping && Object.keys(input.mapping).length > 0) await rememberMapping(manager, distributor.id, input.kind, mapping);
    const plan = await planFor(manager, input.kind, distributor?.id ?? null, parsed.rows);
    const record = await manager.save(
      manager.create(ImportRecord, {
        kind: input.kind,
        fileName: input.fileName.slice(0, 255),
        distributorId: distributor?.id ?? null,
        uploadedById: input.userId,
        status: 'preview',
        ...countsOf(parsed, plan),
        errors: parsed.errors.slice(0, MAX_LISTED_ERRORS),
        payload: input.dryRun ? JSON.stringify({ presentFields: parsed.presentFields, rows: parsed.rows } satisfies PreviewPayload) : null,
      }),
    );
    if (!input.dryRun) {
      await applyPlan(manager, plan, record);
      record.status = 'committed';
      record.committedAt = new Date();
      await manager.save(record);
    }
    return toImportView(record, distributor?.name);
  });
  invalidateCatalogIndex(ctx.dataSource);
  return view;
}

/** Applies a preview's valid rows in one transaction (planned again against the tables as they are now). */
export async function commitImport(ctx: AppContext, id: number): Promise<ImportView> {
  const view = await ctx.dataSource.transaction(async (manager) => {
    const record = await manager.findOneBy(ImportRecord, { id });
    if (!record) throw notFound('Import');
    if (record.status !== 'preview') throw conflict(`This import is already ${record.status}; only a preview can be committed.`);
    const payload = JSON.parse(record.payload ?? '{"rows":[]}') as PreviewPayload;
    const plan = await planFor(manager, record.kind as ImportKind, record.distributorId, payload.rows);
    await applyPlan(manager, plan, record);
    Object.assign(record, planCounts(plan), { status: 'committed', committedAt: new Date(), payload: null });
    await manager.save(record);
    return toImportView(record, await distributorName(manager, record.distributorId));
  });
  invalidateCatalogIndex(ctx.dataSource);
  return view;
}

/** Reverts a committed import in one transaction. */
export async function revertImport(ctx: AppContext, id: number): Promise<ImportView> {
  const view = await ctx.dataSource.transaction(async (manager) => {
    const record = await manager.findOneBy(ImportRecord, { id });
    if (!record) throw notFound('Import');
    if (record.status !== 'committed') throw conflict(`This import is ${record.status}; only a committed import can be reverted.`);
    await revertImportRows(manager, record);
    record.status = 'reverted';
    record.revertedAt = new Date();
    await manager.save(record);
    return toImportView(record, await distributorName(manager, record.distributorId));
  });
  invalidateCatalogIndex(ctx.dataSource);
  return view;
}

/** Import history, newest first. */
export async function listImports(ctx: AppContext): Promise<ImportView[]> {
  const records = await ctx.dataSource.getRepository(ImportRecord).find({
    order: { id: 'DESC' },
    select: ['id', 'kind', 'status', 'fileName', 'distributorId', 'uploadedById', 'createdAt', 'rows', 'inserted', 'updated', 'unchanged', 'rejected', 'unmatched', 'errors'],
    take: 200,
  });
  const names = new Map((await ctx.dataSource.getRepository(Distributor).find()).map((d) => [d.id, d.name]));
  const uploaders = new Map((await ctx.dataSource.getRepository(User).find({ select: ['id', 'name'] })).map((u) => [u.id, u.name]));
  return records.map((r) =>
    toImportView(r, r.distributorId ? names.get(r.distributorId) : undefined, r.uploadedById ? uploaders.get(r.uploadedById) : undefined),
  );
}

export async function getImport(ctx: AppContext, id: number): Promise<ImportView> {
  const record = await ctx.dataSource.getRepository(ImportRecord).findOne({
    where: { id },
    select: ['id', 'kind', 'status', 'fileName', 'distributorId', 'createdAt', 'rows', 'inserted', 'updated', 'unchanged', 'rejected', 'unmatched', 'errors'],
  });
  if (!record) throw notFound('Import');
  return toImportView(record, await distributorName(ctx.dataSource.manager, record.distributorId));
}

function planFor(manager: EntityManager, kind: ImportKind, distributorId: number | null, rows: ParsedRow[]): Promise<ImportPlan> {
  return kind === 'prices' ? planPrices(manager, distributorId, rows) : planCatalog(manager, kind, rows);
}

function applyPlan(manager: EntityManager, plan: ImportPlan, record: ImportRecord): Promise<void> {
  if (plan.kind === 'prices') return applyPricePlan(manager, record.distributorId!, plan, record.id);
  return applyCatalogPlan(manager, plan.kind, plan, record.id);
}

const planCounts = (plan: ImportPlan) => ({
  inserted: plan.inserts.length,
  updated: plan.updates.length,
  unchanged: plan.unchanged,
  unmatched: plan.unmatched,
});

function countsOf(parsed: ParsedFile, plan: ImportPlan) {
  return { rows: parsed.rowCount, rejected: parsed.rejected, ...planCounts(plan) };
}

async function ensureDistributor(manager: EntityManager, name: string): Promise<Distributor> {
  const found = await manager.findOneBy(Distributor, { name });
  return found ?? manager.save(manager.create(Distributor, { name }));
}

async function distributorName(manager: EntityManager, id: number | null): Promise<string | undefined> {
  if (id === null) return undefined;
  return (await manager.findOneBy(Distributor, { id }))?.name;
}

async function savedMapping(manager: EntityManager, distributorId: number, kind: ImportKind): Promise<Record<string, string>> {
  return (await manager.findOneBy(ColumnMapping, { distributorId, kind }))?.mapping ?? {};
}

async function rememberMapping(manager: EntityManager, distributorId: number, kind: ImportKind, mapping: Record<string, string>) {
  const found = await manager.findOneBy(ColumnMapping, { distributorId, kind });
  await manager.save(Object.assign(found ?? manager.create(ColumnMapping, { distributorId, kind }), { mapping, updatedAt: new Date() }));
}

export type { ImportRowError };
