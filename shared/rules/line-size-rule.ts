import { checkLineSize, formatLineSizes } from '../lineset/size-check';
import { formatLineSize } from '../lineset/tube-sizes';
import type { LineSet } from '../schemas/check';
import type { OutdoorUnitSpec } from '../schemas/equipment';
import { defineRule } from './define-rule';
import { count } from './text';

/** What differs between the liquid and the suction line size rules: the facts read and the advice. */
interface LineSizeFacts {
  id: string;
  /** "Liquid" or "Suction", as a title starts. */
  name: 'Liquid' | 'Suction';
  installed(line: LineSet): number | undefined;
  allowed(outdoor: OutdoorUnitSpec): readonly number[] | undefined;
  valuesKey: 'liquidOdIn' | 'suctionOdIn';
  /** The fix for a line one size small, and one size large (`at` is "at 35 ft" or "at this length"). */
  smallFix(nearest: string, at: string): string;
  largeFix(nearest: string): string;
}

/** A line's OD against the sizes the outdoor unit allows (its connection size when no list is given). */
export function lineSizeRule(facts: LineSizeFacts) {
  const lower = facts.name.toLowerCase();
  return defineRule({
    id: facts.id,
    title: `${facts.name} line size`,
    basis: { kind: 'common-practice', citation: 'Outdoor unit installation instructions (line-set size table)' },
    evaluate(pairing, _context, tools) {
      const line = pairing.lineSet;
      if (!line) return [];
      const allowed = facts.allowed(pairing.outdoor.spec);
      const installedIn = facts.installed(line);
      if (installedIn === undefined) return [tools.missing(`installed ${lower} line size`, `${lower} line size not checked`)];
      if (!allowed) return [tools.missing(`${lower} line sizes the outdoor unit allows`, `${lower} line size not checked`)];
      const check = checkLineSize(installedIn, allowed);
      if (check.steps === 0) return [];
      const small = installedIn < check.nearestAllowedIn;
      const blocker = check.steps > 1;
      const nearest = formatLineSize(check.nearestAllowedIn);
      return [
        tools.finding({
          severity: blocker ? 'blocker' : 'caution',
          title: `${facts.name} line is ${formatLineSize(installedIn)} in; the unit allows ${formatLineSizes(allowed)}`,
          detail: `${facts.name} line is ${formatLineSize(installedIn)} in${check.nonStandard ? ' (not a standard size)' : ''}; the outdoor unit allows ${formatLineSizes(allowed)}${check.nonStandard ? '' : ` (${count(check.steps, 'size', 'sizes')} ${small ? 'smaller' : 'larger'})`}.`,
          fix: blocker
            ? `Run a ${nearest} in ${lower} line.`
            : small
              ? facts.smallFix(nearest, line.lengthFt !== undefined ? `at ${line.lengthFt} ft` : 'at this length')
              : facts.largeFix(nearest),
          values: { [facts.valuesKey]: installedIn, nearestAllowedOdIn: check.nearestAllowedIn, sizeSteps: check.steps },
        }),
      ];
    },
  });
}
