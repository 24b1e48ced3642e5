import { defineRule } from '../define-rule';
import { describeMetering, meteringInUse } from '../facts';
import { capitalize } from '../text';

/** Pistons are marked in thousandths of an inch: sizes that agree to 0.0005 in are the same piston. */
const PISTON_MATCH_TOLERANCE_IN = 0.0005;

/** A piston whose bore differs from the one the outdoor unit ships for the indoor coil. */
export const pistonSize = defineRule({
  id: 'metering.piston-size',
  title: 'Piston size',
  basis: { kind: 'common-practice', citation: "Outdoor unit installation instructions (piston shipped with the unit for the indoor coil)" },
  evaluate(pairing, _context, tools) {
    const m = meteringInUse(pairing);
    if (!m || m.type !== 'piston') return [];
    const outdoor = pairing.outdoor.spec;
    // A unit that needs a TXV is already a blocker in metering.type-required; sizing its piston is moot.
    if (outdoor.meteringRequired === 'txv') return [];
    if (outdoor.pistonSizeIn === undefined) return [tools.missing('piston size the outdoor unit specifies', 'piston size not checked')];
    if (m.pistonSizeIn === undefined) return [tools.missing('size of the piston installed', 'piston size not checked')];
    if (Math.abs(m.pistonSizeIn - outdoor.pistonSizeIn) <= PISTON_MATCH_TOLERANCE_IN) return [];
    const bigger = m.pistonSizeIn > outdoor.pistonSizeIn;
    return [
      tools.finding({
        severity: 'caution',
        title: `Piston is ${m.pistonSizeIn.toFixed(3)} in; the unit specifies ${outdoor.pistonSizeIn.toFixed(3)} in`,
        detail: `${capitalize(describeMetering(m))} is ${m.pistonSizeIn.toFixed(3)} in; the outdoor unit specifies ${outdoor.pistonSizeIn.toFixed(3)} in (${bigger ? 'overfeeds: floodback risk' : 'starves the coil: low capacity, high superheat'}).`,
        fix: `Swap in the ${outdoor.pistonSizeIn.toFixed(3)} in piston shipped with the outdoor unit (new seals), then charge by superheat.`,
        values: { pistonInstalledIn: m.pistonSizeIn, pistonSpecifiedIn: outdoor.pistonSizeIn },
      }),
    ];
  },
});
