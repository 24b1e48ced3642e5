import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { CompatibleCoilsResponse } from '@/shared/schemas/coils';
import { api, queryString } from './api-client';
import { STALE } from './stale-times';

/** The search of GET /api/coils/compatible as the screen builds it (DESIGN.md §5). */
export interface CoilsSearch {
  outdoorUnitId: number;
  airHandlerId?: number;
  q?: string;
  state?: string;
  configuration?: string;
  material?: string;
  cased?: boolean;
  ratedOnly?: boolean;
  inStock?: boolean;
  includeIncompatible?: boolean;
  limit?: number;
}

// Under ['coils', …], not ['catalog']: the answer carries prices, which are not kept for offline use.
export const coilKeys = {
  all: ['coils'] as const,
  compatible: (search: CoilsSearch) => [...coilKeys.all, 'compatible', search] as const,
};

export const compatibleCoilsQuery = (search: CoilsSearch) =>
  queryOptions({
    queryKey: coilKeys.compatible(search),
    queryFn: ({ signal }) => api.get<CompatibleCoilsResponse>(`/coils/compatible${queryString({ ...search })}`, signal),
    staleTime: STALE.catalog,
    placeholderData: keepPreviousData,
  });

/** Coils that pass with the chosen outdoor unit (and kept air handler); idle until an outdoor unit is picked. */
export function useCompatibleCoils(search: CoilsSearch | null) {
  return useQuery({ ...compatibleCoilsQuery(search ?? { outdoorUnitId: 0 }), enabled: search !== null });
}
