import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ChecklistRow } from '@/shared/checklist';
import type { CheckResult, Finding } from '@/shared/rules/types';
import type { CheckRequest } from '@/shared/schemas/check';
import type { CommissioningEvaluateInput, CommissioningEvaluateResult } from '@/shared/schemas/commissioning';
import type { ReadingCreate, SendReport, Serials, SystemCreate, SystemFinalize, SystemPatch, SystemStatus } from '@/shared/schemas/systems';
import { api, apiRequest, queryString } from './api-client';
import type { UploadFile } from './use-imports';
import { jobKeys } from './use-jobs';
import { STALE } from './stale-times';

type Who = { id: number; name: string } | null;

/** A verdict of an evacuation or nitrogen test; `passed` null when too little was recorded to judge. */
export interface TestOutcome {
  passed: boolean | null;
  message: string;
}

export interface SavedReading {
  id: number;
  revision: number;
  takenAt: string;
  takenBy: Who;
  label: string | null;
  input: Omit<ReadingCreate, 'takenAt' | 'label'> & { charge?: CommissioningEvaluateInput };
  results: { charge?: CommissioningEvaluateResult; evacuation?: TestOutcome; pressureTest?: TestOutcome };
}

export interface Attachment {
  id: number;
  jobId: number;
  systemId: number | null;
  kind: 'nameplate' | 'install';
  fileName: string;
  contentType: string;
  sizeBytes: number;
  createdAt: string;
  url: string;
}

export interface RevisionSummary {
  revision: number;
  status: SystemStatus;
  verdict: string;
  savedAt: string;
  savedBy: Who;
  finalizedAt: string | null;
}

type FindingKey = Pick<Finding, 'ruleId' | 'severity' | 'title'>;

/** A matched-system record as GET /api/systems/:id answers it (one revision). */
export interface SystemRecord {
  id: number;
  jobId: number;
  status: SystemStatus;
  revision: number;
  latestRevision: number;
  label: string | null;
  serials: Serials;
  request: Omit<CheckRequest, never>;
  check: CheckResult;
  rulesVersion: string;
  /** The parts as resolved at save time (catalog specs as they stood, or typed from a nameplate). */
  parts: Partial<Record<'outdoor' | 'indoorCoil' | 'airHandler' | 'metering', { spec: { model?: string; brand?: string }; kept: boolean; id?: number }>> & { installDate?: string };
  checklist: ChecklistRow[];
  openChecklistItems: string[];
  openItemsReason: string | null;
  savedAt: string;
  savedBy: Who;
  finalizedAt: string | null;
  finalizedBy: Who;
  readings: SavedReading[];
  attachments: Attachment[];
  revisions: RevisionSummary[];
  createdAt: string;
  /** Only on the latest revision: today's answer beside the stored one. */
  currentCheck?: { available: boolean; differs: boolean; verdict?: string; added: FindingKey[]; removed: FindingKey[]; message: string };
}

/**
 * What a save answers (PATCH /api/systems/:id, POST …/revisions): the revision written, without the lists.
 * The app refetches the whole record after a save; the outbox reads `latestRevision`.
 */
export type SavedRecord = Omit<SystemRecord, 'readings' | 'attachments' | 'revisions' | 'currentCheck'>;

/** A record as a job's list shows it (GET /api/jobs/:id/systems). */
export interface SystemSummary {
  id: number;
  status: SystemStatus;
  revision: number;
  label: string | null;
  verdict: string;
  outdoorModel: string | null;
  indoorModel: string | null;
  airHandlerModel: string | null;
  updatedAt: string;
}

export interface OutboxEntry {
  id: number;
  /** Null for a proposal e-mail, which belongs to a job (`jobId`) rather than a record. */
  systemId: number | null;
  revision: number | null;
  jobId?: number | null;
  to: string;
  subject: string;
  status: 'sent' | 'failed';
  error: string | null;
  sentAt: string;
  attachmentUrl: string | null;
}

export const systemKeys = {
  all: ['systems'] as const,
  byJob: (jobId: number) => [...systemKeys.all, 'job', jobId] as const,
  detail: (id: number) => [...systemKeys.all, 'detail', id] as const,
  revision: (id: number, n: number) => [...systemKeys.all, 'detail', id, 'revision', n] as const,
  attachments: (jobId: number) => [...systemKeys.all, 'attachments', jobId] as const,
  outbox: (page: number) => [...systemKeys.all, 'outbox', page] as const,
};

export const jobSystemsQuery = (jobId: number) =>
  queryOptions({
    queryKey: systemKeys.byJob(jobId),
    queryFn: ({ signal }) => api.get<{ items: SystemSummary[] }>(`/jobs/${jobId}/systems`, signal).then((r) => r.items),
    staleTime: STALE.jobs,
  });

export const systemQuery = (id: number) =>
  queryOptions({ queryKey: systemKeys.detail(id), queryFn: ({ signal }) => api.get<SystemRecord>(`/systems/${id}`, signal), staleTime: STALE.jobs });

/** One earlier revision as it was saved (revisions never change, so never stale). */
export const revisionQuery = (id: number, n: number) =>
  queryOptions({
    queryKey: systemKeys.revision(id, n),
    queryFn: ({ signal }) => api.get<SystemRecord>(`/systems/${id}/revisions/${n}`, signal),
    staleTime: Infinity,
  });

export const jobAttachmentsQuery = (jobId: number) =>
  queryOptions({
    queryKey: systemKeys.attachments(jobId),
    queryFn: ({ signal }) => api.get<{ items: Attachment[] }>(`/jobs/${jobId}/attachments`, signal).then((r) => r.items),
    staleTime: STALE.jobs,
  });

export const outboxQuery = (page: number) =>
  queryOptions({
    queryKey: systemKeys.outbox(page),
    queryFn: ({ signal }) =>
      api.get<{ items: OutboxEntry[]; total: number; page: number; pageSize: number }>(`/outbox${queryString({ page, pageSize: 50 })}`, signal),
    staleTime: STALE.adminLists,
  });

export const useJobSystems = (jobId: number) => useQuery(jobSystemsQuery(jobId));
export const useSystem = (id: number) => useQuery({ ...systemQuery(id), enabled: Number.isInteger(id) && id > 0 });
export const useRevision = (id: number, n: number | null) => useQuery({ ...revisionQuery(id, n ?? 0), enabled: n !== null });
export const useJobAttachments = (jobId: number) => useQuery(jobAttachmentsQuery(jobId));
export const useOutbox = (page: number) => useQuery(outboxQuery(page));

/** Every record change refreshes records and jobs (a job's detail lists its records). */
function useInvalidateRecords() {
  const client = useQueryClient();
  return () => Promise.all([client.invalidateQueries({ queryKey: systemKeys.all }), client.invalidateQueries({ queryKey: jobKeys.all })]);
}

export function useCreateSystem() {
  const invalidate = useInvalidateRecords();
  return useMutation({
    mutationFn: ({ jobId, body }: { jobId: number; body: SystemCreate }) => api.post<SystemRecord>(`/jobs/${jobId}/systems`, body),
    onSuccess: () => invalidate(),
  });
}

/** PATCH a draft, or POST a new revision of a final record; both carry the revision the edit started from. */
export function useSaveSystem(id: number) {
  const invalidate = useInvalidateRecords();
  return useMutation({
    mutationFn: ({ patch, asNewRevision }: { patch: SystemPatch; asNewRevision: boolean }) =>
      asNewRevision ? api.post<SavedRecord>(`/systems/${id}/revisions`, patch) : api.patch<SavedRecord>(`/systems/${id}`, patch),
    onSuccess: () => invalidate(),
  });
}

export function useFinalizeSystem(id: number) {
  const invalidate = useInvalidateRecords();
  return useMutation({ mutationFn: (body: SystemFinalize) => api.post<SystemRecord>(`/systems/${id}/finalize`, body), onSuccess: () => invalidate() });
}

export function useAddReading(id: number) {
  const invalidate = useInvalidateRecords();
  return useMutation({ mutationFn: (body: ReadingCreate) => api.post<SavedReading>(`/systems/${id}/readings`, body), onSuccess: () => invalidate() });
}

export function useSendReport(id: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: SendReport) => api.post<OutboxEntry>(`/systems/${id}/send`, body),
    onSuccess: () => client.invalidateQueries({ queryKey: [...systemKeys.all, 'outbox'] }),
  });
}

/** Multipart upload of one photo to POST /api/jobs/:id/attachments. */
export function useUploadPhoto(jobId: number) {
  const invalidate = useInvalidateRecords();
  return useMutation({
    mutationFn: ({ file, fileName, kind, systemId }: { file: UploadFile; fileName: string; kind: Attachment['kind']; systemId?: number }) => {
      const form = new FormData();
      form.append('kind', kind);
      if (systemId) form.append('systemId', String(systemId));
      // React Native's FormData takes { uri, name, type }; the web takes a Blob and a file name.
      if (file instanceof Blob) form.append('file', file, fileName);
      else form.append('file', file as unknown as Blob);
      return apiRequest<Attachment>(`/jobs/${jobId}/attachments`, { method: 'POST', body: form });
    },
    onSuccess: () => invalidate(),
  });
}
