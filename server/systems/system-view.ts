import {
  applyChecklistStates,
  deriveChecklist,
  openChecklistItems,
  type ChecklistOptions,
  type ChecklistRow,
} from '../../shared/checklist/index';
import type { AttachmentRow } from '../attachments/attachment.entity';
import { who } from '../lib/user-names';
import type { CommissioningReadingRow } from './commissioning-reading.entity';
import type { SystemRecordRow } from './system-record.entity';
import type { SystemRevisionRow } from './system-revision.entity';

type Who = { id: number; name: string } | null;

/** The checklist of a revision: items from its facts, with the states the tech saved. */
export function checklistOf(rev: SystemRevisionRow, options: ChecklistOptions = {}): ChecklistRow[] {
  return applyChecklistStates(deriveChecklist(rev.parts, options), rev.content.checklist);
}

/** A reading as the API answers it. */
export function readingView(r: CommissioningReadingRow, names: Map<number, string>) {
  return {
    id: r.id,
    revision: r.revision,
    takenAt: r.takenAt,
    takenBy: who(r.takenBy, names),
    label: r.label,
    input: r.input,
    results: r.results,
  };
}
export type ReadingView = ReturnType<typeof readingView>;

/** An attachment's public facts (never its storage key). */
export function attachmentView(a: AttachmentRow) {
  return {
    id: a.id,
    jobId: a.jobId,
    systemId: a.systemId,
    kind: a.kind,
    fileName: a.fileName,
    contentType: a.contentType,
    sizeBytes: a.sizeBytes,
    sha256: a.sha256,
    createdAt: a.createdAt,
    url: `/api/attachments/${a.id}`,
  };
}
export type AttachmentView = ReturnType<typeof attachmentView>;

export interface RevisionSummary {
  revision: number;
  status: string;
  verdict: string;
  savedAt: string;
  savedBy: Who;
  finalizedAt: string | null;
}

/** The stored facts of a revision that the list of revisions shows. */
export type RevisionBrief = Pick<
  SystemRevisionRow,
  'revision' | 'status' | 'verdict' | 'savedAt' | 'savedBy' | 'finalizedBy' | 'finalizedAt'
>;

/**
 * One revision of a record without its lists (readings, photos, revisions): what a save answers
 * (PATCH /api/systems/:id, POST …/revisions). The app reloads the whole record after a save, and the
 * outbox reads only `latestRevision`, so a save reads and sends none of the lists.
 */
export function revisionView(
  record: SystemRecordRow,
  rev: SystemRevisionRow,
  names: Map<number, string>,
  checklistOptions: ChecklistOptions,
) {
  const { serials, checklist: _states, label, ...request } = rev.content;
  const checklist = checklistOf(rev, checklistOptions);
  return {
    id: record.id,
    jobId: record.jobId,
    status: rev.status,
    revision: rev.revision,
    latestRevision: record.revision,
    label: label ?? null,
    serials: serials ?? {},
    request,
    check: rev.check,
    rulesVersion: rev.rulesVersion,
    parts: rev.parts,
    ratedCombination: rev.ratedCombination,
    prices: rev.prices,
    checklist,
    openChecklistItems: openChecklistItems(checklist),
    openItemsReason: rev.openItemsReason,
    savedAt: rev.savedAt,
    savedBy: who(rev.savedBy, names),
    finalizedAt: rev.finalizedAt,
    finalizedBy: who(rev.finalizedBy, names),
    createdAt: record.createdAt,
    createdBy: who(record.createdBy, names),
  };
}
export type RevisionView = ReturnType<typeof revisionView>;

/** One revision of a record as the API answers it (GET /api/systems/:id and /revisions/:n). */
export function systemView(
  record: SystemRecordRow,
  rev: SystemRevisionRow,
  extra: {
    readings: CommissioningReadingRow[];
    attachments: AttachmentRow[];
    revisions: RevisionBrief[];
    names: Map<number, string>;
    checklistOptions: ChecklistOptions;
  },
) {
  return {
    ...revisionView(record, rev, extra.names, extra.checklistOptions),
    readings: extra.readings.filter((r) => r.revision <= rev.revision).map((r) => readingView(r, extra.names)),
    attachments: extra.attachments.map(attachmentView),
    revisions: extra.revisions.map((r): RevisionSummary => ({
      revision: r.revision,
      status: r.status,
      verdict: r.verdict,
      savedAt: r.savedAt,
      savedBy: who(r.savedBy, extra.names),
      finalizedAt: r.finalizedAt,
    })),
  };
}
export type SystemView = ReturnType<typeof systemView>;
