import { chargeAdjustmentSource, chargeAdjustment as computeChargeAdjustment, type ChargeAdjustmentInput } from '../../lineset/charge-adjustment';
import { formatLineSize } from '../../lineset/tube-sizes';
import { defineRule } from '../define-rule';
import { fmt } from '../facts';
import { capitalize } from '../text';

/**
 * Info: ounces to add or remove so the charge suits the installed line (DESIGN §4): installed
 * length × oz/ft of the installed liquid size − charged length × oz/ft of the unit's own size.
 * A length alone is enough: the unit's own liquid size is then assumed, and the finding says so.
 */
export const chargeAdjustment = defineRule({
  id: 'lineset.charge-adjustment',
  title: 'Charge adjustment for line length',
  basis: { kind: 'common-practice', citation: "Outdoor unit installation instructions (charge covers X ft, add Y oz/ft); liquid-line content from ASTM B280 tube bore and liquid density" },
  evaluate(pairing, _context, tools) {
    const line = pairing.lineSet;
    if (!line) return [];
    if (line.lengthFt === undefined) return [tools.missing('line set length', 'charge adjustment not computed')];
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
    if (!adj) {
      const missing = line.liquidOdIn === undefined && outdoor.liquidLineOdIn === undefined ? "installed liquid line size (or the outdoor unit's charge per foot)" : "outdoor unit's charge per foot";
      return [tools.missing(missing, 'charge adjustment not computed')];
    }
    const oz = Math.round(adj.ounces * 10) / 10;
    const covered = `factory charge covers ${fmt(adj.chargedLineLengthFt)} ft${adj.chargedLengthAssumed ? ' (assumed: the unit does not say)' : ''}`;
    const action = oz > 0 ? `add ${fmt(oz)} oz` : oz < 0 ? `remove ${fmt(-oz)} oz` : 'no adjustment';
    const run = line.liquidOdIn !== undefined ? `${fmt(line.lengthFt)} ft of ${formatLineSize(line.liquidOdIn)} in line` : `the ${fmt(line.lengthFt)} ft line`;
    const perFt =
      adj.method === 'unit' ? `${fmt(adj.ozPerFt, 2)} oz/ft` : `${fmt(adj.ozPerFt, 2)} oz/ft installed against ${fmt(adj.unitOzPerFt, 2)} oz/ft for the unit's own size`;
    return [
      tools.finding({
        severity: 'info',
        title: oz === 0 ? `No charge adjustment for ${run}` : `${capitalize(action)} for ${run}`,
        detail: `Line is ${fmt(line.lengthFt)} ft; ${covered}: ${action} (${perFt}, ${chargeAdjustmentSource(adj, input)}).`,
        fix: oz === 0 ? '' : `Weigh in the adjustment, then confirm the charge by ${pairing.indoorCoil?.spec.meteringType === 'piston' || pairing.metering?.spec.type === 'piston' ? 'superheat' : 'subcooling'} per the unit's instructions.`,
        values: {
          chargeAdjustmentOz: oz,
          ozPerFt: Math.round(adj.ozPerFt * 1000) / 1000,
          unitOzPerFt: Math.round(adj.unitOzPerFt * 1000) / 1000,
          chargedLineLengthFt: adj.chargedLineLengthFt,
          lengthFt: line.lengthFt,
          method: adj.method,
          liquidSizeAssumed: adj.liquidSizeAssumed,
        },
      }),
    ];
  },
});
