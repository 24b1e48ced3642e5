import { defineRule } from '../define-rule';
import { isA2lRefrigerant } from '../facts';
import { withArticle } from '../text';

/** Field joints in the occupied space on an A2L system (UL 60335-2-40 3rd ed., Annex GG; its clause on field-made joints). */
const A2L_JOINT_BASIS = { kind: 'standard' as const, citation: 'UL 60335-2-40, 3rd ed. (2019), Annex GG: field-made refrigerant joints in the occupied space for A2L refrigerants' };
/** Burnout clean-up: trade practice, no standard clause. */
const BURNOUT_BASIS = { kind: 'common-practice' as const, citation: 'Compressor burnout clean-up practice: acid test, flush or replace the lines, suction-line drier' };

/**
 * Two conditions of the line set itself, each finding citing its own basis:
 * - a reused line set from a system with a compressor burnout holds acid and burnt oil: caution
 *   (it can be flushed and acid-tested, or replaced);
 * - field flare joints indoors on an A2L system: blocker. UL 60335-2-40 (3rd ed.) limits field
 *   refrigerant joints in the occupied space for A2L systems to brazed/welded joints or listed
 *   permanent mechanical connectors (ISO 14903), and the 2024 model mechanical codes follow it —
 *   clause numbers from memory, so the fix defers to the installation instructions and local code.
 */
export const reuseCondition = defineRule({
  id: 'lineset.reuse-condition',
  title: 'Line set condition',
  // The joint clause number is from memory; the citation names the annex only, and the fix defers to the instructions.
  basis: { kind: 'standard', citation: 'UL 60335-2-40, 3rd ed. (2019), Annex GG (field joints for A2L refrigerants); compressor burnout clean-up practice' },
  evaluate(pairing, _context, tools) {
    const line = pairing.lineSet;
    if (!line) return [];
    const findings = [];
    const refrigerant = pairing.outdoor.spec.refrigerant;
    if (line.indoorFlareJoints === true && isA2lRefrigerant(refrigerant)) {
      findings.push(
        tools.finding({
          severity: 'blocker',
          title: `Flare joints indoors on ${withArticle(refrigerant)} system`,
          basis: A2L_JOINT_BASIS,
          detail: `Flare joints indoors on ${withArticle(refrigerant)} (A2L, mildly flammable) system: a flare can leak into the occupied space, and the A2L safety standard does not accept field flares there.`,
          fix: 'Replace the indoor flare joints with brazed joints (nitrogen purge) or listed permanent mechanical connectors as the equipment instructions allow; follow local code and the authority having jurisdiction.',
          values: { indoorFlareJoints: true, refrigerant },
        }),
      );
    }
    if (line.reused === true) {
      if (line.burnoutHistory === undefined) {
        findings.push(tools.missing('whether the old system had a compressor burnout', 'reused line set condition not checked'));
      } else if (line.burnoutHistory) {
        findings.push(
          tools.finding({
            severity: 'caution',
            title: 'Reused line set from a system with a compressor burnout',
            basis: BURNOUT_BASIS,
            detail: 'Reused line set from a system with a compressor burnout: acid and burnt oil in the lines will attack the new compressor.',
            fix: 'Replace the line set, or flush it with an approved flush, blow it dry with nitrogen, fit a suction-line drier and acid-test the oil after start-up.',
            values: { reused: true, burnoutHistory: true },
          }),
        );
      }
    }
    return findings;
  },
});
