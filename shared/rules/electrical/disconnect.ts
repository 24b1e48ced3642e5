import { ELECTRICAL_SAFETY } from '../../electrical/safety-text';
import { defineRule } from '../define-rule';
import type { Finding } from '../types';

/**
 * A disconnecting means within sight of the outdoor unit (NEC 440.14), rated for its load. The load
 * used is the nameplate MCA: NEC 440.12(A) asks for at least 115 % of the rated-load current, and the
 * MCA (125 % of it plus the fan) is at or above that, so it is the conservative figure on the nameplate.
 */
export const disconnect = defineRule({
  id: 'electrical.disconnect',
  title: 'Disconnect at the outdoor unit',
  basis: { kind: 'standard', citation: 'NEC 440.14 (disconnecting means within sight of the unit); NEC 440.12(A) (its ampere rating)' },
  evaluate(pairing, _context, tools) {
    const e = pairing.electrical;
    if (!e) return [];
    const d = e.disconnect;
    if (!d) return [tools.missing('disconnect at the outdoor unit (within sight, rating)', 'disconnect not checked')];
    const findings: Finding[] = [];
    if (!d.withinSight) {
      findings.push(
        tools.finding({
          severity: 'blocker',
          title: 'No disconnect within sight of the outdoor unit',
          detail:
            'The disconnecting means is not within sight of the outdoor unit, so a technician working on it cannot see that it stays off.',
          fix: `Fit a disconnect within sight of the outdoor unit and readily accessible, not behind the unit's access panels. ${ELECTRICAL_SAFETY}`,
          basis: { kind: 'standard', citation: 'NEC 440.14 (within sight of and readily accessible from the unit)' },
          values: { withinSight: false },
        }),
      );
    }
    const mca = pairing.outdoor.spec.mcaAmps;
    if (d.ratingAmps === undefined) findings.push(tools.missing('disconnect rating (A)', 'disconnect rating not checked'));
    else if (mca === undefined) findings.push(tools.missing("outdoor unit's MCA", 'disconnect rating not checked'));
    else if (d.ratingAmps < mca) {
      findings.push(
        tools.finding({
          severity: 'blocker',
          title: `Disconnect rated ${d.ratingAmps} A is below the unit's ${mca} A load`,
          detail: `The ${d.ratingAmps} A disconnect is below the outdoor unit's ${mca} A minimum circuit ampacity, used here as its load.`,
          fix: `Fit a disconnect rated at least ${mca} A (an air-conditioning disconnect of the next size up). ${ELECTRICAL_SAFETY}`,
          basis: {
            kind: 'standard',
            citation: 'NEC 440.12(A) (at least 115 % of the rated-load current; the nameplate MCA used as the conservative figure)',
          },
          values: { disconnectAmps: d.ratingAmps, mcaAmps: mca },
        }),
      );
    }
    return findings;
  },
});
