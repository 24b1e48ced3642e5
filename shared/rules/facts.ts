import { isA2L } from '../refrigerants/index';
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
