import type { CoilsSearch } from '@/hooks/use-coils';
import type { Option } from '@/components/check/field-types';

/** The filter chips of the Coils screen and how they map onto the API's search (no React). */

export interface CoilFilterState {
  configuration: string;
  material: string;
  cased: string;
  /** Toggles joined by ';' (rated, stock, incompatible). */
  toggles: string;
}

export const EMPTY_FILTERS: CoilFilterState = { configuration: '', material: '', cased: '', toggles: '' };

export const CONFIGURATION_OPTIONS: Option[] = [
  { value: 'upflow', label: 'Upflow' },
  { value: 'downflow', label: 'Downflow' },
  { value: 'horizontal', label: 'Horizontal' },
  { value: 'multi-position', label: 'Multi-position' },
];
export const MATERIAL_OPTIONS: Option[] = [
  { value: 'copper', label: 'Copper' },
  { value: 'aluminum', label: 'Aluminum' },
];
export const CASED_OPTIONS: Option[] = [
  { value: 'yes', label: 'Cased' },
  { value: 'no', label: 'Uncased' },
];
export const TOGGLE_OPTIONS: Option[] = [
  { value: 'rated', label: 'Rated together only' },
  { value: 'stock', label: 'In stock' },
  { value: 'incompatible', label: 'Also show coils that do not fit' },
];

/** The API search for the picked parts, typed text and chips; null until an outdoor unit is picked. */
export function coilsSearchOf(input: { outdoorUnitId?: number; airHandlerId?: number; q: string; state: string; filters: CoilFilterState }): CoilsSearch | null {
  if (!input.outdoorUnitId) return null;
  const on = new Set(input.filters.toggles.split(';').filter(Boolean));
  const state = input.state.trim().toUpperCase();
  const search: CoilsSearch = { outdoorUnitId: input.outdoorUnitId };
  if (input.airHandlerId) search.airHandlerId = input.airHandlerId;
  if (input.q.trim()) search.q = input.q.trim();
  if (/^[A-Z]{2}$/.test(state)) search.state = state;
  if (input.filters.configuration) search.configuration = input.filters.configuration;
  if (input.filters.material) search.material = input.filters.material;
  if (input.filters.cased) search.cased = input.filters.cased === 'yes';
  if (on.has('rated')) search.ratedOnly = true;
  if (on.has('stock')) search.inStock = true;
  if (on.has('incompatible')) search.includeIncompatible = true;
  return search;
}
