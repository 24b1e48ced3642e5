import type { OutdoorUnitSpec } from '../../schemas/equipment';
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
    const own = liftLimit(pairing.outdoor.spec, line.outdoorAbove ?? (line.liftFt > 0 ? true : line.liftFt < 0 ? false : undefined));
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

/**
 * The unit's lift limit for the direction of the rise: its outdoor-above or outdoor-below figure when
 * it gives two, else its single figure; with the direction unknown, the smaller of those given.
 */
function liftLimit(o: OutdoorUnitSpec, outdoorAbove: boolean | undefined): number | undefined {
  const above = o.maxLiftOutdoorAboveFt ?? o.maxLiftFt;
  const below = o.maxLiftOutdoorBelowFt ?? o.maxLiftFt;
  if (outdoorAbove === true) return above;
  if (outdoorAbove === false) return below;
  const given = [above, below].filter((x): x is number => x !== undefined);
  return given.length ? Math.min(...given) : undefined;
}
