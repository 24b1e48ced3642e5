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
    const breakerAmps = e?.breakerAmps;
    if (breakerAmps === undefined) return [];
    const mca = pairing.outdoor.spec.mcaAmps;
    if (mca === undefined) return [tools.missing("outdoor unit's MCA", 'breaker minimum not checked')];
    if (breakerAmps >= mca) return [];
    const suggested = standardBreakerAtOrAbove(mca);
    return [
      tools.finding({
        severity: 'blocker',
        title: `Breaker ${breakerAmps} A is below the ${mca} A minimum circuit ampacity`,
        detail: `The ${breakerAmps} A breaker is below the outdoor unit's ${mca} A minimum circuit ampacity; it will trip under normal running load.`,
        fix: `Fit a breaker of at least ${suggested ?? mca} A and not above the MOCP, with wire rated for the MCA. ${ELECTRICAL_SAFETY}`,
        values: { breakerAmps, mcaAmps: mca, suggestedBreakerAmps: suggested ?? null },
      }),
    ];
  },
});
