import { complianceDateBasis, levels2023Apply, REGIONAL_MINIMUM_BASIS, regionalMinimum, STANDARDS_2023_FROM } from '../../efficiency';
import { efficiencyFigures } from '../../efficiency/pairing-figures';
import { defineRule } from '../define-rule';
import { capitalize, withArticle } from '../text';
import type { Finding } from '../types';

/** Rated SEER2 / EER2 / HSPF2 against the DOE 2023 minimum for the site's region, type and capacity. */
export const regionalMinimumRule = defineRule({
  id: 'efficiency.regional-minimum',
  title: 'Regional efficiency minimum',
  basis: { kind: 'regulation', citation: `${REGIONAL_MINIMUM_BASIS}; 81 FR 45387 (regional enforcement)` },
  evaluate(pairing, _context, tools) {
    const state = pairing.site?.state;
    if (!state) return [tools.missing('site state', 'regional efficiency minimum not checked')];
    const o = pairing.outdoor.spec;
    const figures = efficiencyFigures(pairing);
    const min = regionalMinimum({ state, systemType: o.systemType, coolingBtuh: figures.coolingBtuh, seer2: figures.seer2 });
    if (!min) return [tools.missing('a US state or territory code for the site', `"${state}" has no DOE region; regional minimum not checked`)];
    const dateBasis = complianceDateBasis(min.productClass, min.region);
    if (!levels2023Apply(dateBasis, pairing.installDate, o.manufactureDate)) {
      const when = dateBasis === 'installation' ? `installed ${pairing.installDate}` : `made ${o.manufactureDate}`;
      return [
        tools.finding({
          severity: 'info',
          title: `The level in force before ${STANDARDS_2023_FROM} applies`,
          detail: `The 2023 levels apply from ${STANDARDS_2023_FROM} by ${dateBasis} date here (${min.regionName}); this unit is ${when}, so the level in force before then applies.`,
          fix: '',
          values: { state, region: min.regionName, dateBasis, installDate: pairing.installDate, manufactureDate: o.manufactureDate ?? null },
        }),
      ];
    }
    if (figures.seer2 === undefined) return [tools.missing('rated SEER2', 'regional minimum not checked')];
    const shortfalls: string[] = [];
    const findings: Finding[] = [];
    if (figures.seer2 < min.seer2) shortfalls.push(`SEER2 ${figures.seer2} is below ${min.seer2}`);
    if (min.eer2 !== undefined) {
      if (figures.eer2 === undefined) findings.push(tools.missing('rated EER2', `the ${min.regionName} EER2 minimum not checked`));
      else if (figures.eer2 < min.eer2) shortfalls.push(`EER2 ${figures.eer2} is below ${min.eer2}`);
    }
    if (min.hspf2 !== undefined) {
      if (figures.hspf2 === undefined) findings.push(tools.missing('rated HSPF2', 'the heat pump HSPF2 minimum not checked'));
      else if (figures.hspf2 < min.hspf2) shortfalls.push(`HSPF2 ${figures.hspf2} is below ${min.hspf2}`);
    }
    if (shortfalls.length === 0) return findings;
    const kind = o.systemType === 'heat-pump' ? 'split heat pump' : 'split air conditioner';
    const capacityClass = figures.coolingBtuh < 45000 ? 'under 45,000 Btu/h' : '45,000 Btu/h and over';
    findings.unshift(
      tools.finding({
        severity: 'blocker',
        title: `${capitalize(shortfalls.join(" and "))}, the ${min.regionName} minimum`,
        detail: `Below the minimum in ${state} (${min.regionName} region): by ${figures.sourceText}, ${shortfalls.join(' and ')} for ${withArticle(kind)} ${capacityClass} (${REGIONAL_MINIMUM_BASIS}).`,
        fix: `Choose an outdoor unit and coil whose certified combination meets SEER2 ${min.seer2}${min.eer2 !== undefined ? `, EER2 ${min.eer2}` : ''}${min.hspf2 !== undefined ? `, HSPF2 ${min.hspf2}` : ''} or more.`,
        values: {
          state,
          region: min.regionName,
          figuresFrom: figures.source,
          coolingBtuh: figures.coolingBtuh,
          seer2: figures.seer2,
          eer2: figures.eer2 ?? null,
          hspf2: figures.hspf2 ?? null,
          minSeer2: min.seer2,
          minEer2: min.eer2 ?? null,
          minHspf2: min.hspf2 ?? null,
          dateBasis,
        },
      }),
    );
    return findings;
  },
});
