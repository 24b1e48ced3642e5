import { elbowEquivalentFt } from '../lineset/fittings';
import { a2lListingOf } from '../refrigerants/a2l-detection';
import { isA2L } from '../refrigerants/index';
import type { AirHandlerSpec } from '../schemas/equipment';
import type { Pairing } from './types';

/** Facts several rules read from a pairing, worked out one way in one place. */

export type MeteringKind = 'txv' | 'piston' | 'eev' | 'none';

export interface MeteringInUse {
  /** 'kit' when a field-installed device is given, else the coil's own. */
  source: 'kit' | 'coil';
  type: MeteringKind;
  refrigerant?: string;
  bidirectional?: boolean;
  bleed?: boolean;
  pistonSizeIn?: number;
  model?: string;
}

/** The metering device in use: the field kit if one is given, else the indoor coil's own; undefined with neither. */
export function meteringInUse(pairing: Pairing): MeteringInUse | undefined {
  const kit = pairing.metering?.spec;
  if (kit) {
    return { source: 'kit', type: kit.type, refrigerant: kit.refrigerant, bidirectional: kit.bidirectional, bleed: kit.bleed, pistonSizeIn: kit.pistonSizeIn, model: kit.model };
  }
  const coil = pairing.indoorCoil?.spec;
  if (!coil) return undefined;
  return {
    source: 'coil',
    type: coil.meteringType,
    refrigerant: coil.meteringRefrigerant,
    bidirectional: coil.meteringBidirectional,
    bleed: coil.meteringBleed,
    pistonSizeIn: coil.pistonSizeIn,
    model: coil.model,
  };
}

/** Words for the metering device in use ("the field TXV kit", "the coil's piston"). */
export function describeMetering(m: MeteringInUse): string {
  const name = m.type === 'txv' ? 'TXV' : m.type === 'eev' ? 'electronic expansion valve' : m.type === 'piston' ? 'piston' : 'metering device';
  return m.source === 'kit' ? `the field ${name} kit` : `the coil's ${name}`;
}

/** True for a heat pump outdoor unit. */
export function isHeatPump(pairing: Pairing): boolean {
  return pairing.outdoor.spec.systemType === 'heat-pump';
}

/** True when the refrigerant (trade spelling) is ASHRAE 34 class A2L (R-32, R-454B: values.json RP-03, RP-04). */
export function isA2lRefrigerant(refrigerant: string): boolean {
  return isA2L(refrigerant);
}

/** Tons formatted for a sentence: 3, 2.5, 1.75. */
export function fmtTons(tons: number): string {
  return String(Math.round(tons * 100) / 100);
}

/** A number rounded to `digits` decimals for a sentence. */
export function fmt(value: number, digits = 1): string {
  const f = 10 ** digits;
  return String(Math.round(value * f) / f);
}

/**
 * True when a blower cabinet holds refrigerant itself: an air handler (never a furnace) that lists
 * refrigerants, or one with no separate coil in the pairing (its own coil is then the indoor coil).
 */
export function holdsRefrigerantIndoors(ah: AirHandlerSpec, hasSeparateCoil: boolean): boolean {
  if (ah.kind !== 'air-handler') return false;
  return (ah.refrigerants?.length ?? 0) > 0 || !hasSeparateCoil;
}

/** The indoor part that holds the refrigerant (and so carries the A2L leak sensor): the coil, else an air handler with its own coil. */
export function a2lIndoorPart(pairing: Pairing): { label: string; leakSensor?: boolean; a2lListed?: boolean; refrigerants?: string[] } | undefined {
  const coil = pairing.indoorCoil?.spec;
  if (coil) return { label: 'indoor coil', leakSensor: coil.leakSensor, a2lListed: coil.a2lListed, refrigerants: coil.refrigerants };
  const ah = pairing.airHandler?.spec;
  if (ah && holdsRefrigerantIndoors(ah, false)) return { label: 'air handler', leakSensor: ah.leakSensor, a2lListed: ah.a2lListed, refrigerants: ah.refrigerants };
  return undefined;
}

/** True when the refrigerant-holding part has a leak sensor and the blower cabinet is A2L-listed (it runs the mitigation airflow). */
export function hasDetectionAndMitigation(pairing: Pairing): boolean {
  const part = a2lIndoorPart(pairing);
  const ah = pairing.airHandler?.spec;
  const sensor = part?.leakSensor === true || (part?.label === 'indoor coil' && ah?.leakSensor === true);
  return sensor && !!ah && a2lListingOf(ah, isA2L) === true;
}

/** The run length the line-set rules share (measured, plus elbows' equivalent length). */
export interface RunLength {
  /** Measured plus elbows' equivalent length, ft; undefined when elbows are given but no suction size is known. */
  equivalentFt?: number;
  elbowsCounted: boolean;
  /** Words for a sentence: "80 ft measured plus 6 elbows at 2 ft (7/8 in)". */
  words: string;
}

/** Equivalent length of the pairing's line set: measured length + elbows × ft per elbow at the suction size. */
export function runLength(pairing: Pairing): RunLength {
  const line = pairing.lineSet;
  const lengthFt = line?.lengthFt ?? 0;
  const elbows = line?.elbows;
  if (!elbows) return { equivalentFt: lengthFt, elbowsCounted: false, words: `${fmt(lengthFt)} ft measured${elbows === undefined ? ' (elbows not given)' : ''}` };
  const sizeIn = line?.suctionOdIn ?? pairing.outdoor.spec.suctionLineOdIn;
  const per = sizeIn === undefined ? undefined : elbowEquivalentFt(sizeIn);
  if (per === undefined) return { equivalentFt: undefined, elbowsCounted: false, words: `${fmt(lengthFt)} ft measured` };
  return { equivalentFt: lengthFt + elbows * per, elbowsCounted: true, words: `${fmt(lengthFt)} ft measured plus ${elbows} ${elbows === 1 ? 'elbow' : 'elbows'} at ${fmt(per)} ft each` };
}
