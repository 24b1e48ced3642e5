import { onlineManager, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { ApiError } from '@/hooks/api-client';
import { dropQueued, hasWaiting, keepMineQueued, queueSave, useRecordOutbox } from '@/hooks/record-outbox';
import { systemKeys, useSaveSystem, type SystemRecord } from '@/hooks/use-systems';
import type { SystemPatch } from '@/shared/schemas/systems';
import { conflictRows, rebase, type ConflictRow } from './record-conflict';

export interface Conflict {
  patch: SystemPatch;
  theirs: SystemRecord;
  rows: ConflictRow[];
}

/**
 * Saves an edit of the record from the revision it was made on: a draft is patched, a final record
 * gets a new revision. A 409 for a stale revision keeps both versions for the tech to choose from.
 * With no signal (or with changes of this record already waiting) the edit is kept on the phone
 * (hooks/record-outbox.ts) and sent when the signal returns; a 409 then is the same choice.
 */
export function useRecordSave(record: SystemRecord | undefined) {
  const mutation = useSaveSystem(record?.id ?? 0);
  const client = useQueryClient();
  const reload = () => client.invalidateQueries({ queryKey: systemKeys.all });
  const [conflict, setConflict] = useState<Conflict | null>(null);
  const outbox = useRecordOutbox();
  const queuedConflict = outbox.items.find((i) => i.kind === 'save' && i.systemId === record?.id && i.problem?.kind === 'conflict');

  const keep = (patch: SystemPatch, final: boolean) => {
    if (!record) return;
    const { revision, ...change } = patch;
    queueSave({ systemId: record.id, baseRevision: revision, asNewRevision: final, change });
  };

  const send = (patch: SystemPatch, final: boolean) => {
    if (record && (!onlineManager.isOnline() || hasWaiting(record.id))) {
      keep(patch, final);
      return Promise.resolve(undefined);
    }
    return mutation.mutateAsync({ patch, asNewRevision: final }).catch((err: unknown) => {
      if (err instanceof ApiError && err.kind === 'network') {
        keep(patch, final);
        return undefined;
      }
      const current = err instanceof ApiError && err.kind === 'conflict' ? (err.details as { current?: SystemRecord } | undefined)?.current : undefined;
      if (current) {
        setConflict({ patch, theirs: current, rows: conflictRows(patch, current) });
        void reload();
        return undefined;
      }
      throw err;
    });
  };

  /** Saves part of the record; resolves to the saved record, or undefined when kept for later or a conflict is waiting. */
  const save = (change: Omit<SystemPatch, 'revision'>) => {
    if (!record) return Promise.resolve(undefined);
    return send({ ...change, revision: record.latestRevision }, record.status === 'final');
  };

  // A waiting change that met a newer revision when the signal returned: the same dialog, the same choice.
  const shown: Conflict | null =
    conflict ??
    (queuedConflict && queuedConflict.kind === 'save' && queuedConflict.problem?.kind === 'conflict'
      ? (() => {
          const patch = { ...queuedConflict.change, revision: queuedConflict.baseRevision };
          const theirs = queuedConflict.problem.theirs;
          return { patch, theirs, rows: conflictRows(patch, theirs) };
        })()
      : null);

  /** "Keep mine": the same change on top of the server's revision. */
  const keepMine = () => {
    if (!conflict && queuedConflict) {
      keepMineQueued(queuedConflict.id);
      return;
    }
    if (!conflict) return;
    const { patch, theirs } = conflict;
    setConflict(null);
    void send(rebase(patch, theirs), theirs.status === 'final').catch(() => undefined);
  };
  /** "Take theirs": drop the change; the screen reloads the server's revision. */
  const takeTheirs = () => {
    if (!conflict && queuedConflict) {
      dropQueued(queuedConflict.id);
      return;
    }
    setConflict(null);
    void reload();
  };

  // A lost signal is not an error here: the change was kept and shows as waiting.
  const error = mutation.error instanceof ApiError && mutation.error.kind === 'network' ? null : mutation.error;
  return { save, conflict: shown, keepMine, takeTheirs, pending: mutation.isPending, error };
}
