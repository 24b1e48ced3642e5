import type { INDOOR_LOCATIONS } from '../../schemas/check';
import { defineRule } from '../define-rule';
import { LOCATION_WORDS } from '../words';

type Location = (typeof INDOOR_LOCATIONS)[number];

/**
 * Where an overflow from the drain pan damages the building (ceilings, finished floors), IRC
 * M1411.3 / IMC 307.2.3 require a secondary means: an auxiliary pan or a float switch that stops
 * the unit. A basement floor usually has a floor drain but may be finished (a note); a garage or
 * crawlspace floor takes no harm.
 */
const PROTECTION: Record<Location, 'required' | 'advised' | 'none'> = {
  attic: 'required',
  'above-ceiling': 'required',
  closet: 'required',
  'utility-room': 'required',
  basement: 'advised',
  garage: 'none',
  crawlspace: 'none',
};

export const overflowProtection = defineRule({
  id: 'condensate.overflow-protection',
  title: 'Condensate overflow protection',
  basis: { kind: 'regulation', citation: 'IRC M1411.3 / IMC 307.2.3 (secondary condensate protection where overflow damages building components)' },
  evaluate(pairing, _context, tools) {
    if (!pairing.indoorCoil && !pairing.airHandler) return [];
    const site = pairing.site;
    const location = site?.indoorLocation;
    if (!location) return [tools.missing('indoor unit location', 'condensate overflow protection not checked')];
    if (site.hasFloatSwitch === true || site.hasSecondaryPan === true) return [];
    const need = PROTECTION[location];
    if (need === 'none') return [];
    const where = LOCATION_WORDS[location];
    if (need === 'advised') {
      return [
        tools.finding({
          severity: 'info',
          title: `No float switch or secondary pan for a unit ${where}`,
          detail: `Indoor unit ${where} with no float switch or secondary pan recorded: if the space is finished, a blocked drain damages it.`,
          fix: 'Fit a float switch on the primary drain or pan; it is cheap protection.',
          values: { indoorLocation: location, hasFloatSwitch: site.hasFloatSwitch ?? null, hasSecondaryPan: site.hasSecondaryPan ?? null },
        }),
      ];
    }
    return [
      tools.finding({
        severity: 'caution',
        title: `No overflow protection for a unit ${where}`,
        detail: `Indoor unit ${where} with no float switch or secondary pan recorded: a blocked drain overflows into the building, and code requires a secondary means here.`,
        fix: 'Fit a secondary drain pan with its own drain or a float switch, or a water-level switch that shuts the unit off; follow local code.',
        values: { indoorLocation: location, hasFloatSwitch: site.hasFloatSwitch ?? null, hasSecondaryPan: site.hasSecondaryPan ?? null },
      }),
    ];
  },
});
