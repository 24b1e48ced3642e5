import { CATALOG_KINDS, type CatalogKind } from '@/shared/schemas/equipment';

/** What each catalog kind is called on screen. */
export const KIND_LABELS: Record<CatalogKind, string> = {
  'outdoor-units': 'Outdoor units',
  'indoor-coils': 'Indoor coils',
  'air-handlers': 'Air handlers & furnaces',
  'metering-devices': 'Metering kits',
  'rated-combinations': 'Rated combinations',
};

/** One item of a kind, for headings ("Outdoor unit"). */
export const KIND_SINGULAR: Record<CatalogKind, string> = {
  'outdoor-units': 'Outdoor unit',
  'indoor-coils': 'Indoor coil',
  'air-handlers': 'Air handler or furnace',
  'metering-devices': 'Metering kit',
  'rated-combinations': 'Rated combination',
};

export function isCatalogKind(value: unknown): value is CatalogKind {
  return typeof value === 'string' && (CATALOG_KINDS as readonly string[]).includes(value);
}

const WORDS: Record<string, string> = {
  ac: 'Air conditioner',
  'heat-pump': 'Heat pump',
  txv: 'TXV (expansion valve)',
  piston: 'Piston (fixed orifice)',
  eev: 'Electronic expansion valve',
  any: 'Any',
  none: 'None',
  upflow: 'Upflow',
  downflow: 'Downflow',
  horizontal: 'Horizontal',
  'multi-position': 'Multi-position',
  copper: 'Copper',
  aluminum: 'Aluminum',
  'air-handler': 'Air handler',
  furnace: 'Furnace',
};

/** An enum value in plain words ("heat-pump" → "Heat pump"). */
export function words(value: string | undefined): string | undefined {
  return value == null ? undefined : (WORDS[value] ?? value);
}
