// Sources: ANSI/ASHRAE Standard 34 (safety class, composition, LFL), IPCC AR4 WG1 Table 2.14
// (100-year GWP, the basis US rules use). Saturation properties are not here (see DESIGN §4).
import { normalizeRefrigerantName } from '../schemas/fields';
import { blendGwp } from './components';
import { REFRIGERANT_DATA, type RefrigerantData } from './refrigerant-data';

export type { RefrigerantData, SafetyClass, OilType, ChemicalKind } from './refrigerant-data';
export { blendGwp, COMPONENTS } from './components';

export interface Refrigerant extends RefrigerantData {
  /** 100-year GWP on the IPCC AR4 basis, rounded to a whole number (dimensionless). */
  gwp100Ar4: number;
}

const BY_ID = new Map<string, Refrigerant>(
  REFRIGERANT_DATA.map((r) => [r.id, { ...r, gwp100Ar4: Math.round(blendGwp(r.compositionMassPct)) }]),
);

/** All refrigerants Tandem knows, in trade spelling. */
export function listRefrigerants(): Refrigerant[] {
  return [...BY_ID.values()];
}

/** The refrigerant by trade name ("R-410A", "410a", "r32"); undefined when unknown. */
export function getRefrigerant(name: string | undefined | null): Refrigerant | undefined {
  if (!name) return undefined;
  const direct = BY_ID.get(name as Refrigerant['id']);
  if (direct) return direct;
  const id = normalizeRefrigerantName(name);
  return typeof id === 'string' ? BY_ID.get(id) : undefined;
}

/** True when the refrigerant is ASHRAE 34 class A2L (mildly flammable). */
export function isA2L(name: string | undefined | null): boolean {
  return getRefrigerant(name)?.safetyClass === 'A2L';
}

/** True when the refrigerant runs in POE oil (false for mineral oil; undefined when unknown). */
export function usesPoeOil(name: string | undefined | null): boolean | undefined {
  const r = getRefrigerant(name);
  return r ? r.oil === 'poe' : undefined;
}

export {
  bubblePointF,
  bubblePressurePsig,
  dewPointF,
  dewPressurePsig,
  glideF,
  glideAtDewF,
  saturationRange,
  SaturationRangeError,
  SATURATION_MAX_F,
  SATURATION_MIN_F,
  type SaturationRange,
} from './saturation';
export { atmosphericPsia, absoluteToGaugePsig, gaugeToAbsolutePsia } from './atmosphere';
