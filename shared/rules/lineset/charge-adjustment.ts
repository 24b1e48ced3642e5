import { chargeAdjustmentSource, chargeAdjustment as computeChargeAdjustment, type ChargeAdjustmentInput } from '../../lineset/charge-adjustment';
import { defineRule } from '../define-rule';
import { fmt } from '../facts';

/** Info: ounces to add for a line longer than the factory charge covers, or remove for a shorter one. */
export const chargeAdjustment = defineRule({
  id: 'lineset.charge-adjustment',
  title: 'Charge adjustment for line length',
  basis: { kind: 'common-practice', citation: "Outdoor unit installation instructions (charge covers X ft, add Y oz/ft); liquid-line content from ASTM B280 tube bore and liquid density" },
  evaluate(pairing, _context, tools) {
    const line = pairing.lineSet;
    if (!line) return [];
    const outdoor = pairing.outdoor.spec;
    const input: ChargeAdjustmentInput = {
      refrigerant: outdoor.refrigerant,
      liquidOdIn: line.liquidOdIn,
      lengthFt: line.lengthFt,
      chargedLineLengthFt: outdoor.chargedLineLengthFt,
      unitChargePerFtOz: outdoor.chargePerFtOz,
      unitLiquidOdIn: outdoor.liquidLineOdIn,
    };
    const adj = computeChargeAdjustment(input);
    if (!adj) return [tools.missing("outdoor unit's charge per foot", 'charge adjustment not computed (non-standard liquid line size)')];
    const oz = Math.round(adj.ounces * 10) / 10;
    const covered = `factory charge covers ${fmt(adj.chargedLineLengthFt)} ft${adj.chargedLengthAssumed ? ' (assumed: the unit does not say)' : ''}`;
    const action = oz > 0 ? `add ${fmt(oz)} oz` : oz < 0 ? `remove ${fmt(-oz)} oz` : 'no adjustment';
    return [
      tools.finding({
        severity: 'info',
        detail: `Line is ${fmt(line.lengthFt)} ft; ${covered}: ${action} (${fmt(adj.ozPerFt, 2)} oz/ft, ${chargeAdjustmentSource(adj, input)}).`,
        fix: oz === 0 ? '' : `Weigh in the adjustment, then confirm the charge by ${pairing.indoorCoil?.spec.meteringType === 'piston' || pairing.metering?.spec.type === 'piston' ? 'superheat' : 'subcooling'} per the unit's instructions.`,
        values: { chargeAdjustmentOz: oz, ozPerFt: Math.round(adj.ozPerFt * 1000) / 1000, chargedLineLengthFt: adj.chargedLineLengthFt, lengthFt: line.lengthFt, method: adj.method },
      }),
    ];
  },
});
