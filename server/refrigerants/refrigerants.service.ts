import {
  bubblePointF,
  bubblePressurePsig,
  dewPointF,
  dewPressurePsig,
  getRefrigerant,
  glideAtDewF,
  listRefrigerants,
  saturationRange,
  type Refrigerant,
} from '../../shared/refrigerants';
import type { SaturationQuery } from '../../shared/schemas/commissioning';
import type { RefrigerantSummary, SaturationAtPressure, SaturationAtTemperature } from '../../shared/schemas/refrigerants';
import { fieldError, withRangeCheck } from '../commissioning/range-errors';

/** The glide is quoted at a 40 °F dew point, a typical cooling evaporator (common practice, no source). */
const GLIDE_AT_DEW_F = 40;

/** Every refrigerant Tandem computes, with its safety class, GWP, oil, glide and valid range. */
export function refrigerantSummaries(): RefrigerantSummary[] {
  return listRefrigerants().map(summarize);
}

/** The refrigerant named in the URL in any trade spelling; unknown is bad input (422). */
export function findRefrigerant(name: string): Refrigerant {
  const found = getRefrigerant(name);
  if (!found)
    throw fieldError(
      'refrigerant',
      `Tandem does not know the refrigerant "${name}". Known: ${listRefrigerants()
        .map((r) => r.id)
        .join(', ')}.`,
    );
  return found;
}

/** Bubble and dew points at a gauge pressure, or bubble and dew pressures at a temperature. */
export function saturation(refrigerant: Refrigerant, query: SaturationQuery): SaturationAtPressure | SaturationAtTemperature {
  const altitudeFt = query.altitudeFt ?? 0;
  const id = refrigerant.id;
  if (query.psig !== undefined) {
    const psig = query.psig;
    return withRangeCheck(
      () => ({ refrigerant: id, psig, bubbleF: bubblePointF(psig, id, altitudeFt), dewF: dewPointF(psig, id, altitudeFt) }),
      () => 'psig',
    );
  }
  const tempF = query.tempF as number;
  return withRangeCheck(
    () => ({
      refrigerant: id,
      tempF,
      bubblePsig: bubblePressurePsig(tempF, id, altitudeFt),
      dewPsig: dewPressurePsig(tempF, id, altitudeFt),
    }),
    () => 'tempF',
  );
}

function summarize(r: Refrigerant): RefrigerantSummary {
  const range = saturationRange(r.id);
  const glideF = r.zeotropic ? glideAtDewF(GLIDE_AT_DEW_F, r.id) : 0;
  return {
    id: r.id,
    kind: r.kind,
    safetyClass: r.safetyClass,
    gwp: r.gwp100Ar4,
    oil: r.oil,
    zeotropic: r.zeotropic,
    glideF: Math.round(glideF * 10) / 10,
    glideAtDewF: GLIDE_AT_DEW_F,
    validRange: { minF: range.minF, maxF: range.maxF, criticalF: range.criticalF, criticalPsia: range.criticalPsia },
  };
}
