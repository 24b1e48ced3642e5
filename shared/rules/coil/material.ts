import { defineRule } from '../define-rule';

/** Info about the coil's tube material: a kept copper coil's corrosion history, or what an aluminum coil means for repairs. */
export const material = defineRule({
  id: 'coil.material',
  title: 'Coil material',
  basis: { kind: 'common-practice', citation: 'Trade experience with formicary (ant-nest) corrosion of copper evaporator tubing; aluminum coil repair practice' },
  evaluate(pairing, _context, tools) {
    const coil = pairing.indoorCoil;
    if (!coil) return [];
    const m = coil.spec.material;
    if (m === undefined) return coil.kept ? [tools.missing('coil tube material (copper or aluminum)', 'kept coil material not checked')] : [];
    if (m === 'copper' && coil.kept) {
      return [
        tools.finding({
          severity: 'info',
          title: 'Kept copper coil: check it for leaks',
          detail: 'A kept copper coil goes onto the new system: copper evaporators are prone to formicary (ant-nest) corrosion leaks, and a new outdoor unit does not renew its warranty.',
          fix: 'Leak-test the coil with nitrogen before connecting it and tell the customer its age and leak history; consider replacing it with the outdoor unit.',
          values: { material: 'copper', kept: true },
        }),
      ];
    }
    if (m === 'aluminum') {
      return [
        tools.finding({
          severity: 'info',
          title: 'Aluminum coil: braze only at the copper stubs',
          detail: 'Aluminum-tube coil: resists formicary corrosion, but its tubes cannot be repaired like copper, and its copper stubs are dissimilar-metal joints.',
          fix: 'Braze only at the copper connection stubs, keep the coil dry and clean; plan replacement rather than repair if it leaks.',
          values: { material: 'aluminum', kept: coil.kept },
        }),
      ];
    }
    return [];
  },
});
