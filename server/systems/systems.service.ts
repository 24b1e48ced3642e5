import type { EntityManager } from 'typeorm';
import type { QueryDeepPartialEntity } from 'typeorm/query-builder/QueryPartialEntity';
import type { SystemCreate, SystemFinalize, SystemPatch } from '../../shared/schemas/systems';
import { AttachmentRow } from '../attachments/attachment.entity';
import type { AppContext } from '../context';
import { withWriteLock } from '../db/write-transaction';
import { requireJob } from '../jobs/jobs.service';
import { AppError, notFound } from '../lib/errors';
import { userNames } from '../lib/user-names';
import { loadRuleContext } from '../settings/settings.service';
import { CommissioningReadingRow } from './commissioning-reading.entity';
import { compareWithToday } from './current-check';
import { mergeContent } from './system-content';
import { SystemRecordRow } from './system-record.entity';
import { SystemRevisionRow } from './system-revision.entity';
import { takeSnapshot, type Snapshot } from './system-snapshot';
import type { RecordContent } from './system-types';
import { parseSystemCreate } from './system-validation';
import { checklistOf, systemView, type SystemView } from './system-view';

/*
 * Revisions: every save is a new revision (n+1) that keeps the one before, so no save is ever lost.
 * A save names the revision it started from; another save in between makes it stale (409 with the
 * current revision and record in the details). PATCH edits a draft; a final record refuses PATCH (409)
 * and takes a change only as POST /api/systems/:id/revisions, which starts draft revision n+1.
 */

const nowIso = () => new Date().toISOString();

/**
 * POST /api/jobs/:id/systems: checks the parts as they stand and saves draft revision 1.
 * Everything slow (the job lookup, the check with prices, the names and settings the answer shows)
 * happens before the write lock; under it only the two inserts run, so concurrent saves queue on
 * milliseconds. The answer is built from what was inserted: a new record has no readings or photos.
 */
export async function createSystem(ctx: AppContext, jobId: number, body: SystemCreate, userId: number): Promise<SystemView> {
  const [, snapshot, names, options] = await Promise.all([
    requireJob(ctx, jobId),
    takeSnapshot(ctx, body),
    userNames(ctx.dataSource.manager, [userId]),
    checklistOptions(ctx),
  ]);
  const { record, revision } = await withWriteLock(ctx, async (manager) => {
    const at = nowIso();
    const records = manager.getRepository(SystemRecordRow);
    const row = records.create({ jobId, status: 'draft', revision: 1, createdBy: userId, createdAt: at, updatedAt: at });
    await records.insert(row); // sets row.id
    return { record: row, revision: await insertRevision(manager, row.id, 1, body, snapshot, userId, at) };
  });
  return systemView(record, revision, { readings: [], attachments: [], revisions: [revision], names, checklistOptions: options });
}

/** PATCH /api/systems/:id: a new draft revision from the one the edit started from. */
export async function patchSystem(ctx: AppContext, id: number, patch: SystemPatch, userId: number): Promise<SystemView> {
  return saveRevision(ctx, id, patch, userId, 'patch');
}

/** POST /api/systems/:id/revisions: a change to a record (final or draft) as draft revision n+1. */
export async function reviseSystem(ctx: AppContext, id: number, patch: SystemPatch, userId: number): Promise<SystemView> {
  return saveRevision(ctx, id, patch, userId, 'revise');
}

async function saveRevision(ctx: AppContext, id: number, patch: SystemPatch, userId: number, how: 'patch' | 'revise'): Promise<SystemView> {
  // Refuse early (no check run) when the edit can not land; the same test runs again under the lock.
  const { record, revision } = await loadCurrent(ctx.dataSource.manager, id);
  await assertEditable(ctx, record, patch.revision, how);
  const content = parseSystemCreate(mergeContent(revision.content, patch));
  const snapshot = await takeSnapshot(ctx, content, revision.parts.installDate);
  await withWriteLock(ctx, async (manager) => {
    const current = await loadCurrent(manager, id);
    await assertEditable(ctx, current.record, patch.revision, how);
    const at = nowIso();
    const next = current.record.revision + 1;
    await insertRevision(manager, id, next, content, snapshot, userId, at);
    await manager.getRepository(SystemRecordRow).update({ id }, { revision: next, status: 'draft', updatedAt: at });
  });
  return loadView(ctx, id);
}

/** POST /api/systems/:id/finalize: the current revision becomes final (who, when); open items need a reason. */
export async function finalizeSystem(ctx: AppContext, id: number, body: SystemFinalize, userId: number): Promise<SystemView> {
  await withWriteLock(ctx, async (manager) => {
    const { record, revision } = await loadCurrent(manager, id);
    await assertEditable(ctx, record, body.revision, 'patch');
    const open = checklistOf(revision, await checklistOptions(ctx)).filter((row) => row.state === 'open');
    if (open.length > 0 && !body.openItemsReason) {
      throw new AppError('open-checklist-items', 'Checklist items are still open: give a reason to finalize with them open.', 422, {
        openItems: open.map((row) => ({ id: row.id, title: row.title })),
      });
    }
    const at = nowIso();
    await manager
      .getRepository(SystemRevisionRow)
      .update(
        { id: revision.id },
        { status: 'final', finalizedBy: userId, finalizedAt: at, openItemsReason: open.length > 0 ? body.openItemsReason : null },
      );
    await manager.getRepository(SystemRecordRow).update({ id }, { status: 'final', updatedAt: at });
  });
  return loadView(ctx, id);
}

/** GET /api/systems/:id: the latest revision, with today's check beside the stored one. */
export async function getSystem(ctx: AppContext, id: number) {
  const view = await loadView(ctx, id);
  const { revision } = await loadCurrent(ctx.dataSource.manager, id);
  return { ...view, currentCheck: await compareWithToday(ctx, revision.content, revision.parts.installDate, revision.check) };
}

/** GET /api/systems/:id/revisions/:n: any saved revision as it was. */
export async function getRevision(ctx: AppContext, id: number, n: number): Promise<SystemView> {
  return loadView(ctx, id, n);
}

/** GET /api/jobs/:id/systems: the records of a job, each as its latest revision in brief. */
export async function listSystems(ctx: AppContext, jobId: number) {
  await requireJob(ctx, jobId);
  const records = await ctx.dataSource.getRepository(SystemRecordRow).find({ where: { jobId }, order: { id: 'ASC' } });
  const revisions = ctx.dataSource.getRepository(SystemRevisionRow);
  return Promise.all(
    records.map(async (record) => {
      const rev = await revisions.findOneByOrFail({ systemId: record.id, revision: record.revision });
      const o = rev.parts.outdoor.spec;
      return {
        id: record.id,
        status: record.status,
        revision: record.revision,
        label: rev.content.label ?? null,
        verdict: rev.verdict,
        outdoorModel: o.model ?? null,
        indoorModel: rev.parts.indoorCoil?.spec.model ?? null,
        airHandlerModel: rev.parts.airHandler?.spec.model ?? null,
        updatedAt: record.updatedAt,
      };
    }),
  );
}

/** The record and its latest revision; 404 when there is no such record. */
export async function loadCurrent(manager: EntityManager, id: number): Promise<{ record: SystemRecordRow; revision: SystemRevisionRow }> {
  const record = await manager.getRepository(SystemRecordRow).findOneBy({ id });
  if (!record) throw notFound('System record');
  const revision = await manager.getRepository(SystemRevisionRow).findOneByOrFail({ systemId: id, revision: record.revision });
  return { record, revision };
}

/** A record and one revision (the latest unless `n`), assembled into the API's view. */
export async function loadView(ctx: AppContext, id: number, n?: number): Promise<SystemView> {
  const manager = ctx.dataSource.manager;
  const record = await manager.getRepository(SystemRecordRow).findOneBy({ id });
  if (!record) throw notFound('System record');
  const [revisions, readings, attachments] = await Promise.all([
    manager.getRepository(SystemRevisionRow).find({ where: { systemId: id }, order: { revision: 'ASC' } }),
    manager.getRepository(CommissioningReadingRow).find({ where: { systemId: id }, order: { takenAt: 'ASC', id: 'ASC' } }),
    manager.getRepository(AttachmentRow).find({ where: { systemId: id }, order: { id: 'ASC' } }),
  ]);
  const rev = revisions.find((r) => r.revision === (n ?? record.revision));
  if (!rev) throw notFound('Revision');
  const names = await userNames(manager, [
    record.createdBy,
    ...revisions.flatMap((r) => [r.savedBy, r.finalizedBy]),
    ...readings.map((r) => r.takenBy),
  ]);
  return systemView(record, rev, { readings, attachments, revisions, names, checklistOptions: await checklistOptions(ctx) });
}

/** The shop's evacuation target for the checklist's wording. */
async function checklistOptions(ctx: AppContext) {
  return { evacuationTargetMicrons: (await loadRuleContext(ctx)).settings.evacuationTargetMicrons };
}

/** 409 unless the save started from the latest revision, and (for PATCH) the record is a draft. */
export async function assertEditable(ctx: AppContext, record: SystemRecordRow, startedFrom: number, how: 'patch' | 'revise') {
  if (how === 'patch' && record.status === 'final') {
    throw new AppError('record-final', 'This record is final: save the change as a new revision.', 409, {
      currentRevision: record.revision,
      status: record.status,
    });
  }
  if (startedFrom !== record.revision) {
    throw new AppError(
      'stale-revision',
      `This record was saved by someone else since revision ${startedFrom}: review revision ${record.revision} and save again.`,
      409,
      {
        currentRevision: record.revision,
        current: await loadView(ctx, record.id),
      },
    );
  }
}

async function insertRevision(
  manager: EntityManager,
  systemId: number,
  revision: number,
  content: RecordContent,
  snapshot: Snapshot,
  userId: number,
  at: string,
) {
  const repo = manager.getRepository(SystemRevisionRow);
  // insert, not save: save() would first look the row up and wrap itself in a savepoint.
  const row = repo.create({
    systemId,
    revision,
    status: 'draft',
    content,
    check: snapshot.check,
    rulesVersion: snapshot.check.rulesVersion,
    verdict: snapshot.check.verdict,
    parts: snapshot.parts,
    ratedCombination: snapshot.ratedCombination,
    prices: snapshot.prices,
    savedBy: userId,
    savedAt: at,
    finalizedBy: null,
    finalizedAt: null,
    openItemsReason: null,
  });
  // The entity's JSON columns are plain objects; TypeORM's insert typing can not see that through Record<string, unknown>.
  await repo.insert(row as QueryDeepPartialEntity<SystemRevisionRow>);
  return row;
}
