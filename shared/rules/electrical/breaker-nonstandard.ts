import { isStandardBreaker, standardBreakerAtOrAbove, standardBreakerAtOrBelow, standardBreakersBetween } from '../../electrical';
import { defineRule } from '../define-rule';
import { ELECTRICAL_SAFETY } from '../../electrical/safety-text';

/** A breaker that is not a NEC 240.6(A) standard rating: a caution listing the standard sizes in range. */
export const breakerNonstandard = defineRule({
  id: 'electrical.breaker-nonstandard',
  title: 'Breaker not a standard rating',
  basis: { kind: 'standard', citation: 'NEC 240.6(A) standard ampere ratings' },
  evaluate(pairing, _context, tools) {
    const e = pairing.electrical;
    const breakerAmps = e?.breakerAmps;
    if (breakerAmps === undefined || isStandardBreaker(breakerAmps)) return [];
    const { mcaAmps, mocpAmps } = pairing.outdoor.spec;
    let sizes: number[];
    let range: string;
    if (mcaAmps !== undefined && mocpAmps !== undefined) {
      sizes = standardBreakersBetween(mcaAmps, mocpAmps);
      range = `between the ${mcaAmps} A MCA and the ${mocpAmps} A MOCP`;
    } else {
      sizes = [standardBreakerAtOrBelow(breakerAmps), standardBreakerAtOrAbove(breakerAmps)].filter((a): a is number => a !== undefined);
      range = 'nearest to it (MCA/MOCP not given)';
    }
    const list = sizes.length > 0 ? sizes.map((a) => `${a} A`).join(', ') : 'none';
    return [
      tools.finding({
        severity: 'caution',
        title: `Breaker ${breakerAmps} A is not a standard size`,
        detail: `${breakerAmps} A is not a standard breaker rating under NEC 240.6(A); standard sizes ${range}: ${list}.`,
        fix: `Check the breaker's marking; if it is a misread, enter the marked size, else fit a standard size ${range}. ${ELECTRICAL_SAFETY}`,
        values: { breakerAmps, standardSizes: sizes.join(';'), mcaAmps: mcaAmps ?? null, mocpAmps: mocpAmps ?? null },
      }),
    ];
  },
});
