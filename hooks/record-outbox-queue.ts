import type { ChecklistRow } from '@/shared/checklist';
import type { ReadingCreate, SystemCreate, SystemPatch } from '@/shared/schemas/systems';

/**
 * The record outbox as plain data: what a tech saved with no signal, in the order it was saved, and
 * the rules for sending it when the signal returns. No React, no storage, no fetch (tests/app).
 *
 * - A save carries the revision the tech was looking at. Saves to one record made while it waits are
 *   folded into one (serials and checklist entries merged by key), so they replay as one revision from
 *   that starting point: a change made on the server meanwhile is a 409, shown as a conflict to
 *   resolve, never overwritten.
 * - After a save of ours lands, a later save of the same record that started from the same revision
 *   moves onto the new one: it was made on top of our own change, not someone else's.
 * - An item that met a conflict or a refusal holds back the later items of its record until the tech
 *   chooses; other records go on.
 */

export type SaveChange = Omit<SystemPatch, 'revision'>;

/** The server's record as a conflict shows it (GET /api/systems/:id). */
export interface TheirRecord {
  latestRevision: number;
  status: 'draft' | 'final';
  serials: Record<string, string | undefined>;
  checklist: ChecklistRow[];
}

export type OutboxProblem<R extends TheirRecord = TheirRecord> = { kind: 'conflict'; theirs: R } | { kind: 'refused'; message: string };

interface ItemBase<R extends TheirRecord> {
  id: string;
  queuedAt: string;
  problem?: OutboxProblem<R>;
}
export interface SaveItem<R extends TheirRecord = TheirRecord> extends ItemBase<R> {
  kind: 'save';
  systemId: number;
  baseRevision: number;
  /** A final record takes a change as a new revision (POST …/revisions), a draft as PATCH. */
  asNewRevision: boolean;
  change: SaveChange;
  /** How many saves were folded into this one (what the screen counts as changes). */
  edits: number;
}
export interface ReadingItem<R extends TheirRecord = TheirRecord> extends ItemBase<R> {
  kind: 'reading';
  systemId: number;
  body: ReadingCreate;
}
export interface CreateItem<R extends TheirRecord = TheirRecord> extends ItemBase<R> {
  kind: 'create';
  jobId: number;
  body: SystemCreate;
  /** A short description for the job's page ("3-ton heat pump with coil"). */
  title: string;
}
export type OutboxItem<R extends TheirRecord = TheirRecord> = SaveItem<R> | ReadingItem<R> | CreateItem<R>;

/** The record an item belongs to, or null for a record not created yet. */
export const systemOf = (item: OutboxItem): number | null => (item.kind === 'create' ? null : item.systemId);

/** Two changes to one record as one: later groups win, serials and checklist entries merge by key. */
export function mergeChange(first: SaveChange, later: SaveChange): SaveChange {
  const merged: SaveChange = { ...first, ...later };
  if (first.serials || later.serials) merged.serials = { ...first.serials, ...later.serials };
  if (first.checklist || later.checklist) merged.checklist = { ...first.checklist, ...later.checklist };
  return merged;
}

/**
 * Adds a save: folded into the record's waiting save when there is one that is not being sent
 * (`busyId`) and has no problem; else appended with the revision the tech started from.
 */
export function enqueueSave<R extends TheirRecord>(
  items: OutboxItem<R>[],
  save: { systemId: number; baseRevision: number; asNewRevision: boolean; change: SaveChange },
  meta: { id: string; at: string },
  busyId?: string,
): OutboxItem<R>[] {
  const index = items.findIndex((i) => i.kind === 'save' && i.systemId === save.systemId && !i.problem && i.id !== busyId);
  if (index >= 0) {
    const waiting = items[index] as SaveItem<R>;
    const next = [...items];
    next[index] = { ...waiting, change: mergeChange(waiting.change, save.change), edits: waiting.edits + 1 };
    return next;
  }
  return [...items, { kind: 'save', id: meta.id, queuedAt: meta.at, ...save, edits: 1 }];
}

export function enqueueReading<R extends TheirRecord>(items: OutboxItem<R>[], systemId: number, body: ReadingCreate, meta: { id: string; at: string }) {
  return [...items, { kind: 'reading' as const, id: meta.id, queuedAt: meta.at, systemId, body }];
}

export function enqueueCreate<R extends TheirRecord>(items: OutboxItem<R>[], jobId: number, body: SystemCreate, title: string, meta: { id: string; at: string }) {
  return [...items, { kind: 'create' as const, id: meta.id, queuedAt: meta.at, jobId, body, title }];
}

/** The changes waiting for a record: each folded save and each reading counts once. */
export function waitingCount(items: OutboxItem[], systemId: number): number {
  return items.reduce((n, i) => (systemOf(i) !== systemId ? n : n + (i.kind === 'save' ? i.edits : 1)), 0);
}

/** The first item that may be sent now: no problem of its own, and no earlier item of its record held back. */
export function nextToSend<R extends TheirRecord>(items: OutboxItem<R>[]): OutboxItem<R> | undefined {
  const held = new Set<number>();
  for (const item of items) {
    const system = systemOf(item);
    if (item.problem) {
      if (system !== null) held.add(system);
      continue;
    }
    if (system === null || !held.has(system)) return item;
  }
  return undefined;
}

/** What sending one item came to. `record` is the server's record after a save landed. */
export type SendOutcome<R extends TheirRecord = TheirRecord> =
  | { ok: true; record?: { latestRevision: number } }
  | { ok: false; retryLater: true }
  | { ok: false; conflict: R }
  | { ok: false; refused: string };

/** The queue after one item was sent with `outcome` (items may have been added while it was on its way). */
export function afterSend<R extends TheirRecord>(items: OutboxItem<R>[], sent: OutboxItem<R>, outcome: SendOutcome<R>): OutboxItem<R>[] {
  if (outcome.ok) {
    const rest = items.filter((i) => i.id !== sent.id);
    if (sent.kind !== 'save' || !outcome.record) return rest;
    const landed = outcome.record.latestRevision;
    // Saved on top of our own change, not someone else's: start from the revision ours made.
    return rest.map((i) =>
      i.kind === 'save' && i.systemId === sent.systemId && !i.problem && i.baseRevision === sent.baseRevision
        ? { ...i, baseRevision: landed, asNewRevision: false }
        : i,
    );
  }
  if ('retryLater' in outcome) return items;
  const problem: OutboxProblem<R> = 'conflict' in outcome ? { kind: 'conflict', theirs: outcome.conflict } : { kind: 'refused', message: outcome.refused };
  return items.map((i) => (i.id === sent.id ? { ...i, problem } : i));
}

/** "Keep mine": the waiting change re-based on the server's revision, ready to send again. */
export function keepMine<R extends TheirRecord>(items: OutboxItem<R>[], id: string): OutboxItem<R>[] {
  return items.map((i) => {
    if (i.id !== id || i.kind !== 'save' || i.problem?.kind !== 'conflict') return i;
    const { theirs } = i.problem;
    const { problem: _gone, ...rest } = i;
    return { ...rest, baseRevision: theirs.latestRevision, asNewRevision: theirs.status === 'final' };
  });
}

/** "Take theirs" or "Discard": the item leaves the queue. */
export function dropItem<R extends TheirRecord>(items: OutboxItem<R>[], id: string): OutboxItem<R>[] {
  return items.filter((i) => i.id !== id);
}

/**
 * Sends what may be sent, one item at a time in order, until the queue is empty, everything left is
 * held back, or the signal is gone again (`retryLater`). `load`/`store` read and write the kept queue.
 */
export async function replay<R extends TheirRecord>(
  load: () => OutboxItem<R>[],
  store: (items: OutboxItem<R>[]) => void,
  send: (item: OutboxItem<R>) => Promise<SendOutcome<R>>,
  onSending?: (id: string | undefined) => void,
): Promise<'done' | 'retry-later'> {
  for (;;) {
    const item = nextToSend(load());
    if (!item) return 'done';
    onSending?.(item.id);
    let outcome: SendOutcome<R>;
    try {
      outcome = await send(item);
    } finally {
      onSending?.(undefined);
    }
    store(afterSend(load(), item, outcome));
    if (!outcome.ok && 'retryLater' in outcome) return 'retry-later';
  }
}

/** The record as the tech left it on the phone: waiting serials and checklist entries shown over the server's. */
export function applyPending<T extends { id: number; serials: Record<string, string | undefined>; checklist: ChecklistRow[]; label?: string | null }>(
  record: T,
  items: OutboxItem[],
): T {
  const saves = items.filter((i): i is SaveItem => i.kind === 'save' && i.systemId === record.id);
  if (saves.length === 0) return record;
  const change = saves.reduce<SaveChange>((all, s) => mergeChange(all, s.change), {});
  const checklist = record.checklist.map((row) => {
    const entry = change.checklist?.[row.id];
    if (!entry) return row;
    const { note: _old, ...rest } = row;
    return { ...rest, state: entry.state, ...(entry.note ? { note: entry.note } : {}) };
  });
  return {
    ...record,
    serials: change.serials ? { ...record.serials, ...change.serials } : record.serials,
    checklist,
    ...(change.label !== undefined ? { label: change.label } : {}),
  };
}
