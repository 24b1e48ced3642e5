import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ImportKind } from '@/shared/schemas/equipment';
import type { DecimalConvention, ImportDetail, ImportErrorPage, ImportView } from '@/shared/schemas/imports';
import { api, apiBlob, apiRequest, ApiError, queryString } from './api-client';
import { catalogKeys } from './use-catalog';
import { STALE } from './stale-times';

export type { DecimalConvention, ImportCounts, ImportDetail, ImportErrorPage, ImportRowError, ImportStatus, ImportView } from '@/shared/schemas/imports';

/** A picked file: a web File, or a native { uri, name, type } part. */
export type UploadFile = Blob | { uri: string; name: string; type: string };

export interface UploadInput {
  file: UploadFile;
  fileName: string;
  kind: ImportKind;
  distributor?: string;
  /** `{ "their header": "field" }`; the server remembers it per distributor. */
  mapping?: Record<string, string>;
  /** Price files: the decimal mark chosen by the admin (absent: read from the file). */
  decimalConvention?: DecimalConvention;
}

export const importKeys = {
  all: ['imports'] as const,
  list: () => [...importKeys.all, 'list'] as const,
  errors: (id: number, page: number, pageSize: number) => [...importKeys.all, 'errors', id, page, pageSize] as const,
};

export const importsQuery = () =>
  queryOptions({
    queryKey: importKeys.list(),
    queryFn: ({ signal }) => api.get<{ imports: ImportView[] }>('/imports', signal).then((r) => r.imports),
    staleTime: STALE.adminLists,
  });

export function useImports() {
  return useQuery(importsQuery());
}

/** One page of an import's rejected rows (the server keeps the first 500 with the total count). */
export const importErrorsQuery = (id: number, page: number, pageSize: number) =>
  queryOptions({
    queryKey: importKeys.errors(id, page, pageSize),
    queryFn: ({ signal }) => api.get<ImportErrorPage>(`/imports/${id}/errors${queryString({ page, pageSize })}`, signal),
    staleTime: STALE.adminLists,
  });

export function useImportErrors(id: number, page: number, pageSize: number) {
  return useQuery(importErrorsQuery(id, page, pageSize));
}

/** Fetches an import's rejected rows as CSV (cells a spreadsheet would run as formulas are neutralised). */
export function fetchImportErrorsCsv(id: number): Promise<Blob> {
  return apiBlob(`/imports/${id}/errors.csv`);
}

/** After anything that writes the catalog: the history and every catalog page are stale. */
function invalidateAfterWrite(client: ReturnType<typeof useQueryClient>) {
  return Promise.all([client.invalidateQueries({ queryKey: importKeys.all }), client.invalidateQueries({ queryKey: catalogKeys.all })]);
}

/** Uploads a file as a dry run: the server validates it and stores a preview to commit later. */
export function useUploadPreview() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: UploadInput) => {
      const form = new FormData();
      if (input.file instanceof Blob) form.append('file', input.file, input.fileName);
      else form.append('file', input.file as unknown as Blob); // React Native's FormData takes { uri, name, type }
      form.append('kind', input.kind);
      form.append('dryRun', 'true');
      if (input.distributor) form.append('distributor', input.distributor);
      if (input.mapping) form.append('mapping', JSON.stringify(input.mapping));
      if (input.decimalConvention) form.append('decimalConvention', input.decimalConvention);
      return apiRequest<{ import: ImportDetail }>('/imports', { method: 'POST', body: form }).then((r) => r.import);
    },
    onSuccess: () => client.invalidateQueries({ queryKey: importKeys.all }),
  });
}

export function useCommitImport() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.post<{ import: ImportDetail }>(`/imports/${id}/commit`).then((r) => r.import),
    onSuccess: () => invalidateAfterWrite(client),
  });
}

export function useRevertImport() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.post<{ import: ImportDetail }>(`/imports/${id}/revert`).then((r) => r.import),
    onSuccess: () => invalidateAfterWrite(client),
  });
}

/** The header problem a 422 `no-usable-header` carries: what the file has and what we need. */
export interface HeaderProblem {
  foundColumns: string[];
  missingFields: string[];
  requiredFields: string[];
  knownFields: string[];
}

export function headerProblemOf(error: unknown): HeaderProblem | null {
  if (!(error instanceof ApiError) || error.code !== 'no-usable-header') return null;
  const d = error.details as Partial<HeaderProblem> | undefined;
  if (!d || !Array.isArray(d.foundColumns)) return null;
  return {
    foundColumns: d.foundColumns,
    missingFields: d.missingFields ?? [],
    requiredFields: d.requiredFields ?? [],
    knownFields: d.knownFields ?? [],
  };
}

/** Fetches a kind's CSV template with the session token. */
export function fetchTemplate(kind: ImportKind): Promise<Blob> {
  return apiBlob(`/imports/templates/${kind}`);
}
