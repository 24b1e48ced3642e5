import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Job, JobChange, JobCreate, JobPatch, JobStatus } from '@/shared/schemas/jobs';
import { api, queryString } from './api-client';
import { STALE } from './stale-times';

export interface JobListParams {
  q?: string;
  status?: JobStatus;
  page: number;
  pageSize: number;
}
export interface JobPage {
  items: Job[];
  total: number;
  page: number;
  pageSize: number;
}
export type JobDetail = Job & { history: JobChange[] };

export const jobKeys = {
  all: ['jobs'] as const,
  lists: () => [...jobKeys.all, 'list'] as const,
  list: (params: JobListParams) => [...jobKeys.lists(), params] as const,
  detail: (id: number) => [...jobKeys.all, 'detail', id] as const,
};

/** GET /api/jobs: newest first, searched by customer or address, filtered by status, paged. */
export const jobsQuery = (params: JobListParams) =>
  queryOptions({
    queryKey: jobKeys.list(params),
    queryFn: ({ signal }) =>
      api.get<JobPage>(`/jobs${queryString({ q: params.q, status: params.status, page: params.page, pageSize: params.pageSize })}`, signal),
    staleTime: STALE.jobs,
    placeholderData: keepPreviousData,
  });

export const jobQuery = (id: number) =>
  queryOptions({
    queryKey: jobKeys.detail(id),
    queryFn: ({ signal }) => api.get<JobDetail>(`/jobs/${id}`, signal),
    staleTime: STALE.jobs,
  });

export function useJobs(params: JobListParams) {
  return useQuery(jobsQuery(params));
}

export function useJob(id: number) {
  return useQuery({ ...jobQuery(id), enabled: Number.isInteger(id) && id > 0 });
}

export function useCreateJob() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: JobCreate) => api.post<Job>('/jobs', input),
    onSuccess: () => client.invalidateQueries({ queryKey: jobKeys.all }),
  });
}

export function useUpdateJob(id: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (patch: JobPatch) => api.patch<JobDetail>(`/jobs/${id}`, patch),
    onSuccess: () => client.invalidateQueries({ queryKey: jobKeys.all }),
  });
}
