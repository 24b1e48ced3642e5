import { normalizeRefrigerantName } from '../schemas/fields';
import { atmosphericPsia, fToKelvin, KPA_PER_PSI, kelvinToF } from './atmosphere';
import { SaturationCurve } from './saturation-curve';
import { SATURATION_MODELS, type SaturationModel } from './saturation-models';

/**
 * Saturation temperature ↔ pressure for every refrigerant Tandem knows, bubble (saturated liquid) and
 * dew (saturated vapor) kept apart for the zeotropic blends. Gauge pressures are read against the
 * standard atmosphere at the given altitude. Valid −40 °F to 150 °F (and below the critical point).
 */

export const SATURATION_MIN_F = -40;
export const SATURATION_MAX_F = 150;

/** A reading outside what the saturation model covers; `field` names the input at fault. */
export class SaturationRangeError extends Error {
  constructor(
    readonly field: 'psig' | 'tempF' | 'refrigerant',
    message: string,
  ) {
    super(message);
    this.name = 'SaturationRangeError';
  }
}

export interface SaturationRange {
  /** Lowest and highest saturation temperature in °F the lookups accept. */
  minF: number;
  maxF: number;
  /** Critical (pseudo-critical for blends) temperature in °F and pressure in psia. */
  criticalF: number;
  criticalPsia: number;
  /** Gauge pressures in psig (sea level) at the ends of the range, bubble and dew. */
  minBubblePsig: number;
  maxBubblePsig: number;
  minDewPsig: number;
  maxDewPsig: number;
  /** Where the equations come from. */
  source: string;
}

interface Curves {
  model: SaturationModel;
  bubble: SaturationCurve;
  dew: SaturationCurve;
  maxF: number;
}

const CURVES = new Map<string, Curves>();
/** Slack in °F at the range ends so a value printed at the end of the range round-trips. */
const EDGE_F = 1e-6;

function modelFor(refrigerant: string): SaturationModel {
  const id = normalizeRefrigerantName(refrigerant);
  const model = typeof id === 'string' ? SATURATION_MODELS[id] : undefined;
  if (!model) throw new SaturationRangeError('refrigerant', `${String(refrigerant)} is not a refrigerant Tandem has saturation data for`);
  return model;
}

/** The sampled curves of a refrigerant, built from its model on first use and kept. */
function curvesFor(refrigerant: string): Curves {
  const cached = CURVES.get(refrigerant);
  if (cached) return cached;
  const model = modelFor(refrigerant);
  const byId = CURVES.get(model.id);
  if (byId) {
    CURVES.set(refrigerant, byId);
    return byId;
  }
  // Stay at least 5 °F under the critical point, where the equations lose accuracy.
  const maxF = Math.min(SATURATION_MAX_F, kelvinToF(model.criticalTempK) - 5);
  const minK = fToKelvin(SATURATION_MIN_F);
  const maxK = fToKelvin(maxF);
  // 2 K between nodes, closer when the padding nodes would otherwise reach the critical point.
  const stepK = Math.min(2, (model.criticalTempK - maxK) / (SaturationCurve.PAD_NODES + 1));
  const curves: Curves = {
    model,
    bubble: new SaturationCurve((t) => model.bubblePressureKpa(t), minK, maxK, stepK),
    dew: new SaturationCurve((t) => model.dewPressureKpa(t), minK, maxK, stepK),
    maxF,
  };
  CURVES.set(model.id, curves);
  CURVES.set(refrigerant, curves);
  return curves;
}

function checkTemp(tempF: number, curves: Curves): number {
  if (!Number.isFinite(tempF)) throw new SaturationRangeError('tempF', 'enter the temperature in °F');
  if (tempF < SATURATION_MIN_F - EDGE_F || tempF > curves.maxF + EDGE_F) {
    const why = tempF > kelvinToF(curves.model.criticalTempK) ? `above the critical point of ${curves.model.id}` : `outside ${SATURATION_MIN_F} °F to ${round1(curves.maxF)} °F`;
    throw new SaturationRangeError('tempF', `${round1(tempF)} °F is ${why}, where the saturation chart does not apply`);
  }
  return fToKelvin(tempF);
}

function absoluteKpa(psig: number, altitudeFt: number, side: 'bubble' | 'dew', c: Curves): number {
  if (!Number.isFinite(psig)) throw new SaturationRangeError('psig', 'enter the pressure in psig');
  const atm = atmosphericPsia(altitudeFt);
  const psia = psig + atm;
  if (psia <= 0) throw new SaturationRangeError('psig', `${round1(psig)} psig is below zero absolute pressure (${round1(-atm)} psig here)`);
  const kpa = psia * KPA_PER_PSI;
  const curve = side === 'bubble' ? c.bubble : c.dew;
  const slack = 1e-9 * kpa;
  if (kpa < curve.minPressureKpa - slack) {
    const lowPsig = curve.minPressureKpa / KPA_PER_PSI - atm;
    throw new SaturationRangeError('psig', `${round1(psig)} psig is below the ${c.model.id} chart, which starts at ${round2(lowPsig)} psig (${SATURATION_MIN_F} °F)`);
  }
  if (kpa > curve.maxPressureKpa + slack) {
    const highPsig = curve.maxPressureKpa / KPA_PER_PSI - atm;
    const why = kpa >= c.model.criticalPressureKpa ? `above the critical pressure of ${c.model.id}` : `above the ${c.model.id} chart, which ends at ${round2(highPsig)} psig (${round1(c.maxF)} °F)`;
    throw new SaturationRangeError('psig', `${round1(psig)} psig is ${why}`);
  }
  return kpa;
}

const round1 = (v: number) => Math.round(v * 10) / 10;
const round2 = (v: number) => Math.round(v * 100) / 100;

/** Bubble point in °F (saturated liquid; for subcooling) at a gauge pressure in psig, altitude in ft. */
export function bubblePointF(psig: number, refrigerant: string, altitudeFt = 0): number {
  const c = curvesFor(refrigerant);
  return kelvinToF(c.bubble.tempK(absoluteKpa(psig, altitudeFt, 'bubble', c)));
}

/** Dew point in °F (saturated vapor; for superheat) at a gauge pressure in psig, altitude in ft. */
export function dewPointF(psig: number, refrigerant: string, altitudeFt = 0): number {
  const c = curvesFor(refrigerant);
  return kelvinToF(c.dew.tempK(absoluteKpa(psig, altitudeFt, 'dew', c)));
}

/** Bubble-point gauge pressure in psig at a saturation temperature in °F, altitude in ft. */
export function bubblePressurePsig(tempF: number, refrigerant: string, altitudeFt = 0): number {
  const c = curvesFor(refrigerant);
  return c.bubble.pressureKpa(checkTemp(tempF, c)) / KPA_PER_PSI - atmosphericPsia(altitudeFt);
}

/** Dew-point gauge pressure in psig at a saturation temperature in °F, altitude in ft. */
export function dewPressurePsig(tempF: number, refrigerant: string, altitudeFt = 0): number {
  const c = curvesFor(refrigerant);
  return c.dew.pressureKpa(checkTemp(tempF, c)) / KPA_PER_PSI - atmosphericPsia(altitudeFt);
}

/** Temperature glide in °F (dew − bubble) at a gauge pressure in psig; about 0 for a pure fluid. */
export function glideF(psig: number, refrigerant: string, altitudeFt = 0): number {
  return dewPointF(psig, refrigerant, altitudeFt) - bubblePointF(psig, refrigerant, altitudeFt);
}

/** Glide in °F (dew − bubble) at the pressure whose dew point is dewF (°F), e.g. 40 °F for an evaporator; sea level. */
export function glideAtDewF(dewF: number, refrigerant: string): number {
  return glideF(dewPressurePsig(dewF, refrigerant), refrigerant);
}

/** The range the lookups accept for a refrigerant (°F, psia, psig at sea level). */
export function saturationRange(refrigerant: string): SaturationRange {
  const c = curvesFor(refrigerant);
  const atm = atmosphericPsia(0);
  return {
    minF: SATURATION_MIN_F,
    maxF: c.maxF,
    criticalF: kelvinToF(c.model.criticalTempK),
    criticalPsia: c.model.criticalPressureKpa / KPA_PER_PSI,
    minBubblePsig: c.bubble.minPressureKpa / KPA_PER_PSI - atm,
    maxBubblePsig: c.bubble.maxPressureKpa / KPA_PER_PSI - atm,
    minDewPsig: c.dew.minPressureKpa / KPA_PER_PSI - atm,
    maxDewPsig: c.dew.maxPressureKpa / KPA_PER_PSI - atm,
    source: c.model.source,
  };
}
