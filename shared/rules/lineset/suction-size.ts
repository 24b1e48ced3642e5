import { checkLineSize, formatLineSizes } from '../../lineset/size-check';
import { formatLineSize } from '../../lineset/tube-sizes';
import { defineRule } from '../define-rule';
import { count } from '../text';

/** Suction (vapor) line OD against the sizes the outdoor unit allows (its connection size when no list is given). */
export const suctionSize = defineRule({
  id: 'lineset.suction-size',
  title: 'Suction line size',
  basis: { kind: 'common-practice', citation: "Outdoor unit installation instructions (line-set size table)" },
  evaluate(pairing, _context, tools) {
    const line = pairing.lineSet;
    if (!line) return [];
    const outdoor = pairing.outdoor.spec;
    const allowed = outdoor.allowedSuctionOdIn ?? (outdoor.suctionLineOdIn !== undefined ? [outdoor.suctionLineOdIn] : undefined);
    if (line.suctionOdIn === undefined) return [tools.missing('installed suction line size', 'suction line size not checked')];
    const installedIn = line.suctionOdIn;
    if (!allowed) return [tools.missing('suction line sizes the outdoor unit allows', 'suction line size not checked')];
    const check = checkLineSize(installedIn, allowed);
    if (check.steps === 0) return [];
    const small = installedIn < check.nearestAllowedIn;
    const blocker = check.steps > 1;
    return [
      tools.finding({
        severity: blocker ? 'blocker' : 'caution',
        title: `Suction line is ${formatLineSize(installedIn)} in; the unit allows ${formatLineSizes(allowed)}`,
        detail: `Suction line is ${formatLineSize(installedIn)} in${check.nonStandard ? ' (not a standard size)' : ''}; the outdoor unit allows ${formatLineSizes(allowed)}${check.nonStandard ? '' : ` (${count(check.steps, 'size', 'sizes')} ${small ? 'smaller' : 'larger'})`}.`,
        fix: blocker
          ? `Run a ${formatLineSize(check.nearestAllowedIn)} in suction line.`
          : small
            ? `Replace with ${formatLineSize(check.nearestAllowedIn)} in, or confirm the capacity loss the instructions give for this size ${line.lengthFt !== undefined ? `at ${line.lengthFt} ft` : 'at this length'}.`
            : `Replace with ${formatLineSize(check.nearestAllowedIn)} in, or confirm it is allowed: an oversize suction line slows the vapor and oil may not return on risers.`,
        values: { suctionOdIn: installedIn, nearestAllowedOdIn: check.nearestAllowedIn, sizeSteps: check.steps },
      }),
    ];
  },
});
