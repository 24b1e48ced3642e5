import {
  MAX_OPTIONS_PER_JOB,
  OptionInputSchema,
  type EnergyQuery,
  type OptionInput,
  type OptionLineInput,
  type OptionListResponse,
  type OptionPatch,
  type OptionView,
} from '../../shared/schemas/options';
import type { AppContext } from '../context';
import { withWriteLock } from '../db/write-transaction';
import { requireJob } from '../jobs/jobs.service';
import { AppError, conflict, notFound, validationError } from '../lib/errors';
import { createSystem } from '../systems/systems.service';
import { parseSystemCreate } from '../systems/system-validation';
import { checkOption, optionCheckRequest } from './option-check';
import { priceLines, toInputLine, withEquipmentLines } from './option-lines';
import { optionView } from './option-view';
import { JobOptionRow, type StoredLine } from './option.entity';
import { getShopSettings } from './shop-settings.service';

const nowIso = () => new Date().toISOString();

async function requireOption(ctx: AppContext, id: number): Promise<JobOptionRow> {
  const row = await ctx.dataSource.getRepository(JobOptionRow).findOneBy({ id });
  if (!row) throw notFound('Option');
  return row;
}

/** GET /api/jobs/:id/options: every option of the job, oldest first, with the customer's choice. */
export async function listOptions(ctx: AppContext, jobId: number, energy: EnergyQuery): Promise<OptionListResponse> {
  const job = await requireJob(ctx, jobId);
  const rows = await ctx.dataSource.getRepository(JobOptionRow).find({ where: { jobId }, order: { id: 'ASC' } });
  const { settings } = await getShopSettings(ctx);
  const items: OptionView[] = [];
  for (const row of rows) items.push(await optionView(ctx, row, job, settings, energy));
  return { items, chosenOptionId: rows.find((r) => r.chosenAt !== null)?.id ?? null };
}

/** GET /api/options/:id. */
export async function getOption(ctx: AppContext, id: number, energy: EnergyQuery = {}): Promise<OptionView> {
  const row = await requireOption(ctx, id);
  const job = await requireJob(ctx, row.jobId);
  return optionView(ctx, row, job, (await getShopSettings(ctx)).settings, energy);
}

/** Resolves the parts (unknown ids → 422) and prices the lines: the snapshot a save stores. */
async function pricedContent(
  ctx: AppContext,
  state: string,
  input: OptionInput,
): Promise<{ content: Omit<OptionInput, 'lines'>; lines: StoredLine[] }> {
  const { lines = [], ...given } = input;
  // The shop's terms are copied in when saved, so a later change of shop settings does not move a saved price.
  const { settings } = await getShopSettings(ctx);
  const content = {
    ...given,
    laborHours: given.laborHours ?? 0,
    laborRateCents: given.laborRateCents ?? settings.laborRateCents,
    taxRatePct: given.taxRatePct ?? settings.taxRatePct,
  };
  if (content.markupPct === undefined && content.targetMarginPct === undefined) {
    if (settings.pricing === 'margin') content.targetMarginPct = settings.targetMarginPct;
    else content.markupPct = settings.markupPct;
  }
  const { pairing } = await checkOption(ctx, content, state);
  if (pairing.outdoor.kept)
    throw new AppError('validation-failed', 'The request did not pass validation.', 422, [
      { path: 'outdoor', message: 'the outdoor unit of an option is new' },
    ]);
  const pathOf = (line: OptionLineInput) => (lines.includes(line) ? `lines.${lines.indexOf(line)}` : `equipment.${line.kind}`);
  return { content, lines: await priceLines(ctx, withEquipmentLines(lines, pairing), pathOf) };
}

/** POST /api/jobs/:id/options: at most three per job (409 beyond). */
export async function createOption(ctx: AppContext, jobId: number, input: OptionInput, userId: number): Promise<OptionView> {
  const job = await requireJob(ctx, jobId);
  const { content, lines } = await pricedContent(ctx, job.state, input);
  const id = await withWriteLock(ctx, async (manager) => {
    const repo = manager.getRepository(JobOptionRow);
    const count = await repo.countBy({ jobId });
    if (count >= MAX_OPTIONS_PER_JOB) {
      throw new AppError('option-limit', `A job holds at most ${MAX_OPTIONS_PER_JOB} options: delete one or change one of them.`, 409, {
        count,
      });
    }
    const at = nowIso();
    const row = await repo.save({
      jobId,
      name: content.name,
      revision: 1,
      content,
      lines,
      chosenAt: null,
      createdBy: userId,
      createdAt: at,
      updatedAt: at,
    });
    return row.id;
  });
  return getOption(ctx, id);
}

/** Applies a patch to the stored input: null clears, absent keeps; a markup and a margin replace each other. */
function mergeInput(row: JobOptionRow, patch: OptionPatch): unknown {
  const { revision: _r, reprice, lines, ...fields } = patch;
  const merged: Record<string, unknown> = { ...row.content };
  for (const [key, value] of Object.entries(fields)) {
    if (value === undefined) continue;
    if (value === null) delete merged[key];
    else merged[key] = value;
  }
  if (fields.markupPct != null) delete merged.targetMarginPct;
  if (fields.targetMarginPct != null) delete merged.markupPct;
  let nextLines: OptionLineInput[] = lines ?? row.lines.map(toInputLine);
  if (reprice) {
    nextLines = nextLines.map((l) =>
      l.priceSource === 'price-list' && l.model ? { ...l, unitPriceCents: undefined, distributor: undefined, effectiveFrom: undefined } : l,
    );
  }
  return { ...merged, lines: nextLines };
}

/** The 409 for a save from a stale revision, carrying the option as it now stands (as a record's conflict does). */
async function staleOption(ctx: AppContext, id: number): Promise<AppError> {
  const current = await getOption(ctx, id);
  return conflict(
    `This option was changed by someone else (now revision ${current.revision}): review their version and choose which to keep.`,
    {
      revision: current.revision,
      currentRevision: current.revision,
      current,
    },
  );
}

/** PATCH /api/options/:id: a stale revision is a 409 with the current option; lines keep their snapshot unless re-priced or replaced. */
export async function patchOption(ctx: AppContext, id: number, patch: OptionPatch): Promise<OptionView> {
  const row = await requireOption(ctx, id);
  if (row.revision !== patch.revision) throw await staleOption(ctx, id);
  const parsed = OptionInputSchema.safeParse(mergeInput(row, patch));
  if (!parsed.success) throw validationError(parsed.error);
  const job = await requireJob(ctx, row.jobId);
  const { content, lines } = await pricedContent(ctx, job.state, parsed.data);
  const saved = await withWriteLock(ctx, async (manager) => {
    const repo = manager.getRepository(JobOptionRow);
    const current = await repo.findOneBy({ id });
    if (!current) throw notFound('Option');
    // Someone saved in between: leave the lock first, then describe their version (a read outside this transaction).
    if (current.revision !== patch.revision) return false;
    await repo.update({ id }, { name: content.name, content, lines, revision: current.revision + 1, updatedAt: nowIso() });
    return true;
  });
  if (!saved) throw await staleOption(ctx, id);
  return getOption(ctx, id);
}

/** DELETE /api/options/:id. */
export async function deleteOption(ctx: AppContext, id: number): Promise<void> {
  await requireOption(ctx, id);
  await withWriteLock(ctx, (manager) => manager.getRepository(JobOptionRow).delete({ id }));
}

/** POST /api/options/:id/choose: the customer's choice, one per job (choosing another moves it). */
export async function chooseOption(ctx: AppContext, id: number) {
  const row = await requireOption(ctx, id);
  await withWriteLock(ctx, async (manager) => {
    const repo = manager.getRepository(JobOptionRow);
    await repo.update({ jobId: row.jobId }, { chosenAt: null });
    await repo.update({ id }, { chosenAt: nowIso() });
  });
  return { chosenOptionId: id, option: await getOption(ctx, id) };
}

/** POST /api/options/:id/make-record: the chosen option as a draft matched-system record (the systems create path). */
export async function makeRecord(ctx: AppContext, id: number, userId: number) {
  const row = await requireOption(ctx, id);
  if (row.chosenAt === null)
    throw new AppError('option-not-chosen', "Record the customer's choice first: only the chosen option becomes the system record.", 409);
  const job = await requireJob(ctx, row.jobId);
  const body = parseSystemCreate({ ...optionCheckRequest(row.content, job.state), label: row.name });
  return createSystem(ctx, row.jobId, body, userId);
}
