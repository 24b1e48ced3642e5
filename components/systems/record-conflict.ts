import type { SystemPatch } from '@/shared/schemas/systems';
import type { SystemRecord } from '@/hooks/use-systems';
import type { ConflictRow } from '@/components/ui/conflict-row';
import { whenText } from '@/components/jobs/job-words';
import { CHECKLIST_STATE_WORDS, SERIAL_SLOTS } from './record-words';

export type { ConflictRow };

const blank = (v: string | undefined) => (v && v.length ? v : '(empty)');

/**
 * What a rejected save would have changed against what the server now holds: serials and checklist
 * entries of the patch whose value differs from the newer revision. Empty when nothing really clashes.
 */
export function conflictRows(patch: SystemPatch, theirs: Pick<SystemRecord, 'serials' | 'checklist'>): ConflictRow[] {
  const rows: ConflictRow[] = [];
  for (const { slot, label } of SERIAL_SLOTS) {
    if (!patch.serials || !(slot in patch.serials)) continue;
    const mine = patch.serials[slot];
    const server = theirs.serials[slot];
    if ((mine ?? '') !== (server ?? '')) rows.push({ key: `serial-${slot}`, label: `${label} serial`, mine: blank(mine), theirs: blank(server) });
  }
  for (const [id, entry] of Object.entries(patch.checklist ?? {})) {
    const server = theirs.checklist.find((row) => row.id === id);
    if (!server) continue;
    const word = (state: keyof typeof CHECKLIST_STATE_WORDS, note?: string) => `${CHECKLIST_STATE_WORDS[state]}${note ? ` (${note})` : ''}`;
    const mine = word(entry.state, entry.note);
    const other = word(server.state, server.note);
    if (mine !== other) rows.push({ key: `checklist-${id}`, label: server.title, mine, theirs: other });
  }
  return rows;
}

/** The same edit re-based on the server's newer revision ("keep mine"). */
export function rebase(patch: SystemPatch, theirs: Pick<SystemRecord, 'latestRevision'>): SystemPatch {
  return { ...patch, revision: theirs.latestRevision };
}

/** Who saved the newer revision and when, for the conflict dialog. */
export function recordConflictIntro(theirs: Pick<SystemRecord, 'latestRevision' | 'savedAt' | 'savedBy'>): string {
  return `Revision ${theirs.latestRevision} was saved ${whenText(theirs.savedAt)}${theirs.savedBy ? ` by ${theirs.savedBy.name}` : ''} while you edited. Nothing is lost: choose which to keep.`;
}
