import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type {
  AirHandlerSpec,
  CatalogKind,
  IndoorCoilSpec,
  MeteringDeviceSpec,
  OutdoorUnitSpec,
  RatedCombinationSpec,
} from '@/shared/schemas/equipment';
import { api, queryString } from './api-client';
import { STALE } from './stale-times';

/** One catalog item as GET /api/catalog/:kind lists it (DESIGN.md §5): its spec plus id. */
export type CatalogEntry =
  | (OutdoorUnitSpec & { id: number })
  | (IndoorCoilSpec & { id: number })
  | (AirHandlerSpec & { id: number })
  | (MeteringDeviceSpec & { id: number })
  | (RatedCombinationSpec & { id: number });

export interface CatalogPage {
  items: CatalogEntry[];
  total: number;
  page: number;
  pageSize: number;
}

/** A distributor that stocks the part (has a current price); the amount only for estimators and admins. */
export interface CatalogPrice {
  distributor: string;
  priceCents?: number;
  currency?: string;
  effectiveFrom: string;
  inStock: true;
}

export interface CatalogDetail {
  item: CatalogEntry;
  prices: CatalogPrice[];
  /** False for a tech: the server left the amounts out. */
  pricesVisible: boolean;
  ratedCombinations: (RatedCombinationSpec & { id: number })[];
}

export interface CatalogSearch {
  q?: string;
  refrigerant?: string;
  tons?: number;
  page: number;
  pageSize: number;
}

// Everything lives under ['catalog', …]: that prefix is persisted for offline use.
export const catalogKeys = {
  all: ['catalog'] as const,
  kind: (kind: CatalogKind) => [...catalogKeys.all, kind] as const,
  list: (kind: CatalogKind, search: CatalogSearch) => [...catalogKeys.kind(kind), 'list', search] as const,
  detail: (kind: CatalogKind, id: number) => [...catalogKeys.kind(kind), 'detail', id] as const,
};

export const catalogListQuery = (kind: CatalogKind, search: CatalogSearch) =>
  queryOptions({
    queryKey: catalogKeys.list(kind, search),
    queryFn: ({ signal }) => api.get<CatalogPage>(`/catalog/${kind}${queryString({ ...search })}`, signal),
    staleTime: STALE.catalog,
    // Keep the last page on screen while the next search runs: no flash of emptiness as you type.
    placeholderData: keepPreviousData,
  });

export const catalogDetailQuery = (kind: CatalogKind, id: number) =>
  queryOptions({
    queryKey: catalogKeys.detail(kind, id),
    queryFn: ({ signal }) => api.get<CatalogDetail>(`/catalog/${kind}/${id}`, signal),
    staleTime: STALE.catalog,
  });

export function useCatalogList(kind: CatalogKind, search: CatalogSearch) {
  return useQuery(catalogListQuery(kind, search));
}

export function useCatalogDetail(kind: CatalogKind, id: number) {
  return useQuery({ ...catalogDetailQuery(kind, id), enabled: Number.isInteger(id) && id > 0 });
}
