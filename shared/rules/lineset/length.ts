import { defineRule } from '../define-rule';
import { fmt } from '../facts';

/** Line length against the outdoor unit's maximum, or the shop's default when the unit gives none. */
export const length = defineRule({
  id: 'lineset.length',
  title: 'Line set length',
  basis: { kind: 'common-practice', citation: "Outdoor unit installation instructions (maximum line length); long-line practice when exceeded" },
  evaluate(pairing, context, tools) {
    const line = pairing.lineSet;
    if (!line) return [tools.missing('line set (sizes and length)', 'line set not checked')];
    if (line.lengthFt === undefined) return [tools.missing('line set length', 'line length not checked')];
    const own = pairing.outdoor.spec.maxLineLengthFt;
    const max = own ?? context.settings.defaultMaxLineLengthFt;
    if (line.lengthFt <= max) return [];
    const over = line.lengthFt - max;
    if (own !== undefined) {
      return [
        tools.finding({
          severity: 'blocker',
          title: `Line set ${fmt(line.lengthFt)} ft is over the unit's ${fmt(own)} ft maximum`,
          detail: `Line set is ${fmt(line.lengthFt)} ft; the outdoor unit allows ${fmt(own)} ft (${fmt(over)} ft over).`,
          fix: `Shorten the run to ${fmt(own)} ft or less (relocate a unit), or use equipment rated for this length.`,
          values: { lengthFt: line.lengthFt, maxLengthFt: own, limitSource: 'unit' },
        }),
      ];
    }
    return [
      tools.finding({
        severity: 'caution',
        title: `Line set ${fmt(line.lengthFt)} ft is over the shop's ${fmt(max)} ft default limit`,
        detail: `Line set is ${fmt(line.lengthFt)} ft; the outdoor unit gives no maximum, and the shop default of ${fmt(max)} ft was used (${fmt(over)} ft over).`,
        fix: "Check the unit's long-line instructions: line sizes, crankcase heater, oil traps on risers, and the charge adjustment.",
        values: { lengthFt: line.lengthFt, maxLengthFt: max, limitSource: 'default' },
      }),
    ];
  },
});
