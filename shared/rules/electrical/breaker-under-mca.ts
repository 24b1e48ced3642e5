import { standardBreakerAtOrAbove } from '../../electrical';
import { defineRule } from '../define-rule';
import { ELECTRICAL_SAFETY } from '../../electrical/safety-text';

/** A breaker below the MCA trips under normal running load (trade practice). */
export const breakerUnderMca = defineRule({
  id: 'electrical.breaker-under-mca',
  title: 'Breaker below the minimum circuit ampacity',
  basis: { kind: 'common-practice', citation: 'Trade practice: size the breaker between the nameplate MCA and MOCP (NEC Article 440)' },
  evaluate(pairing, _context, tools) {
    const e = pairing.electrical;
    if (!e) return [];
    const mca = pairing.outdoor.spec.mcaAmps;
    if (mca === undefined) return [tools.missing("outdoor unit's MCA", 'breaker minimum not checked')];
    if (e.breakerAmps >= mca) return [];
    const suggested = standardBreakerAtOrAbove(mca);
    return [
      tools.finding({
        severity: 'blocker',
        detail: `The ${e.breakerAmps} A breaker is below the outdoor unit's ${mca} A minimum circuit ampacity; it will trip under normal running load.`,
        fix: `Fit a breaker of at least ${suggested ?? mca} A and not above the MOCP, with wire rated for the MCA. ${ELECTRICAL_SAFETY}`,
        values: { breakerAmps: e.breakerAmps, mcaAmps: mca, suggestedBreakerAmps: suggested ?? null },
      }),
    ];
  },
});
