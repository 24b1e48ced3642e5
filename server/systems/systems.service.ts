import type { EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';
import type { SystemCreate, SystemFinalize, SystemPatch } from '../../shared/schemas/systems';
import { AttachmentRow } from '../attachments/attachment.entity';
import type { AppContext } from '../context';
import { dialectOf } from '../db/dialect';
import { hydrateRow, type RowQuery } from '../db/row-query';
import { holdsWriteLock } from '../db/write-transaction';
import { assertJobExists, requireJob } from '../jobs/jobs.service';
import { AppError, notFound } from '../lib/errors';
import { userNames } from '../lib/user-names';
import { loadRuleContext } from '../settings/settings.service';
import { CommissioningReadingRow } from './commissioning-reading.entity';
import { compareWithToday } from './current-check';
import { withBatchedWrite } from './record-write-batch';
import type { SavedRevision, StoredJson } from './saved-revision';
import { mergeContent } from './system-content';
import { SystemRecordRow } from './system-record.entity';
import { SystemRevisionRow } from './system-revision.entity';
import { takeSnapshot, type Snapshot } from './system-snapshot';
import type { RecordContent } from './system-types';
import { parseEditedContent } from './system-validation';
import { checklistOf, revisionView, systemView, type RevisionBrief, type SystemView } from './system-view';
import { rememberWritten, writtenBase, type EditBase } from './written-revisions';

/*
 * Revisions: every save is a new revision (n+1) that keeps the one before, so no save is ever lost.
 * A save names the revision it started from; another save in between makes it stale (409 with the
 * current revision and record in the details). PATCH edits a draft; a final record refuses PATCH (409)
 * and takes a change only as POST /api/systems/:id/revisions, which starts draft revision n+1.
 */

const nowIso = () => new Date().toISOString();

/** Who saves: a user id, or the signed-in user as the auth middleware read it (then no name lookup). */
export type Author = number | { id: number; name: string };

const authorId = (author: Author) => (typeof author === 'number' ? author : author.id);

/** Names of the given users, with the author's name known already when the route passed it. */
async function namesWith(ctx: AppContext, author: Author, ids: (number | null)[] = []): Promise<Map<number, string>> {
  if (typeof author === 'number') return userNames(ctx.dataSource.manager, [author, ...ids]);
  const others = ids.filter((id) => id !== null && id !== author.id);
  const names = others.length > 0 ? await userNames(ctx.dataSource.manager, others) : new Map<number, string>();
  return names.set(author.id, author.name);
}

/**
 * POST /api/jobs/:id/systems: checks the parts as they stand and saves draft revision 1.
 * Everything slow (the job lookup, the check with prices, the names and settings the answer shows,
 * the JSON of the stored columns) happens before the write lock; under it only the two inserts run,
 * in a commit shared with the saves that arrive with it (record-write-batch.ts). The answer is built
 * from what was inserted: a new record has no readings or photos.
 */
export async function createSystem(ctx: AppContext, jobId: number, body: SystemCreate, author: Author): Promise<SystemView> {
  const userId = authorId(author);
  const [, snapshot, names, options] = await Promise.all([
    assertJobExists(ctx, jobId),
    takeSnapshot(ctx, body),
    namesWith(ctx, author),
    checklistOptions(ctx),
  ]);
  const draft = revisionDraft(body, snapshot, userId);
  const committed = !holdsWriteLock(ctx.dataSource); // else the caller's transaction may still roll back
  const { record, revision } = await withBatchedWrite(ctx, async (manager) => {
    const at = nowIso();
    const row = Object.assign(new SystemRecordRow(), {
      jobId,
      status: 'draft' as const,
      revision: 1,
      createdBy: userId,
      createdAt: at,
      updatedAt: at,
    });
    row.id = await dialectOf(manager).insertRowReturningId(
      manager,
      SystemRecordRow,
      [...RECORD_COLUMNS],
      RECORD_COLUMNS.map((c) => row[c]),
    );
    return { record: row, revision: await insertRevision(manager, draft, row.id, 1, at) };
  });
  if (committed) rememberWritten(ctx.dataSource, record, 1, { content: body, installDate: snapshot.parts.installDate });
  return systemView(record, revision, { readings: [], attachments: [], revisions: [revision], names, checklistOptions: options });
}

/** PATCH /api/systems/:id: a new draft revision from the one the edit started from. */
export async function patchSystem(ctx: AppContext, id: number, patch: SystemPatch, author: Author): Promise<SavedRevision> {
  return saveRevision(ctx, id, patch, author, 'patch');
}

/** POST /api/systems/:id/revisions: a change to a record (final or draft) as draft revision n+1. */
export async function reviseSystem(ctx: AppContext, id: number, patch: SystemPatch, author: Author): Promise<SavedRevision> {
  return saveRevision(ctx, id, patch, author, 'revise');
}

/**
 * Reads the record and, of its latest revision, only the content and parts (the check, prices and the
 * lists are not read), and refuses early (no check run) when the edit can not land; then the check,
 * prices and names run before the lock. Under the lock only the record row is read again: still at the
 * revision the edit started from, that revision (and so the content merged) is current, and the two
 * writes follow. The answer is the revision written (system-view.ts `revisionView`), with the JSON
 * text just stored.
 */
async function saveRevision(
  ctx: AppContext,
  id: number,
  patch: SystemPatch,
  author: Author,
  how: 'patch' | 'revise',
): Promise<SavedRevision> {
  const userId = authorId(author);
  const before = await loadEditBase(ctx, id);
  await assertEditable(ctx, before.record, patch.revision, how);
  const content = parseEditedContent(mergeContent(before.base.content, patch));
  const [snapshot, names, options] = await Promise.all([
    takeSnapshot(ctx, content, before.base.installDate),
    namesWith(ctx, author, [before.record.createdBy]),
    checklistOptions(ctx),
  ]);
  const draft = revisionDraft(content, snapshot, userId);
  const committed = !holdsWriteLock(ctx.dataSource); // else the caller's transaction may still roll back
  const { record, revision } = await withBatchedWrite(ctx, async (manager) => {
    const record = await recordById(manager, id);
    await assertEditable(ctx, record, patch.revision, how);
    const at = nowIso();
    const next = record.revision + 1;
    const revision = await insertRevision(manager, draft, id, next, at);
    await dialectOf(manager).updateRowsById(manager, SystemRecordRow, ['revision', 'status', 'updatedAt'], [[id, next, 'draft', at]]);
    return { record: { ...record, revision: next, status: 'draft' as const, updatedAt: at }, revision };
  });
  if (committed) rememberWritten(ctx.dataSource, record, revision.revision, { content, installDate: snapshot.parts.installDate });
  return { view: revisionView(record, revision, names, options), stored: draft.json };
}

/** POST /api/systems/:id/finalize: the current revision becomes final (who, when); open items need a reason. */
export async function finalizeSystem(ctx: AppContext, id: number, body: SystemFinalize, userId: number): Promise<SystemView> {
  const options = await checklistOptions(ctx);
  await withBatchedWrite(ctx, async (manager) => {
    const { record, revision } = await loadCurrent(manager, id);
    await assertEditable(ctx, record, body.revision, 'patch');
    const open = checklistOf(revision, options).filter((row) => row.state === 'open');
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
  const manager = ctx.dataSource.manager;
  const rows = await loadViewRows(manager, id);
  const { content, parts, check } = rows.current;
  const [names, options, currentCheck] = await Promise.all([
    userNames(manager, namedIn(rows)),
    checklistOptions(ctx),
    compareWithToday(ctx, content, parts.installDate, check),
  ]);
  return { ...systemView(rows.record, rows.current, { ...rows, names, checklistOptions: options }), currentCheck };
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

/** The columns of a revision the list of revisions shows (its JSON columns are not read). */
const BRIEF_COLUMNS: (keyof SystemRevisionRow)[] = [
  'id',
  'revision',
  'status',
  'verdict',
  'savedAt',
  'savedBy',
  'finalizedBy',
  'finalizedAt',
];

interface ViewRows {
  record: SystemRecordRow;
  /** Every revision in brief, oldest first. */
  revisions: RevisionBrief[];
  /** The one revision shown, whole. */
  current: SystemRevisionRow;
  readings: CommissioningReadingRow[];
  attachments: AttachmentRow[];
}

/** Rows of one table by one column's value, through the dialect's prepared read. */
async function rowsOf<T extends ObjectLiteral>(
  manager: EntityManager,
  entity: EntityTarget<T>,
  query: Omit<RowQuery<T>, 'columns'> & { columns?: RowQuery<T>['columns'] },
): Promise<T[]> {
  const columns = query.columns ?? (manager.connection.getMetadata(entity).columns.map((c) => c.propertyName) as RowQuery<T>['columns']);
  const raw = await dialectOf(manager).selectRows(manager, entity, { ...query, columns });
  return raw.map((row) => hydrateRow(manager, entity, row));
}

/**
 * What an edit starts from: the record row and its latest revision's content and install date, from
 * memory when this process wrote that revision (written-revisions.ts), else read (content and parts
 * only). The two reads run in one turn, so on SQLite they see one state; a save landing between them
 * elsewhere is caught by the check under the lock, which compares the record's revision again.
 */
async function loadEditBase(ctx: AppContext, id: number): Promise<{ record: SystemRecordRow; base: EditBase }> {
  const manager = ctx.dataSource.manager;
  const record = await recordById(manager, id);
  const known = writtenBase(ctx.dataSource, record, record.revision);
  if (known) return { record, base: known };
  const [records, [current]] = await Promise.all([
    rowsOf(manager, SystemRecordRow, { where: ['id', id] }),
    rowsOf(manager, SystemRevisionRow, {
      columns: ['content', 'parts'],
      where: ['systemId', id],
      orderBy: [['revision', 'DESC']],
      limit: 1,
    }),
  ]);
  if (!records[0] || !current) throw notFound('System record');
  return { record: records[0], base: { content: current.content, installDate: current.parts.installDate } };
}

/** The record row; 404 when there is no such record. */
async function recordById(manager: EntityManager, id: number): Promise<SystemRecordRow> {
  const [record] = await rowsOf(manager, SystemRecordRow, { where: ['id', id] });
  if (!record) throw notFound('System record');
  return record;
}

/**
 * What a record's view is built from: the record, its revisions in brief, one revision whole, readings
 * and photos. Prepared reads (the query builder would write the record's id into each statement).
 */
async function loadViewRows(manager: EntityManager, id: number, n?: number): Promise<ViewRows> {
  const record = await recordById(manager, id);
  const [revisions, [current], readings, attachments] = await Promise.all([
    rowsOf(manager, SystemRevisionRow, { columns: BRIEF_COLUMNS, where: ['systemId', id], orderBy: [['revision', 'ASC']] }),
    n === undefined
      ? rowsOf(manager, SystemRevisionRow, { where: ['systemId', id], orderBy: [['revision', 'DESC']], limit: 1 })
      : manager.getRepository(SystemRevisionRow).findBy({ systemId: id, revision: n }),
    rowsOf(manager, CommissioningReadingRow, {
      where: ['systemId', id],
      orderBy: [
        ['takenAt', 'ASC'],
        ['id', 'ASC'],
      ],
    }),
    rowsOf(manager, AttachmentRow, { where: ['systemId', id], orderBy: [['id', 'ASC']] }),
  ]);
  if (!current) throw notFound('Revision');
  return { record, revisions, current, readings, attachments };
}

/** Every user a view names: who created the record, saved and finalized revisions, took readings. */
const namedIn = (rows: ViewRows) => [
  rows.record.createdBy,
  ...rows.revisions.flatMap((r) => [r.savedBy, r.finalizedBy]),
  ...rows.readings.map((r) => r.takenBy),
];

/** A record and one revision (the latest unless `n`), assembled into the API's view. */
export async function loadView(ctx: AppContext, id: number, n?: number): Promise<SystemView> {
  const manager = ctx.dataSource.manager;
  const rows = await loadViewRows(manager, id, n);
  const [names, options] = await Promise.all([userNames(manager, namedIn(rows)), checklistOptions(ctx)]);
  return systemView(rows.record, rows.current, { ...rows, names, checklistOptions: options });
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

const RECORD_COLUMNS = [
  'jobId',
  'status',
  'revision',
  'createdBy',
  'createdAt',
  'updatedAt',
] as const satisfies readonly (keyof SystemRecordRow)[];

/** The columns of a new revision, with its JSON written out before the lock is taken. */
const REVISION_COLUMNS = [
  'systemId',
  'revision',
  'status',
  'content',
  'check',
  'rulesVersion',
  'verdict',
  'parts',
  'ratedCombination',
  'prices',
  'savedBy',
  'savedAt',
  'finalizedBy',
  'finalizedAt',
  'openItemsReason',
] as const satisfies readonly (keyof SystemRevisionRow)[];

interface RevisionDraft {
  content: RecordContent;
  snapshot: Snapshot;
  userId: number;
  /** The JSON columns as their simple-json text. */
  json: StoredJson;
}

function revisionDraft(content: RecordContent, snapshot: Snapshot, userId: number): RevisionDraft {
  return {
    content,
    snapshot,
    userId,
    json: { ...snapshot.json, content: JSON.stringify(content), prices: JSON.stringify(snapshot.prices) },
  };
}

/**
 * Inserts revision `revision` through the dialect's prepared insert (the query builder would inline
 * the ids into the SQL, preparing a new statement per save and pushing others out of its cache).
 * Returns the row as the view reads it (its own id is not needed there).
 */
async function insertRevision(
  manager: EntityManager,
  draft: RevisionDraft,
  systemId: number,
  revision: number,
  at: string,
): Promise<SystemRevisionRow> {
  const { content, snapshot, userId, json } = draft;
  const { rulesVersion, verdict } = snapshot.check;
  await dialectOf(manager).insertRows(
    manager,
    SystemRevisionRow,
    [...REVISION_COLUMNS],
    [
      [
        systemId,
        revision,
        'draft',
        json.content,
        json.check,
        rulesVersion,
        verdict,
        json.parts,
        json.ratedCombination,
        json.prices,
        userId,
        at,
        null,
        null,
        null,
      ],
    ],
  );
  return Object.assign(new SystemRevisionRow(), {
    systemId,
    revision,
    status: 'draft' as const,
    content,
    check: snapshot.check,
    rulesVersion,
    verdict,
    parts: snapshot.parts,
    ratedCombination: snapshot.ratedCombination,
    prices: snapshot.prices,
    savedBy: userId,
    savedAt: at,
    finalizedBy: null,
    finalizedAt: null,
    openItemsReason: null,
  });
}
