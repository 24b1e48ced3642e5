import { onlineManager, type QueryClient } from '@tanstack/react-query';
import { useEffect, useSyncExternalStore } from 'react';
import type { ReadingCreate, SystemCreate } from '@/shared/schemas/systems';
import { api, ApiError } from './api-client';
import { jobKeys } from './use-jobs';
import { systemKeys, type SavedRecord, type SystemRecord } from './use-systems';
import {
  dropItem,
  enqueueCreate,
  enqueueReading,
  enqueueSave,
  keepMine,
  nextToSend,
  replay,
  type OutboxItem,
  type SaveChange,
  type SendOutcome,
} from './record-outbox-queue';

/**
 * The record outbox kept on the device (localStorage on the web): saves, readings and new records
 * made with no signal, sent in order when it returns (hooks/record-outbox-queue.ts has the rules).
 */

export type RecordOutboxItem = OutboxItem<SystemRecord>;

const STORAGE_KEY = 'tandem-record-outbox';
/** How long a freshly opened app waits before sending what waits (its connection state settles first). */
const BOOT_SETTLE_MS = 1500;
// Who queued what waits: it is sent only while that person is signed in, never with another's token.
const OWNER_KEY = 'tandem-record-outbox-owner';
let signedInUserId: number | undefined;

function queueOwner(): number | undefined {
  const raw = storage()?.getItem(OWNER_KEY);
  return raw ? Number(raw) : undefined;
}

/** Called while the signed-in layout renders: whose changes may be sent now. */
export function selectOutboxOwner(userId: number): void {
  signedInUserId = userId;
}

function storage(): Storage | undefined {
  try {
    return typeof window !== 'undefined' ? window.localStorage : undefined;
  } catch {
    return undefined;
  }
}

function readKept(): RecordOutboxItem[] {
  try {
    const raw = storage()?.getItem(STORAGE_KEY);
    const parsed: unknown = raw ? JSON.parse(raw) : [];
    return Array.isArray(parsed) ? (parsed as RecordOutboxItem[]) : [];
  } catch {
    return [];
  }
}

let items: RecordOutboxItem[] | null = null;
let sendingId: string | undefined;
let flushing: Promise<void> | null = null;
let client: QueryClient | null = null;
const listeners = new Set<() => void>();

const current = () => (items ??= readKept());

function store(next: RecordOutboxItem[]) {
  items = next;
  try {
    storage()?.setItem(STORAGE_KEY, JSON.stringify(next));
    if (next.length === 0) storage()?.removeItem(OWNER_KEY);
    else if (queueOwner() === undefined && signedInUserId !== undefined) storage()?.setItem(OWNER_KEY, String(signedInUserId));
  } catch {
    // A full or refused storage keeps the queue in memory for this visit.
  }
  listeners.forEach((l) => l());
}

const meta = () => ({ id: `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 8)}`, at: new Date().toISOString() });

/** True when a record has changes waiting: a new save must queue behind them to keep their order. */
export const hasWaiting = (systemId: number) => current().some((i) => i.kind !== 'create' && i.systemId === systemId);

export function queueSave(save: { systemId: number; baseRevision: number; asNewRevision: boolean; change: SaveChange }) {
  store(enqueueSave(current(), save, meta(), sendingId));
  void flushOutbox();
}

export function queueReading(systemId: number, body: ReadingCreate) {
  store(enqueueReading(current(), systemId, body, meta()));
  void flushOutbox();
}

export function queueCreate(jobId: number, body: SystemCreate, title: string) {
  store(enqueueCreate(current(), jobId, body, title, meta()));
  void flushOutbox();
}

/** "Keep mine" on a conflict: re-based on the server's revision and sent again. */
export function keepMineQueued(id: string) {
  store(keepMine(current(), id));
  void flushOutbox();
}

/** "Take theirs" or "Discard": the waiting item is dropped and the screens reload the server's data. */
export function dropQueued(id: string) {
  store(dropItem(current(), id));
  void client?.invalidateQueries({ queryKey: systemKeys.all });
}

/** True for a failure that means "no signal (or no session) now, try again later". */
const retryLater = (err: unknown) => !(err instanceof ApiError) || err.kind === 'network' || err.kind === 'unauthorized' || err.kind === 'server';

async function send(item: RecordOutboxItem): Promise<SendOutcome<SystemRecord>> {
  try {
    if (item.kind === 'save') {
      const patch = { ...item.change, revision: item.baseRevision };
      const saved = item.asNewRevision
        ? await api.post<SavedRecord>(`/systems/${item.systemId}/revisions`, patch)
        : await api.patch<SavedRecord>(`/systems/${item.systemId}`, patch);
      return { ok: true, record: saved };
    }
    if (item.kind === 'reading') await api.post(`/systems/${item.systemId}/readings`, item.body);
    else await api.post(`/jobs/${item.jobId}/systems`, item.body);
    return { ok: true };
  } catch (err) {
    if (retryLater(err)) return { ok: false, retryLater: true };
    const e = err as ApiError;
    if (e.kind === 'conflict' && item.kind === 'save') {
      // A stale revision answers with the server's record; a record made final meanwhile does not, so fetch it.
      const theirs = (e.details as { current?: SystemRecord } | undefined)?.current;
      try {
        return { ok: false, conflict: theirs ?? (await api.get<SystemRecord>(`/systems/${item.systemId}`)) };
      } catch (again) {
        if (retryLater(again)) return { ok: false, retryLater: true };
      }
    }
    return { ok: false, refused: e.message };
  }
}

/** Sends what waits, once at a time; a no-op while offline or already sending. */
export function flushOutbox(): Promise<void> {
  if (flushing) return flushing;
  const browserOffline = typeof navigator !== 'undefined' && navigator.onLine === false;
  if (browserOffline || !onlineManager.isOnline() || current().length === 0) return Promise.resolve();
  const owner = queueOwner();
  if (owner !== undefined && owner !== signedInUserId) return Promise.resolve();
  flushing = replay(current, store, send, (id) => {
    sendingId = id;
    listeners.forEach((l) => l());
  })
    .catch(() => 'retry-later' as const)
    .then((result) => {
      flushing = null;
      void client?.invalidateQueries({ queryKey: systemKeys.all });
      void client?.invalidateQueries({ queryKey: jobKeys.all });
      // Something saved while the last item was on its way: send it too.
      if (result === 'done' && nextToSend(current())) void flushOutbox();
    });
  return flushing;
}

/** The waiting items (re-renders when they change) and the one on its way. */
export function useRecordOutbox(): { items: RecordOutboxItem[]; sendingId: string | undefined } {
  const list = useSyncExternalStore(
    (l) => {
      listeners.add(l);
      return () => listeners.delete(l);
    },
    current,
    current,
  );
  const sending = useSyncExternalStore(
    (l) => {
      listeners.add(l);
      return () => listeners.delete(l);
    },
    () => sendingId,
    () => undefined,
  );
  return { items: list, sendingId: sending };
}

/**
 * Mounted once inside the signed-in screens (a token is set): sends what waits now, and again each
 * time the signal returns.
 */
export function useOutboxSync(queryClient: QueryClient) {
  useEffect(() => {
    client = queryClient;
    // Not at once: a page that has just opened does not yet know whether it has a signal (a write sent in
    // that moment can land while its answer is lost). Once the connection state has settled, send.
    const settle = setTimeout(() => void flushOutbox(), BOOT_SETTLE_MS);
    const unsubscribe = onlineManager.subscribe((online) => {
      if (online) void flushOutbox();
    });
    return () => {
      clearTimeout(settle);
      unsubscribe();
    };
  }, [queryClient]);
}
