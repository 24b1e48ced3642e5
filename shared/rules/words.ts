import type { AIRFLOW_DIRECTIONS, INDOOR_LOCATIONS } from '../schemas/check';
import type { COIL_CONFIGURATIONS } from '../schemas/equipment';
import type { AirHandlerSpec } from '../schemas/equipment';

/** Plain words for the request's coded choices, so no raw code reaches a finding. */

/** Where the indoor unit sits, as a phrase: "in an attic", "above a ceiling". */
export const LOCATION_WORDS: Record<(typeof INDOOR_LOCATIONS)[number], string> = {
  attic: 'in an attic',
  'above-ceiling': 'above a ceiling',
  closet: 'in a closet',
  'utility-room': 'in a utility room',
  basement: 'in a basement',
  garage: 'in a garage',
  crawlspace: 'in a crawlspace',
};

/** An installation's airflow direction in words: "horizontal, discharging left". */
export const DIRECTION_WORDS: Record<(typeof AIRFLOW_DIRECTIONS)[number], string> = {
  upflow: 'upflow',
  downflow: 'downflow',
  'horizontal-left': 'horizontal, discharging left',
  'horizontal-right': 'horizontal, discharging right',
};

/** A coil's built configuration in words. */
export const CONFIGURATION_WORDS: Record<(typeof COIL_CONFIGURATIONS)[number], string> = {
  upflow: 'upflow',
  downflow: 'downflow',
  horizontal: 'horizontal',
  'multi-position': 'multi-position',
};

/** "furnace" or "air handler" for a blower cabinet. */
export function cabinetName(ah: Pick<AirHandlerSpec, 'kind'>): string {
  return ah.kind === 'furnace' ? 'furnace' : 'air handler';
}

/** "single-phase" / "three-phase". */
export function phaseWords(phase: 1 | 3): string {
  return phase === 1 ? 'single-phase' : 'three-phase';
}
