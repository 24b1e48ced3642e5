import { defineRule } from '../define-rule';
import { isHeatPump } from '../facts';

/** A heat pump's liquid line reverses in heating: its drier must be bi-flow. Any opened system gets a new drier. */
export const filterDrier = defineRule({
  id: 'lineset.filter-drier',
  title: 'Liquid-line filter-drier',
  basis: { kind: 'common-practice', citation: 'Trade practice and outdoor unit instructions: replace the liquid-line drier whenever the system is opened; bi-flow driers on heat pumps' },
  evaluate(pairing, _context, tools) {
    const line = pairing.lineSet;
    if (!line) return [];
    if (line.filterDrier === undefined) return [tools.missing('liquid-line filter-drier type', 'filter-drier not checked')];
    if (line.filterDrier === 'one-way' && isHeatPump(pairing)) {
      return [
        tools.finding({
          severity: 'blocker',
          title: 'One-way filter-drier on a heat pump',
          detail: 'Heat pump with a one-way filter-drier: in heating the flow reverses through it, which can wash trapped debris and moisture back out of the core toward the metering device.',
          fix: 'Replace it with a bi-flow filter-drier sized for the system.',
          values: { filterDrier: 'one-way', systemType: 'heat-pump' },
        }),
      ];
    }
    if (line.filterDrier === 'none') {
      return [
        tools.finding({
          severity: 'caution',
          title: 'No filter-drier on an opened system',
          detail: `No filter-drier on a system that is being opened (${pairing.scope === 'new-system' ? 'new system' : 'component replacement'}): moisture and debris stay in the circuit.`,
          fix: `Fit a new ${isHeatPump(pairing) ? 'bi-flow' : 'liquid-line'} filter-drier before evacuating; braze with a nitrogen purge and keep the drier cool.`,
          values: { filterDrier: 'none', scope: pairing.scope },
        }),
      ];
    }
    return [];
  },
});
