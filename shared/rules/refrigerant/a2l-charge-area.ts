import { getRefrigerant } from '../../refrigerants';
import { A2L_CHARGE_EDITION, KG_PER_OZ, maxChargeUnventilatedOz, RELEASE_HEIGHT_M, systemChargeOz } from '../../refrigerants/a2l-charge';
import { a2lM1Kg, DETECTION_CITATION } from '../../refrigerants/a2l-detection';
import type { Site } from '../../schemas/check';
import { defineRule } from '../define-rule';
import { a2lIndoorPart, hasDetectionAndMitigation } from '../facts';

const M_PER_FT = 0.3048;

/**
 * Total A2L charge against the unventilated-area limit m_max (UL 60335-2-40 3rd ed. GG.2). At or
 * below m1 (GG.1) no area limit applies. Above m_max the system is allowed only with the listed leak
 * detection and mitigation airflow, whose minimum-area table is in the equipment instructions: a
 * caution then, a blocker without them. The release height of a ducted unit is the lowest supply
 * opening into the room, never below the standard's floor value; unknown, the floor value is used.
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
    if (o.factoryChargeOz === undefined) return [tools.missing("outdoor unit's factory charge", 'A2L charge limit not checked')];
    const lineLengthFt = pairing.lineSet?.lengthFt;
    if (lineLengthFt === undefined) return [tools.missing('line set length', 'A2L charge limit not checked')];
    if (o.chargedLineLengthFt === undefined || o.chargePerFtOz === undefined) {
      return [tools.missing("outdoor unit's charged line length and charge per foot", 'A2L charge limit not checked')];
    }
    const chargeOz = systemChargeOz(o, lineLengthFt) as number;
    // At or below m1 the standard sets no room-area limit (GG.1).
    if (chargeOz * KG_PER_OZ <= a2lM1Kg(lfl)) return [];
    const areaSqFt = pairing.site?.conditionedAreaSqFt;
    if (areaSqFt === undefined) return [tools.missing('conditioned area (sq ft)', 'A2L charge limit not checked')];
    const release = releaseHeight(pairing.site);
    const maxOz = maxChargeUnventilatedOz(lfl, release.heightM, areaSqFt);
    if (chargeOz <= maxOz) return [];
    const mitigated = hasDetectionAndMitigation(pairing);
    const values = {
      systemRefrigerant: system,
      chargeOz: round1(chargeOz),
      factoryChargeOz: o.factoryChargeOz,
      lineLengthFt,
      maxChargeOz: round1(maxOz),
      conditionedAreaSqFt: areaSqFt,
      lflKgM3: lfl,
      releaseHeightM: release.heightM,
      releaseHeightAssumed: release.assumed,
      edition: A2L_CHARGE_EDITION,
    };
    const where = release.assumed
      ? `release at the floor value of ${RELEASE_HEIGHT_M.floor} m, assumed because the lowest supply register height is not given`
      : `release at the lowest supply register, ${round2(release.heightM)} m${release.raisedToFloor ? ' (the standard\'s floor value)' : ''}`;
    const title = `${system} charge ${round1(chargeOz)} oz is above the ${round1(maxOz)} oz allowed for ${areaSqFt} sq ft`;
    const base = `Total ${system} charge ${round1(chargeOz)} oz (factory ${o.factoryChargeOz} oz plus line-set adjustment for ${lineLengthFt} ft) is above the ${round1(maxOz)} oz allowed for ${areaSqFt} sq ft without mitigation (${where}; ${A2L_CHARGE_EDITION}).`;
    const safety = 'A2L refrigerants are mildly flammable: follow the equipment instructions and local codes; the authority having jurisdiction decides.';
    const part = a2lIndoorPart(pairing)?.label ?? 'indoor coil';
    if (mitigated) {
      return [
        tools.finding({
          severity: 'caution',
          title: `${title} without mitigation`,
          detail: `${base} It is allowed only with the listed leak detection and mitigation airflow.`,
          fix: `Confirm the conditioned area meets the minimum in the equipment instructions' table for this charge with mitigation, and that the leak sensor starts the blower. ${safety}`,
          values: { ...values, mitigation: true },
        }),
      ];
    }
    return [
      tools.finding({
        severity: 'blocker',
        title,
        detail: `${base} No listed leak detection with mitigation airflow is given for the ${part}.`,
        fix: `Use a listed leak sensor and an A2L-listed air handler or furnace that runs the mitigation airflow (then check the instructions' minimum-area table), shorten the line set, or choose a smaller system. ${safety}`,
        basis: { kind: 'standard', citation: `${A2L_CHARGE_EDITION}; ${DETECTION_CITATION}` },
        values: { ...values, mitigation: false },
      }),
    ];
  },
});

/** Release height h0 in m: the lowest supply register, never below the floor value; unknown → floor value. */
export function releaseHeight(site: Site | undefined): { heightM: number; assumed: boolean; raisedToFloor: boolean } {
  const ft = site?.lowestRegisterHeightFt;
  if (ft === undefined) return { heightM: RELEASE_HEIGHT_M.floor, assumed: true, raisedToFloor: false };
  const m = ft * M_PER_FT;
  return m < RELEASE_HEIGHT_M.floor ? { heightM: RELEASE_HEIGHT_M.floor, assumed: false, raisedToFloor: true } : { heightM: m, assumed: false, raisedToFloor: false };
}

function round1(n: number): number {
  return Math.round(n * 10) / 10;
}
function round2(n: number): number {
  return Math.round(n * 100) / 100;
}
