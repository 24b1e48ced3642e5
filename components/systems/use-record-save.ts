import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { ApiError } from '@/hooks/api-client';
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
 */
export function useRecordSave(record: SystemRecord | undefined) {
  const mutation = useSaveSystem(record?.id ?? 0);
  const client = useQueryClient();
  const reload = () => client.invalidateQueries({ queryKey: systemKeys.all });
  const [conflict, setConflict] = useState<Conflict | null>(null);

  const send = (patch: SystemPatch, final: boolean) =>
    mutation.mutateAsync({ patch, asNewRevision: final }).catch((err: unknown) => {
      const current = err instanceof ApiError && err.kind === 'conflict' ? (err.details as { current?: SystemRecord } | undefined)?.current : undefined;
      if (current) {
        setConflict({ patch, theirs: current, rows: conflictRows(patch, current) });
        void reload();
        return undefined;
      }
      throw err;
    });

  /** Saves part of the record; resolves to the saved record, or undefined when a conflict is waiting. */
  const save = (change: Omit<SystemPatch, 'revision'>) => {
    if (!record) return Promise.resolve(undefined);
    return send({ ...change, revision: record.latestRevision }, record.status === 'final');
  };
  /** "Keep mine": the same change on top of the server's revision. */
  const keepMine = () => {
    if (!conflict) return;
    const { patch, theirs } = conflict;
    setConflict(null);
    void send(rebase(patch, theirs), theirs.status === 'final').catch(() => undefined);
  };
  /** "Take theirs": drop the change; the screen reloads the server's revision. */
  const takeTheirs = () => {
    setConflict(null);
    void reload();
  };

  return { save, conflict, keepMine, takeTheirs, pending: mutation.isPending, error: mutation.error };
}
