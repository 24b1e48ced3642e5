import { ELECTRICAL_SAFETY } from '../../electrical/safety-text';
import { defineRule } from '../define-rule';

/** Words for the protection given. */
const TYPE_WORDS = { breaker: 'a standard breaker (not HACR-marked)', 'hacr-breaker': 'an HACR breaker', fuse: 'fuses' } as const;

/** The nameplate calls for fuses, or fuses or HACR breakers: the protection given must be that kind (NEC 110.3(B), 440.22). */
export const overcurrentType = defineRule({
  id: 'electrical.overcurrent-type',
  title: 'Kind of overcurrent protection',
  basis: {
    kind: 'standard',
    citation: 'NEC 110.3(B) and 440.22: the overcurrent device the nameplate names (fuses, or fuses or HACR-type breakers)',
  },
  evaluate(pairing, _context, tools) {
    const e = pairing.electrical;
    if (!e) return [];
    const required = pairing.outdoor.spec.overcurrentRequired;
    if (required === undefined)
      return [tools.missing('whether the nameplate calls for fuses or HACR breakers', 'kind of protection not checked')];
    // A fused disconnect is the fuse protection when the kind at the panel is not given.
    const given = e.overcurrentType ?? (e.disconnect?.fused ? 'fuse' : undefined);
    if (given === undefined)
      return [tools.missing('kind of overcurrent protection (breaker, HACR breaker or fuses)', 'kind of protection not checked')];
    const ok = given === 'fuse' || (required === 'fuse-or-hacr' && given === 'hacr-breaker');
    if (ok) return [];
    const needs = required === 'fuse' ? 'fuses' : 'fuses or an HACR breaker';
    return [
      tools.finding({
        severity: 'blocker',
        title: `The nameplate calls for ${needs}; the circuit has ${TYPE_WORDS[given]}`,
        detail: `The outdoor unit's nameplate calls for ${needs} as its overcurrent protection, and the circuit is protected by ${TYPE_WORDS[given]}.`,
        fix: `Protect the circuit with ${required === 'fuse' ? 'fuses (for example a fused disconnect)' : 'fuses or an HACR-marked breaker'} of at least the MCA and not above the MOCP. ${ELECTRICAL_SAFETY}`,
        values: { overcurrentRequired: required, overcurrentType: given },
      }),
    ];
  },
});
