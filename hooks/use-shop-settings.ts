import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ShopSettings, ShopSettingsResponse } from '@/shared/schemas/options';
import { apiRequest } from './api-client';
import { ruleSettingsKeys } from './use-rule-settings';
import { STALE } from './stale-times';

// Under ['settings', 'shop'], beside the rule settings; not persisted for offline use (estimates need the server).
export const shopSettingsKeys = {
  all: ['settings', 'shop'] as const,
};

/**
 * Priced options on a job are computed with the current shop settings (energy hours and ¢/kWh, rebate tiers,
 * the repair-or-replace threshold), so a save makes them stale too. The prefix of the options queries' keys.
 */
const OPTIONS_PREFIX = ['options'] as const;

export const shopSettingsQuery = () =>
  queryOptions({
    queryKey: shopSettingsKeys.all,
    queryFn: ({ signal }) => apiRequest<ShopSettingsResponse>('/settings/shop', { signal }),
    staleTime: STALE.shopSettings,
  });

/** GET /api/settings/shop (estimator, admin): the shop's pricing and estimate settings with their defaults. */
export function useShopSettings() {
  return useQuery(shopSettingsQuery());
}

/** PUT /api/settings/shop (admin): replaces every setting. */
export function useSaveShopSettings() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: ShopSettings) => apiRequest<ShopSettingsResponse>('/settings/shop', { method: 'PUT', body }),
    onSuccess: (saved) => {
      client.setQueryData(shopSettingsKeys.all, saved);
      return Promise.all([
        client.invalidateQueries({ queryKey: shopSettingsKeys.all }),
        client.invalidateQueries({ queryKey: OPTIONS_PREFIX }),
        // The rebate tiers are also what checks (on the phone too) are judged against.
        client.invalidateQueries({ queryKey: ruleSettingsKeys.all }),
      ]);
    },
  });
}
