import { normalizeRefrigerantName } from '@/shared/schemas/fields';
import type { ReadingsDraft } from './readings-draft';

/** A picked catalog part: its id, its label and its whole spec. */
interface PickedUnit {
  id: number;
  label: string;
  spec: Record<string, unknown>;
}

/** What a catalog outdoor unit brings to the readings: its refrigerant and its own target subcooling. */
export function applyUnit(draft: ReadingsDraft, unit: PickedUnit): ReadingsDraft {
  const refrigerant = normalizeRefrigerantName(unit.spec.refrigerant);
  const target = unit.spec.targetSubcoolingF;
  return {
    ...draft,
    unitLabel: unit.label,
    refrigerant: typeof refrigerant === 'string' && refrigerant ? refrigerant : draft.refrigerant,
    values: typeof target === 'number' ? { ...draft.values, targetSubcoolingF: String(target) } : draft.values,
  };
}
