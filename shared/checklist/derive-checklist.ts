import { DEFAULT_COMMISSIONING_SETTINGS } from '../commissioning/settings';
import { isA2L, usesPoeOil } from '../refrigerants/index';
import type { Pairing } from '../rules/types';

/** A checklist item drawn from a record's facts, with the reason it is on the list. */
export interface ChecklistItem {
  id: string;
  title: string;
  reason: string;
  basis: string;
}

export interface ChecklistOptions {
  /** The shop's evacuation target in microns of mercury (common practice: 500). */
  evacuationTargetMicrons?: number;
}

/** The evacuation target when the shop sets none: shared/commissioning's default (500 microns, common practice). */
export const DEFAULT_EVACUATION_TARGET_MICRONS = DEFAULT_COMMISSIONING_SETTINGS.evacuationTargetMicrons;

// Where an overflow damages the building (IRC M1411.3, as the condensate rule reads it).
const OVERFLOW_DAMAGE = new Set(['attic', 'above-ceiling', 'closet', 'utility-room']);

/** The checklist for a resolved pairing: each item with its reason, in the order the work is done. */
export function deriveChecklist(p: Pairing, options: ChecklistOptions = {}): ChecklistItem[] {
  const items: ChecklistItem[] = [];
  const o = p.outdoor.spec;
  const heatPump = o.systemType === 'heat-pump';
  const hasIndoor = Boolean(p.indoorCoil || p.airHandler);
  const targetMicrons = options.evacuationTargetMicrons ?? DEFAULT_EVACUATION_TARGET_MICRONS;

  items.push({
    id: 'filter-drier',
    title: heatPump ? 'New bi-flow filter-drier fitted' : 'New liquid-line filter-drier fitted',
    reason: heatPump
      ? 'The system is opened; a heat pump reverses flow, so the drier must be bi-flow.'
      : 'The system is opened: a new drier catches moisture and debris from the work.',
    basis: 'common practice; installation instructions',
  });
  const lineSetFacts = oilChange(p);
  if (lineSetFacts)
    items.push({
      id: 'line-set-flush',
      title: 'Line set flushed or replaced',
      reason: lineSetFacts,
      basis: 'common practice; installation instructions',
    });
  items.push({
    id: 'nitrogen-purge',
    title: 'Nitrogen flowing while brazing',
    reason: 'Brazing without a nitrogen purge leaves copper oxide scale that blocks metering devices and screens.',
    basis: 'common practice; installation instructions',
  });
  items.push({
    id: 'evacuation',
    title: `Evacuated to ${targetMicrons} microns with a decay test`,
    reason: `The shop's target is ${targetMicrons} microns; a decay test shows the system holds it (no leak, no moisture left).`,
    basis: 'common practice; installation instructions',
  });
  if (hasIndoor) {
    const location = p.site?.indoorLocation;
    if (!location || OVERFLOW_DAMAGE.has(location)) {
      items.push({
        id: 'overflow-protection',
        title: 'Float switch or secondary pan fitted',
        reason: location
          ? `The indoor unit is in the ${location.replace('-', ' ')}: an overflow there damages the building.`
          : 'The indoor unit location is not recorded: where an overflow can do damage, a float switch or secondary pan is required.',
        basis: 'IRC M1411.3 / IMC 307.2.3',
      });
    }
    items.push({
      id: 'condensate-trap',
      title: 'Condensate drain trapped and tested',
      reason: 'A drain on the negative-pressure side of the blower needs a trap or the pan will not drain.',
      basis: 'installation instructions; IRC M1411.3',
    });
  }
  items.push({
    id: 'suction-insulation',
    title: 'Suction line insulated its full length',
    reason: 'Bare suction line sweats into the building and gains heat, which cuts capacity.',
    basis: 'common practice; installation instructions',
  });
  items.push({
    id: 'electrical-verified',
    title: 'Breaker and wire verified against MCA/MOCP',
    reason:
      o.mcaAmps !== undefined && o.mocpAmps !== undefined
        ? `The outdoor unit needs wire for at least ${o.mcaAmps} A and protection no larger than ${o.mocpAmps} A.`
        : 'The circuit must suit the nameplate minimum circuit ampacity and maximum overcurrent protection.',
    basis: 'NEC 440.4(B), 440.22; NEC 310.16',
  });
  const sensor = p.indoorCoil?.spec.leakSensor === true;
  if (isA2L(o.refrigerant) || sensor) {
    items.push({
      id: 'a2l-leak-sensor',
      title: 'A2L leak sensor tested',
      reason: sensor
        ? `A refrigerant leak sensor is fitted on this ${o.refrigerant} system: test that it starts the mitigation airflow.`
        : `${o.refrigerant} is a mildly flammable (A2L) refrigerant: where a leak sensor is fitted it must be tested.`,
      basis: 'UL 60335-2-40 (3rd ed.) Annex GG; installation instructions',
    });
  }
  const kept = keptParts(p);
  if (kept.length > 0) {
    items.push({
      id: 'kept-parts-inspected',
      title: 'Kept parts inspected',
      reason: `Staying from the old system: ${kept.join(', ')}. Check for leaks, corrosion, damage and the right listing before reuse.`,
      basis: 'common practice (no source)',
    });
  }
  return items;
}

/** Why a kept line set must be flushed or replaced, or undefined when the facts do not call for it. */
function oilChange(p: Pairing): string | undefined {
  const ls = p.lineSet;
  if (!ls?.reused) return undefined;
  if (ls.burnoutHistory) return 'The kept line set saw a compressor burnout: acid and debris stay in it unless flushed or replaced.';
  if (!ls.previousRefrigerant) return 'The line set is kept but its previous refrigerant is not recorded: confirm the oil before reuse.';
  const before = usesPoeOil(ls.previousRefrigerant);
  const after = usesPoeOil(p.outdoor.spec.refrigerant);
  if (before === false && after === true) {
    return `The line set carried ${ls.previousRefrigerant} (mineral oil); ${p.outdoor.spec.refrigerant} runs in POE oil, which does not mix with it.`;
  }
  return undefined;
}

function keptParts(p: Pairing): string[] {
  const kept: string[] = [];
  if (p.outdoor.kept) kept.push('outdoor unit');
  if (p.indoorCoil?.kept) kept.push('indoor coil');
  if (p.airHandler?.kept) kept.push(p.airHandler.spec.kind === 'furnace' ? 'furnace' : 'air handler');
  if (p.metering?.kept) kept.push('metering device');
  if (p.lineSet?.reused) kept.push('line set');
  return kept;
}
