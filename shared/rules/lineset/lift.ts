import { defineRule } from '../define-rule';
import { fmt } from '../facts';

/** Vertical separation (either unit above the other) against the outdoor unit's limit or the shop default. */
export const lift = defineRule({
  id: 'lineset.lift',
  title: 'Line set lift',
  basis: { kind: 'common-practice', citation: "Outdoor unit installation instructions (maximum vertical separation); liquid head costs about 0.44 psi/ft for R-410A" },
  evaluate(pairing, context, tools) {
    const line = pairing.lineSet;
    if (!line) return [];
    if (line.liftFt === undefined) return [tools.missing('vertical separation (lift) between the units', 'lift not checked')];
    const rise = Math.abs(line.liftFt);
    const own = pairing.outdoor.spec.maxLiftFt;
    const max = own ?? context.settings.defaultMaxLiftFt;
    if (rise <= max) return [];
    const values = { liftFt: line.liftFt, maxLiftFt: max, limitSource: own !== undefined ? 'unit' : 'default' };
    if (own !== undefined) {
      return [
        tools.finding({
          severity: 'blocker',
          title: `Lift ${fmt(rise)} ft is over the unit's ${fmt(own)} ft limit`,
          detail: `Units are ${fmt(rise)} ft apart vertically; the outdoor unit allows ${fmt(own)} ft.`,
          fix: `Bring the vertical separation within ${fmt(own)} ft, or use equipment rated for it.`,
          values,
        }),
      ];
    }
    return [
      tools.finding({
        severity: 'caution',
        title: `Lift ${fmt(rise)} ft is over the shop's ${fmt(max)} ft default limit`,
        detail: `Units are ${fmt(rise)} ft apart vertically; the outdoor unit gives no limit, and the shop default of ${fmt(max)} ft was used.`,
        fix: "Check the unit's instructions for lift: liquid head eats subcooling on a rise, and suction risers need oil traps.",
        values,
      }),
    ];
  },
});
