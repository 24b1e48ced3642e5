import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  EnergyQuery,
  OptionInput,
  OptionListResponse,
  OptionPatch,
  OptionView,
  ProposalSend,
  ProposalSendResult,
  RepairOrReplaceInput,
  RepairOrReplaceResult,
} from '@/shared/schemas/options';
import { api, apiRequest, queryString } from './api-client';
import { jobKeys } from './use-jobs';
import { systemKeys, type SystemRecord } from './use-systems';
import { STALE } from './stale-times';

/** Existing-system facts the energy comparison uses, as query parameters (absent ones left out). */
export function energyParams(energy: EnergyQuery): Record<string, string | number | boolean | undefined> {
  return { ...energy };
}

export const optionKeys = {
  all: ['options'] as const,
  byJob: (jobId: number) => [...optionKeys.all, 'job', jobId] as const,
  list: (jobId: number, energy: EnergyQuery) => [...optionKeys.byJob(jobId), energy] as const,
  detail: (id: number) => [...optionKeys.all, 'detail', id] as const,
};

/** GET /api/jobs/:id/options: every option with its check, price and energy against the existing system. */
export const jobOptionsQuery = (jobId: number, energy: EnergyQuery) =>
  queryOptions({
    queryKey: optionKeys.list(jobId, energy),
    queryFn: ({ signal }) => api.get<OptionListResponse>(`/jobs/${jobId}/options${queryString(energyParams(energy))}`, signal),
    staleTime: STALE.options,
    // Typing the existing system's figures re-asks; the cards stay on screen meanwhile.
    placeholderData: keepPreviousData,
  });

export const optionQuery = (id: number) =>
  queryOptions({ queryKey: optionKeys.detail(id), queryFn: ({ signal }) => api.get<OptionView>(`/options/${id}`, signal), staleTime: STALE.options });

export function useJobOptions(jobId: number, energy: EnergyQuery = {}) {
  return useQuery({ ...jobOptionsQuery(jobId, energy), enabled: Number.isInteger(jobId) && jobId > 0 });
}

/** Every option change refreshes the options and the job (its chosen option). */
function useInvalidateOptions() {
  const client = useQueryClient();
  return () => Promise.all([client.invalidateQueries({ queryKey: optionKeys.all }), client.invalidateQueries({ queryKey: jobKeys.all })]);
}

export function useCreateOption(jobId: number) {
  const invalidate = useInvalidateOptions();
  return useMutation({ mutationFn: (input: OptionInput) => api.post<OptionView>(`/jobs/${jobId}/options`, input), onSuccess: () => invalidate() });
}

/** PATCH an option from the revision the edit started on (409 when someone saved since). */
export function useSaveOption() {
  const invalidate = useInvalidateOptions();
  return useMutation({ mutationFn: ({ id, patch }: { id: number; patch: OptionPatch }) => api.patch<OptionView>(`/options/${id}`, patch), onSuccess: () => invalidate() });
}

export function useDeleteOption() {
  const invalidate = useInvalidateOptions();
  return useMutation({ mutationFn: (id: number) => apiRequest<void>(`/options/${id}`, { method: 'DELETE' }), onSuccess: () => invalidate() });
}

/** Records the customer's choice on the job. */
export function useChooseOption() {
  const invalidate = useInvalidateOptions();
  return useMutation({
    mutationFn: (id: number) => api.post<{ chosenOptionId: number; option: OptionView }>(`/options/${id}/choose`, {}),
    onSuccess: () => invalidate(),
  });
}

/** Turns an option into a draft matched-system record on its job. */
export function useMakeRecord() {
  const invalidate = useInvalidateOptions();
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.post<SystemRecord>(`/options/${id}/make-record`, {}),
    onSuccess: () => Promise.all([invalidate(), client.invalidateQueries({ queryKey: systemKeys.all })]),
  });
}

/** Works out repair or replace for the job's existing system against its options (nothing is stored). */
export function useRepairOrReplace(jobId: number) {
  return useMutation({ mutationFn: (input: RepairOrReplaceInput) => api.post<RepairOrReplaceResult>(`/jobs/${jobId}/repair-or-replace`, input) });
}

export function useSendProposal(jobId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: ProposalSend) => api.post<ProposalSendResult>(`/jobs/${jobId}/proposal/send`, body),
    onSuccess: () => client.invalidateQueries({ queryKey: [...systemKeys.all, 'outbox'] }),
  });
}
