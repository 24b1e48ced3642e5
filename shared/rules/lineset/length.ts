import { defineRule } from '../define-rule';
import { fmt, runLength } from '../facts';

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
    // Elbows count toward the limit as equivalent length (Issue 12 item 12); none given: the measured length.
    const run = runLength(pairing);
    const lengthFt = run.equivalentFt ?? line.lengthFt;
    if (lengthFt <= max) return [];
    const over = lengthFt - max;
    const shown = run.elbowsCounted ? `${fmt(lengthFt)} ft equivalent (${run.words})` : `${fmt(lengthFt)} ft`;
    if (own !== undefined) {
      return [
        tools.finding({
          severity: 'blocker',
          title: `Line set ${fmt(lengthFt)} ft${run.elbowsCounted ? ' equivalent' : ''} is over the unit's ${fmt(own)} ft maximum`,
          detail: `Line set is ${shown}; the outdoor unit allows ${fmt(own)} ft (${fmt(over)} ft over).`,
          fix: `Shorten the run to ${fmt(own)} ft or less (relocate a unit), or use equipment rated for this length.`,
          values: { lengthFt: line.lengthFt, maxLengthFt: own, limitSource: 'unit' },
        }),
      ];
    }
    return [
      tools.finding({
        severity: 'caution',
        title: `Line set ${fmt(lengthFt)} ft${run.elbowsCounted ? ' equivalent' : ''} is over the shop's ${fmt(max)} ft default limit`,
        detail: `Line set is ${shown}; the outdoor unit gives no maximum, and the shop default of ${fmt(max)} ft was used (${fmt(over)} ft over).`,
        fix: "Check the unit's long-line instructions: line sizes, crankcase heater, oil traps on risers, and the charge adjustment.",
        values: { lengthFt: line.lengthFt, maxLengthFt: max, limitSource: 'default' },
      }),
    ];
  },
});
