import type { EntityManager } from 'typeorm';
import type { ImportKind } from '../../shared/schemas/equipment';
import type { DecimalConvention, ImportErrorPage } from '../../shared/schemas/imports';
import { dropCatalogIndex, invalidateCatalogIndex } from '../catalog/catalog-index';
import { bumpCatalogVersion } from '../catalog/catalog-version';
import { withWriteLock } from '../db/write-transaction';
import { Distributor } from '../catalog/distributor.entity';
import type { AppContext } from '../context';
import { AppError, conflict, notFound } from '../lib/errors';
import { User } from '../users/user.entity';
import { ColumnMapping } from './column-mapping.entity';
import { applyCatalogPlan, applyPricePlan } from './import-apply';
import { dialectOf } from '../db/dialect';
import { parseImportFileInSlices, parseSteps, type DecimalChoice, type ParsedFile, type ParsedRow } from './import-parse';
import { planCatalog, planPrices, pricePlanner, type ImportPlan } from './import-plan';
import { finishParse, RowsRejected, writePricesWhileParsing } from './price-commit-stream';
import { revertImportRows } from './import-revert';
import { toImportDetail, toImportView, type ImportDetail, type ImportView } from './import-view';
import { ImportRecord, type ImportRowError } from './import.entity';


export interface UploadInput {
  buffer: Buffer;
  fileName: string;
  kind: ImportKind;
  distributor?: string;
  dryRun: boolean;
  mapping?: Record<string, string>;
  /** Price files: the admin's choice of decimal mark (absent: detected from the file, else the distributor's last). */
  decimalConvention?: DecimalConvention;
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
export async function uploadImport(ctx: AppContext, input: UploadInput): Promise<ImportDetail> {
  const distributorName = input.distributor?.trim() || undefined;
  if (input.kind === 'prices' && !distributorName) {
    throw new AppError('validation-failed', 'A price file needs the distributor it comes from.', 422, [{ path: 'distributor', message: 'required for prices' }]);
  }
  const known = distributorName ? await ctx.dataSource.getRepository(Distributor).findOneBy({ name: distributorName }) : null;
  const saved = known ? await ctx.dataSource.manager.findOneBy(ColumnMapping, { distributorId: known.id, kind: input.kind }) : null;
  const mapping = { ...(saved?.mapping ?? {}), ...(input.mapping ?? {}) };
  const decimal: DecimalChoice = { chosen: input.decimalConvention, saved: saved?.decimalConvention };
  if (!input.dryRun && input.kind === 'prices' && distributorName && dialectOf(ctx.dataSource).writesInOwnProcess) {
    return commitPricesWhileParsing(ctx, input, distributorName, mapping, decimal);
  }
  const parsed = await parseImportFileInSlices(input.buffer, input.kind, mapping, input.today, decimal);
  if (!input.dryRun && parsed.rejected > 0) throw rowsRejected(parsed);

  const view = await writeCatalog(ctx, async (manager) => {
    const distributor = distributorName ? await ensureDistributor(manager, distributorName) : null;
    if (distributor) await rememberFileChoices(manager, distributor.id, input, mapping, parsed);
    const plan = await planFor(manager, input.kind, distributor?.id ?? null, parsed.rows);
    const record = await manager.save(
      manager.create(ImportRecord, {
        kind: input.kind,
        fileName: input.fileName.slice(0, 255),
        distributorId: distributor?.id ?? null,
        uploadedById: input.userId,
        status: 'preview',
        ...countsOf(parsed, plan),
        errors: parsed.errors,
        errorsTotal: parsed.errorsTotal,
        decimalConvention: parsed.decimalConvention,
        decimalSource: parsed.decimalSource,
        payload: input.dryRun ? JSON.stringify({ presentFields: parsed.presentFields, rows: parsed.rows } satisfies PreviewPayload) : null,
      }),
    );
    if (!input.dryRun) {
      await applyPlan(manager, plan, record);
      await bumpCatalogVersion(manager, input.kind);
      record.status = 'committed';
      record.committedAt = new Date();
      await manager.save(record);
    }
    return toImportDetail(record, distributor?.name);
  });
  invalidateCatalogIndex(ctx.dataSource);
  return view;
}

/** The refusal of a file to commit with invalid rows: nothing of it was kept. */
function rowsRejected(parsed: ParsedFile): AppError {
  return new AppError('rows-rejected', `${parsed.rejected} of ${parsed.rowCount} rows are not valid; nothing was imported. Fix them, or upload as a preview and commit the valid rows.`, 422, {
    counts: { rows: parsed.rowCount, rejected: parsed.rejected },
    errorsTotal: parsed.errorsTotal,
    ...(parsed.kind === 'prices' ? { decimalConvention: parsed.decimalConvention } : {}),
    errors: parsed.errors,
  });
}

/**
 * uploadImport's commit of a price file where the database works in its own process (PostgreSQL): the
 * file is read whole first (a malformed file or header fails before any lock), then its rows are written
 * while the rest is still being validated (price-commit-stream.ts), so the two use a core each. At the
 * first invalid row the transaction rolls back and the lock is let go; the rest of the file is then read
 * outside it for the error report, the same refusal as when the file is checked whole first.
 */
async function commitPricesWhileParsing(
  ctx: AppContext,
  input: UploadInput,
  distributorName: string,
  mapping: Record<string, string>,
  decimal: DecimalChoice,
): Promise<ImportDetail> {
  const steps = parseSteps(input.buffer, 'prices', mapping, input.today, decimal);
  steps.next();
  let view: ImportDetail;
  try {
    view = await writeCatalog(ctx, async (manager) => {
      const distributor = await ensureDistributor(manager, distributorName);
      const plan = await pricePlanner(manager, distributor.id);
      const record = await manager.save(
        manager.create(ImportRecord, { kind: 'prices', fileName: input.fileName.slice(0, 255), distributorId: distributor.id, uploadedById: input.userId, status: 'preview', errors: [], payload: null }),
      );
      const { parsed, totals } = await writePricesWhileParsing(manager, steps, plan, distributor.id, record.id);
      await rememberFileChoices(manager, distributor.id, input, mapping, parsed);
      await bumpCatalogVersion(manager, 'prices');
      Object.assign(record, totals, {
        rows: parsed.rowCount,
        rejected: parsed.rejected,
        errors: parsed.errors,
        errorsTotal: parsed.errorsTotal,
        decimalConvention: parsed.decimalConvention,
        decimalSource: parsed.decimalSource,
        status: 'committed',
        committedAt: new Date(),
      });
      await manager.save(record);
      return toImportDetail(record, distributor.name);
    });
  } catch (err) {
    if (err instanceof RowsRejected) throw rowsRejected(err.parsed ?? (await finishParse(steps)));
    throw err;
  }
  invalidateCatalogIndex(ctx.dataSource);
  return view;
}

/** Applies a preview's valid rows in one transaction (planned again against the tables as they are now). */
export async function commitImport(ctx: AppContext, id: number): Promise<ImportDetail> {
  const view = await writeCatalog(ctx, async (manager) => {
    const record = await manager.findOneBy(ImportRecord, { id });
    if (!record) throw notFound('Import');
    if (record.status !== 'preview') throw conflict(`This import is already ${record.status}; only a preview can be committed.`);
    const payload = JSON.parse(record.payload ?? '{"rows":[]}') as PreviewPayload;
    const plan = await planFor(manager, record.kind as ImportKind, record.distributorId, payload.rows);
    await applyPlan(manager, plan, record);
    await bumpCatalogVersion(manager, record.kind);
    Object.assign(record, planCounts(plan), { status: 'committed', committedAt: new Date(), payload: null });
    await manager.save(record);
    return toImportDetail(record, await distributorName(manager, record.distributorId));
  });
  invalidateCatalogIndex(ctx.dataSource);
  return view;
}

/** Reverts a committed import in one transaction. */
export async function revertImport(ctx: AppContext, id: number): Promise<ImportDetail> {
  const view = await writeCatalog(ctx, async (manager) => {
    const record = await manager.findOneBy(ImportRecord, { id });
    if (!record) throw notFound('Import');
    if (record.status !== 'committed') throw conflict(`This import is ${record.status}; only a committed import can be reverted.`);
    await revertImportRows(manager, record);
    await bumpCatalogVersion(manager, record.kind);
    record.status = 'reverted';
    record.revertedAt = new Date();
    await manager.save(record);
    return toImportDetail(record, await distributorName(manager, record.distributorId));
  });
  invalidateCatalogIndex(ctx.dataSource);
  return view;
}

/** Import history, newest first, without row errors (those are paged per import). */
export async function listImports(ctx: AppContext): Promise<ImportView[]> {
  const records = await ctx.dataSource.getRepository(ImportRecord).find({
    order: { id: 'DESC' },
    select: ['id', 'kind', 'status', 'fileName', 'distributorId', 'uploadedById', 'createdAt', 'rows', 'inserted', 'updated', 'unchanged', 'rejected', 'unmatched', 'errorsTotal', 'decimalConvention', 'decimalSource'],
    take: 200,
  });
  const names = new Map((await ctx.dataSource.getRepository(Distributor).find()).map((d) => [d.id, d.name]));
  const uploaders = new Map((await ctx.dataSource.getRepository(User).find({ select: ['id', 'name'] })).map((u) => [u.id, u.name]));
  return records.map((r) =>
    toImportView(r, r.distributorId ? names.get(r.distributorId) : undefined, r.uploadedById ? uploaders.get(r.uploadedById) : undefined),
  );
}

const DETAIL_COLUMNS: (keyof ImportRecord)[] = ['id', 'kind', 'status', 'fileName', 'distributorId', 'createdAt', 'rows', 'inserted', 'updated', 'unchanged', 'rejected', 'unmatched', 'errors', 'errorsTotal', 'decimalConvention', 'decimalSource'];

export async function getImport(ctx: AppContext, id: number): Promise<ImportDetail> {
  const record = await ctx.dataSource.getRepository(ImportRecord).findOne({ where: { id }, select: DETAIL_COLUMNS });
  if (!record) throw notFound('Import');
  return toImportDetail(record, await distributorName(ctx.dataSource.manager, record.distributorId));
}

/** One page (1-based) of an import's kept row errors. */
export async function importErrorPage(ctx: AppContext, id: number, page: number, pageSize: number): Promise<ImportErrorPage> {
  const record = await ctx.dataSource.getRepository(ImportRecord).findOne({ where: { id }, select: ['id', 'errors', 'errorsTotal'] });
  if (!record) throw notFound('Import');
  const errors = record.errors ?? [];
  return { errors: errors.slice((page - 1) * pageSize, page * pageSize), page, pageSize, stored: errors.length, errorsTotal: record.errorsTotal ?? errors.length };
}

/** Every kept row error of an import, for the CSV download. */
export async function importErrors(ctx: AppContext, id: number): Promise<{ fileName: string; errors: ImportRowError[] }> {
  const record = await ctx.dataSource.getRepository(ImportRecord).findOne({ where: { id }, select: ['id', 'fileName', 'errors'] });
  if (!record) throw notFound('Import');
  return { fileName: record.fileName, errors: record.errors ?? [] };
}

/**
 * One catalog write under the write lock. Checks may read the catalog between its statements (one
 * shared SQLite connection), so a write that rolls back drops every cached index: none may keep rows
 * that never committed.
 */
async function writeCatalog<T>(ctx: AppContext, work: (manager: EntityManager) => Promise<T>): Promise<T> {
  try {
    return await withWriteLock(ctx, work);
  } catch (err) {
    dropCatalogIndex(ctx.dataSource);
    throw err;
  }
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

/** Remembers a distributor's mapping and/or decimal mark (null: keep what is stored). */
/**
 * Keeps for this distributor's next file what this upload settled: a column mapping the admin gave, and a
 * decimal convention the file showed or the admin chose.
 */
async function rememberFileChoices(manager: EntityManager, distributorId: number, input: UploadInput, mapping: Record<string, string>, parsed: ParsedFile) {
  const newMapping = Boolean(input.mapping && Object.keys(input.mapping).length > 0);
  const newDecimal = parsed.decimalSource === 'file' || parsed.decimalSource === 'chosen' ? parsed.decimalConvention : null;
  if (newMapping || newDecimal) await rememberMapping(manager, distributorId, input.kind, newMapping ? mapping : null, newDecimal);
}

async function rememberMapping(manager: EntityManager, distributorId: number, kind: ImportKind, mapping: Record<string, string> | null, decimal: DecimalConvention | null) {
  const found = await manager.findOneBy(ColumnMapping, { distributorId, kind });
  const row = found ?? manager.create(ColumnMapping, { distributorId, kind, mapping: {}, decimalConvention: null });
  if (mapping) row.mapping = mapping;
  if (decimal) row.decimalConvention = decimal;
  row.updatedAt = new Date();
  await manager.save(row);
}

export type { ImportRowError };
