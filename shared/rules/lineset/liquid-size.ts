import { checkLineSize, formatLineSizes } from '../../lineset/size-check';
import { formatLineSize } from '../../lineset/tube-sizes';
import { defineRule } from '../define-rule';
import { count } from '../text';

/** Liquid line OD against the sizes the outdoor unit allows (its connection size when no list is given). */
export const liquidSize = defineRule({
  id: 'lineset.liquid-size',
  title: 'Liquid line size',
  basis: { kind: 'common-practice', citation: "Outdoor unit installation instructions (line-set size table)" },
  evaluate(pairing, _context, tools) {
    const line = pairing.lineSet;
    if (!line) return [];
    const outdoor = pairing.outdoor.spec;
    const allowed = outdoor.allowedLiquidOdIn ?? (outdoor.liquidLineOdIn !== undefined ? [outdoor.liquidLineOdIn] : undefined);
    if (line.liquidOdIn === undefined) return [tools.missing('installed liquid line size', 'liquid line size not checked')];
    const installedIn = line.liquidOdIn;
    if (!allowed) return [tools.missing('liquid line sizes the outdoor unit allows', 'liquid line size not checked')];
    const check = checkLineSize(installedIn, allowed);
    if (check.steps === 0) return [];
    const small = installedIn < check.nearestAllowedIn;
    const blocker = check.steps > 1;
    return [
      tools.finding({
        severity: blocker ? 'blocker' : 'caution',
        title: `Liquid line is ${formatLineSize(installedIn)} in; the unit allows ${formatLineSizes(allowed)}`,
        detail: `Liquid line is ${formatLineSize(installedIn)} in${check.nonStandard ? ' (not a standard size)' : ''}; the outdoor unit allows ${formatLineSizes(allowed)}${check.nonStandard ? '' : ` (${count(check.steps, 'size', 'sizes')} ${small ? 'smaller' : 'larger'})`}.`,
        fix: blocker
          ? `Run a ${formatLineSize(check.nearestAllowedIn)} in liquid line.`
          : small
            ? `Replace with ${formatLineSize(check.nearestAllowedIn)} in, or confirm in the instructions that this size is allowed ${line.lengthFt !== undefined ? `at ${line.lengthFt} ft` : 'at this length'} (a small liquid line loses subcooling to pressure drop).`
            : `Replace with ${formatLineSize(check.nearestAllowedIn)} in, or confirm it is allowed; a larger liquid line holds more charge, so adjust the charge for it.`,
        values: { liquidOdIn: installedIn, nearestAllowedOdIn: check.nearestAllowedIn, sizeSteps: check.steps },
      }),
    ];
  },
});
