import { getRefrigerant, isA2L } from '../../refrigerants';
import { A2L_CHARGE_EDITION, maxChargeUnventilatedOz, RELEASE_HEIGHT_M, systemChargeOz, type ReleaseLocation } from '../../refrigerants/a2l-charge';
import { a2lListingOf } from '../../refrigerants/a2l-detection';
import type { Site } from '../../schemas/check';
import { defineRule } from '../define-rule';
import type { Pairing } from '../types';

/**
 * Total A2L charge against the unventilated-area limit m_max (UL 60335-2-40 3rd ed. GG.2).
 * Above it, the system is allowed only with the listed leak detection and mitigation airflow, whose
 * minimum-area table is in the equipment instructions: a caution then, a blocker without them.
 */
export const a2lChargeArea = defineRule({
  id: 'refrigerant.a2l-charge-area',
  title: 'A2L charge for the conditioned area',
  basis: { kind: 'standard', citation: A2L_CHARGE_EDITION },
  evaluate(pairing, _context, tools) {
    const system = pairing.outdoor.spec.refrigerant;
    const lfl = getRefrigerant(system)?.lflKgM3;
    if (lfl === undefined) return [];
    const o = pairing.outdoor.spec;
    const areaSqFt = pairing.site?.conditionedAreaSqFt;
    if (areaSqFt === undefined) return [tools.missing('conditioned area (sq ft)', 'A2L charge limit not checked')];
    if (o.factoryChargeOz === undefined) return [tools.missing("outdoor unit's factory charge", 'A2L charge limit not checked')];
    if (!pairing.lineSet) return [tools.missing('line-set length', 'A2L charge limit not checked')];
    if (o.chargedLineLengthFt === undefined || o.chargePerFtOz === undefined) {
      return [tools.missing("outdoor unit's charged line length and charge per foot", 'A2L charge limit not checked')];
    }
    const chargeOz = systemChargeOz(o, pairing.lineSet.lengthFt) as number;
    const { location, assumed } = releaseLocation(pairing.site);
    const h0 = RELEASE_HEIGHT_M[location];
    const maxOz = maxChargeUnventilatedOz(lfl, h0, areaSqFt);
    if (chargeOz <= maxOz) return [];
    const mitigated = hasDetectionAndMitigation(pairing);
    const values = {
      systemRefrigerant: system,
      chargeOz: round1(chargeOz),
      factoryChargeOz: o.factoryChargeOz,
      lineLengthFt: pairing.lineSet.lengthFt,
      maxChargeOz: round1(maxOz),
      conditionedAreaSqFt: areaSqFt,
      lflKgM3: lfl,
      releaseHeightM: h0,
      releaseLocation: location,
      edition: A2L_CHARGE_EDITION,
    };
    const where = `${location} release, h0 = ${h0} m${assumed ? ', assumed because the indoor location is not given' : ''}`;
    const base = `Total ${system} charge ${round1(chargeOz)} oz (factory ${o.factoryChargeOz} oz plus line-set adjustment for ${pairing.lineSet.lengthFt} ft) is above the ${round1(maxOz)} oz allowed for ${areaSqFt} sq ft without mitigation (${where}; ${A2L_CHARGE_EDITION}).`;
    const safety = 'A2L refrigerants are mildly flammable: follow the equipment instructions and local codes; the AHJ decides.';
    if (mitigated) {
      return [
        tools.finding({
          severity: 'caution',
          detail: `${base} It is allowed only with the listed leak detection and mitigation airflow.`,
          fix: `Confirm the conditioned area meets the minimum in the equipment instructions' table for this charge with mitigation, and that the leak sensor starts the blower. ${safety}`,
          values: { ...values, mitigation: true },
        }),
      ];
    }
    return [
      tools.finding({
        severity: 'blocker',
        detail: `${base} No listed leak detection with mitigation airflow is given.`,
        fix: `Use a listed leak sensor and an A2L-listed air handler or furnace that runs the mitigation airflow (then check the instructions' minimum-area table), shorten the line set, or choose a smaller system. ${safety}`,
        values: { ...values, mitigation: false },
      }),
    ];
  },
});

/** Ceiling release for parts above the ceiling; floor (the lowest, most conservative h0) otherwise. */
function releaseLocation(site: Site | undefined): { location: ReleaseLocation; assumed: boolean } {
  const where = site?.indoorLocation;
  if (where === 'attic' || where === 'above-ceiling') return { location: 'ceiling', assumed: false };
  return { location: 'floor', assumed: where === undefined };
}

function hasDetectionAndMitigation(pairing: Pairing): boolean {
  const coil = pairing.indoorCoil?.spec;
  const ah = pairing.airHandler?.spec;
  return coil?.leakSensor === true && !!ah && a2lListingOf(ah, isA2L) === true;
}

function round1(n: number): number {
  return Math.round(n * 10) / 10;
}
