import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { RulesSettingsBody, RulesSettingsResponse } from '@/shared/schemas/settings';
import { apiRequest } from './api-client';
import { OFFLINE_CACHE_MAX_AGE, STALE } from './stale-times';

// Under ['settings', 'rules']: that prefix is persisted so a check offline runs with the shop's settings.
export const ruleSettingsKeys = {
  all: ['settings', 'rules'] as const,
};

export const ruleSettingsQuery = () =>
  queryOptions({
    queryKey: ruleSettingsKeys.all,
    queryFn: ({ signal }) => apiRequest<RulesSettingsResponse>('/settings/rules', { signal }),
    staleTime: STALE.ruleSettings,
    // Kept in memory as long as the persisted copy lives.
    gcTime: OFFLINE_CACHE_MAX_AGE,
  });

export function useRuleSettings() {
  return useQuery(ruleSettingsQuery());
}

export function useSaveRuleSettings() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: RulesSettingsBody) => apiRequest<RulesSettingsResponse>('/settings/rules', { method: 'PUT', body }),
    onSuccess: (saved) => {
      client.setQueryData(ruleSettingsKeys.all, saved);
      return client.invalidateQueries({ queryKey: ruleSettingsKeys.all });
    },
  });
}
