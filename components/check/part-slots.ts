import type { CatalogKind } from '@/shared/schemas/equipment';

/** The parts of a check, in screen order, with their catalog kind and words. */
export const PART_SLOTS = ['outdoor', 'indoorCoil', 'airHandler', 'metering'] as const;
export type PartSlot = (typeof PART_SLOTS)[number];

export const PART_INFO: Record<PartSlot, { kind: Exclude<CatalogKind, 'rated-combinations'>; title: string; optional: boolean }> = {
  outdoor: { kind: 'outdoor-units', title: 'Outdoor unit', optional: false },
  indoorCoil: { kind: 'indoor-coils', title: 'Indoor coil', optional: true },
  airHandler: { kind: 'air-handlers', title: 'Air handler or furnace', optional: true },
  metering: { kind: 'metering-devices', title: 'Field metering kit (optional)', optional: true },
};
