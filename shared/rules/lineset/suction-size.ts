import { checkLineSize, formatLineSizes } from '../../lineset/size-check';
import { formatLineSize } from '../../lineset/tube-sizes';
import { defineRule } from '../define-rule';

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
    if (!allowed) return [tools.missing('suction line sizes the outdoor unit allows', 'suction line size not checked')];
    const check = checkLineSize(line.suctionOdIn, allowed);
    if (check.steps === 0) return [];
    const small = line.suctionOdIn < check.nearestAllowedIn;
    const blocker = check.steps > 1;
    return [
      tools.finding({
        severity: blocker ? 'blocker' : 'caution',
        detail: `Suction line is ${formatLineSize(line.suctionOdIn)} in${check.nonStandard ? ' (not a standard size)' : ''}; the outdoor unit allows ${formatLineSizes(allowed)}${check.nonStandard ? '' : ` (${check.steps} size${check.steps > 1 ? 's' : ''} ${small ? 'smaller' : 'larger'})`}.`,
        fix: blocker
          ? `Run a ${formatLineSize(check.nearestAllowedIn)} in suction line.`
          : small
            ? `Replace with ${formatLineSize(check.nearestAllowedIn)} in, or confirm the capacity loss the instructions give for this size at ${line.lengthFt} ft.`
            : `Replace with ${formatLineSize(check.nearestAllowedIn)} in, or confirm it is allowed: an oversize suction line slows the vapor and oil may not return on risers.`,
        values: { suctionOdIn: line.suctionOdIn, nearestAllowedOdIn: check.nearestAllowedIn, sizeSteps: check.steps },
      }),
    ];
  },
});
