import { getRefrigerant, isA2L } from '../../refrigerants';
import { KG_PER_OZ, systemChargeOz } from '../../refrigerants/a2l-charge';
import { a2lListingOf, DETECTION_CITATION, DETECTION_THRESHOLD_M3, detectionThresholdKg } from '../../refrigerants/a2l-detection';
import { a2lIndoorPart } from '../facts';
import { defineRule, type RuleTools } from '../define-rule';
import { capitalize, withArticle } from '../text';
import type { Finding, Pairing } from '../types';

const SAFETY =
  'A2L refrigerants are mildly flammable: work by certified technicians, keep ignition sources away, and follow the equipment instructions and local codes (the AHJ decides).';

const DETECTION_BASIS = { kind: 'standard' as const, citation: DETECTION_CITATION };
/** An indoor part's A2L listing: the listing standard and the EPA use conditions that require it. */
const LISTING_BASIS = { kind: 'standard' as const, citation: 'UL 60335-2-40, 3rd ed. (2019) listing for A2L refrigerants; EPA SNAP Rule 23 use conditions (86 FR 24444)' };

/** A2L systems need A2L-listed indoor parts and, above m1, a refrigerant detection system (DESIGN §3). */
export const a2lListing = defineRule({
  id: 'refrigerant.a2l-listing',
  title: 'A2L listing and leak detection',
  basis: { kind: 'standard', citation: `UL 60335-2-40, 3rd ed. (2019); EPA SNAP Rule 23 use conditions (86 FR 24444); ${DETECTION_CITATION}` },
  evaluate(pairing, _context, tools) {
    const system = pairing.outdoor.spec.refrigerant;
    if (!isA2L(system)) return [];
    const findings: Finding[] = [];
    const parts = [
      { label: 'indoor coil', spec: pairing.indoorCoil?.spec },
      { label: pairing.airHandler?.spec.kind === 'furnace' ? 'furnace' : 'air handler', spec: pairing.airHandler?.spec },
    ];
    for (const { label, spec } of parts) {
      if (!spec) continue;
      const listed = a2lListingOf(spec, isA2L);
      if (listed === true) continue;
      findings.push(
        tools.finding({
          severity: 'blocker',
          title: `${capitalize(label)} is not listed for A2L refrigerants; the unit runs ${system}`,
          detail: `The ${label}${spec.model ? ` ${spec.model}` : ''} is ${listed === false ? 'marked not listed' : 'not shown as listed'} for A2L refrigerants, and the system runs ${system} (class A2L).`,
          basis: LISTING_BASIS,
          fix: `Use ${withArticle(label)} listed for ${system}${label === 'indoor coil' ? '' : ' (or the listed mitigation control kit its maker names) that runs the blower on a leak signal'}. ${SAFETY}`,
          values: { part: label, systemRefrigerant: system, a2lListed: listed ?? null },
        }),
      );
    }
    const sensor = leakSensorFinding(pairing, tools);
    if (sensor) findings.push(sensor);
    return findings;
  },
});

function leakSensorFinding(pairing: Pairing, tools: RuleTools): Finding | undefined {
  const part = a2lIndoorPart(pairing);
  if (!part || a2lListingOf(part, isA2L) !== true) return undefined;
  // The sensor may sit on the refrigerant-holding part or, for a coil in an air handler, on the air handler.
  const ahSensor = part.label === 'indoor coil' ? pairing.airHandler?.spec.leakSensor : undefined;
  if (part.leakSensor === true || ahSensor === true) return undefined;
  const system = pairing.outdoor.spec.refrigerant;
  const lfl = getRefrigerant(system)?.lflKgM3 ?? 0;
  const thresholdOz = detectionThresholdKg(lfl) / KG_PER_OZ;
  const charge = systemChargeOz(pairing.outdoor.spec, pairing.lineSet?.lengthFt);
  // At or below m1 no refrigerant detection system is required (UL 60335-2-40 GG.1).
  if (charge !== undefined && charge <= thresholdOz) return undefined;
  if (part.leakSensor === undefined) return tools.missing(`whether the ${part.label} has a refrigerant leak sensor`, 'A2L leak detection not checked');
  const values = { part: part.label, systemRefrigerant: system, leakSensor: false, chargeOz: charge === undefined ? null : round1(charge), detectionThresholdOz: round1(thresholdOz) };
  const fix = `Fit the refrigerant detection sensor the ${part.label}'s listing names and wire it so the blower runs on a leak. ${SAFETY}`;
  const m1 = `${round1(thresholdOz)} oz (m1 = ${DETECTION_THRESHOLD_M3} m³ × LFL, UL 60335-2-40 3rd ed. GG.1)`;
  if (charge === undefined) {
    return tools.finding({
      severity: 'caution',
      title: `No leak sensor, and the ${system} charge is not known`,
      detail: `The ${part.label} has no leak sensor; ${withArticle(system)} system with more than ${m1} of charge needs a refrigerant detection system, and the total charge is not known.`,
      fix,
      basis: DETECTION_BASIS,
      values,
    });
  }
  return tools.finding({
    severity: 'blocker',
    title: `No leak sensor: ${round1(charge)} oz of ${system} is above ${round1(thresholdOz)} oz`,
    detail: `The ${part.label} has no leak sensor, and the ${round1(charge)} oz ${system} charge is above ${m1}, above which a refrigerant detection system is required.`,
    fix,
    basis: DETECTION_BASIS,
    values,
  });
}

function round1(n: number): number {
  return Math.round(n * 10) / 10;
}
