import { defineRule } from '../define-rule';
import { ELECTRICAL_SAFETY } from '../../electrical/safety-text';

/** Breaker above the nameplate maximum overcurrent protection (NEC 110.3(B), 440.22(C)). */
export const breakerOverMocp = defineRule({
  id: 'electrical.breaker-over-mocp',
  title: 'Breaker above the maximum overcurrent protection',
  basis: { kind: 'standard', citation: 'NEC 440.22(C) and 110.3(B): not above the nameplate maximum overcurrent protection' },
  evaluate(pairing, _context, tools) {
    const e = pairing.electrical;
    if (!e) return [tools.missing('breaker size and wire', 'electrical not checked')];
    const breakerAmps = e.breakerAmps;
    if (breakerAmps === undefined) return [tools.missing('breaker size', 'breaker not checked against the nameplate')];
    const mocp = pairing.outdoor.spec.mocpAmps;
    if (mocp === undefined) return [tools.missing("outdoor unit's MOCP (max breaker)", 'breaker maximum not checked')];
    if (breakerAmps <= mocp) return [];
    return [
      tools.finding({
        severity: 'blocker',
        title: `Breaker ${breakerAmps} A is above the ${mocp} A maximum`,
        detail: `The ${breakerAmps} A breaker is above the outdoor unit's ${mocp} A maximum overcurrent protection.`,
        fix: `Fit a breaker (HACR type, or fuses if the nameplate says fuse) of ${mocp} A or less and at least the MCA. ${ELECTRICAL_SAFETY}`,
        values: { breakerAmps, mocpAmps: mocp },
      }),
    ];
  },
});
