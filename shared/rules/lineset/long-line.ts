import { ELBOW_EQUIVALENT_CITATION } from '../../lineset/fittings';
import { defineRule } from '../define-rule';
import { fmt, isHeatPump, runLength } from '../facts';
import type { Finding } from '../types';

/**
 * Beyond the unit's standard line length (its own figure, else the shop default), the long-line
 * parts its instructions usually require, each a caution with its reason. Equivalent length counts
 * the elbows. Common practice (no source): the unit's own long-line instructions decide.
 */
export const longLine = defineRule({
  id: 'lineset.long-line',
  title: 'Long-line practice',
  basis: {
    kind: 'common-practice',
    citation: `Outdoor unit long-line application instructions (typical requirements); ${ELBOW_EQUIVALENT_CITATION}`,
  },
  evaluate(pairing, context, tools) {
    const line = pairing.lineSet;
    if (line?.lengthFt === undefined) return [];
    const o = pairing.outdoor.spec;
    const standardFt = o.standardLineLengthFt ?? context.settings.defaultStandardLineLengthFt;
    if (standardFt === undefined)
      return [tools.missing("outdoor unit's standard line length (long-line instructions)", 'long-line practice not checked')];
    const run = runLength(pairing);
    if (run.equivalentFt === undefined)
      return [tools.missing('suction line size (for the elbows\u2019 equivalent length)', 'long-line practice not checked')];
    const equivalentFt = run.equivalentFt;
    if (equivalentFt <= standardFt) return [];
    const length = `${fmt(equivalentFt)} ft${run.elbowsCounted ? ' equivalent' : ''}`;
    const why = `${run.words}; ${o.standardLineLengthFt !== undefined ? "the unit's" : "the shop's default"} standard length is ${fmt(standardFt)} ft`;
    const items: { part: string; reason: string; fix: string }[] = [
      {
        part: 'a crankcase heater',
        reason: 'a long line holds more charge, which migrates to the cold compressor in the off cycle and floods it at start-up',
        fix: "Fit the crankcase heater the unit's long-line instructions name (many units have one built in: check).",
      },
    ];
    if (isHeatPump(pairing)) {
      items.push({
        part: 'a liquid-line solenoid valve',
        reason: 'it stops liquid draining along the long line into the compressor during the off cycle',
        fix: 'Fit the liquid-line solenoid the long-line instructions name, wired to close when the compressor stops.',
      });
      items.push({
        part: 'a suction accumulator',
        reason: 'the extra charge floods back on defrost and reversal',
        fix: 'Fit the suction accumulator the long-line instructions name, if the unit has none built in.',
      });
    }
    if (o.startAssist !== true) {
      items.push({
        part: 'a hard-start kit',
        reason: 'pressures take longer to equalize across a long line, so the compressor may restart against a load',
        fix: "Fit the hard-start kit the unit's maker lists; de-energize and lock out the disconnect and discharge capacitors before wiring it.",
      });
    }
    return items.map((item): Finding =>
      tools.finding({
        severity: 'caution',
        title: `Long line (${length}): ${item.part} is usually required`,
        detail: `${capitalizeFirst(item.part)} is usually required beyond the standard length: ${item.reason} (${why}).`,
        fix: `${item.fix} Follow the unit's long-line instructions: they decide.`,
        values: {
          equivalentLengthFt: Math.round(equivalentFt * 10) / 10,
          lengthFt: line.lengthFt ?? null,
          elbows: line.elbows ?? null,
          standardLengthFt: standardFt,
          accessory: item.part.replace(/^an? /, ''),
        },
      }),
    );
  },
});

function capitalizeFirst(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
