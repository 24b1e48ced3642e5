import { cfmPerTon } from '../../airflow/airflow';
import { tapCfmAt } from '../../airflow/blower-table';
import { defineRule } from '../define-rule';
import { fmt, fmtTons } from '../facts';
import { listOf, withArticle } from '../text';
import { cabinetName } from '../words';

/**
 * Blower airflow per outdoor ton against the shop's band (settings, default 350–450 CFM/ton).
 * A catalog CFM is one rated figure (usually the highest tap): outside the band it is a caution —
 * set the blower to about the target — never a blocker, since another tap may land inside. With a
 * blower table and a measured external static pressure, the taps that land inside the band at
 * that static are named; only when no tap can is it a blocker.
 */
export const perTon = defineRule({
  id: 'airflow.per-ton',
  title: 'Airflow per ton',
  basis: { kind: 'common-practice', citation: 'About 400 CFM per ton, 350–450 by climate (trade practice; ACCA Manual S sizes blower CFM from the sensible load)' },
  evaluate(pairing, context, tools) {
    const ah = pairing.airHandler?.spec;
    if (!ah) return [tools.missing('air handler or furnace', 'airflow per ton not checked')];
    const tons = pairing.outdoor.spec.nominalTons;
    const { cfmPerTonMin: min, cfmPerTonMax: max } = context.settings;
    const lowCfm = Math.round(min * tons);
    const highCfm = Math.round(max * tons);
    const targetCfm = Math.round(((min + max) / 2) * tons);
    const cabinet = cabinetName(ah);
    const staticInWc = pairing.site?.externalStaticInWc;
    const table = ah.blowerTable;

    if (table && staticInWc !== undefined) {
      const taps = table.map((t) => ({ tap: t.tap, cfm: tapCfmAt(t, staticInWc) }));
      const known = taps.filter((t): t is { tap: string; cfm: number } => t.cfm !== undefined);
      if (known.length === 0) {
        return [tools.missing(`blower table figures at ${fmt(staticInWc, 2)} in. w.c. (the measured static is outside the table)`, 'blower taps not checked')];
      }
      const fits = known.filter((t) => t.cfm >= lowCfm && t.cfm <= highCfm);
      const values = { outdoorTons: tons, externalStaticInWc: staticInWc, bandMin: min, bandMax: max, tapsInBand: fits.map((t) => t.tap).join(';'), tapsCfm: known.map((t) => `${t.tap}=${Math.round(t.cfm)}`).join(';') };
      const tapWords = known.map((t) => `${t.tap} ${Math.round(t.cfm)} CFM`);
      if (fits.length === 0) {
        const allLow = known.every((t) => t.cfm < lowCfm);
        return [
          tools.finding({
            severity: 'blocker',
            title: `No blower tap reaches ${lowCfm}–${highCfm} CFM at ${fmt(staticInWc, 2)} in. w.c.`,
            detail: `At the measured ${fmt(staticInWc, 2)} in. w.c. the ${cabinet}'s taps give ${listOf(tapWords)}; ${withArticle(`${fmtTons(tons)}-ton`)} outdoor unit needs ${lowCfm}–${highCfm} CFM (${min}–${max} CFM per ton).`,
            fix: allLow
              ? `Lower the duct static pressure (filter, returns, duct sizes) until a tap reaches ${lowCfm} CFM, or use a larger ${cabinet}.`
              : `Use ${withArticle(cabinet)} with a tap that stays at or below ${highCfm} CFM at this static, or a larger outdoor unit.`,
            values,
          }),
        ];
      }
      return [
        tools.finding({
          severity: 'info',
          title: `Set the blower to the ${listOf(fits.map((t) => t.tap), 'or')} tap at ${fmt(staticInWc, 2)} in. w.c.`,
          detail: `At the measured ${fmt(staticInWc, 2)} in. w.c. the ${cabinet}'s taps give ${listOf(tapWords)}; ${listOf(fits.map((t) => `${t.tap} (${fmt(cfmPerTon(t.cfm, tons), 0)} CFM per ton)`))} ${fits.length === 1 ? 'lands' : 'land'} inside ${min}–${max} CFM per ton.`,
          fix: '',
          values,
        }),
      ];
    }

    if (ah.airflowCfm === undefined) return [tools.missing(`${cabinet} rated airflow (CFM) or blower table`, 'airflow per ton not checked')];
    const perTonCfm = cfmPerTon(ah.airflowCfm, tons);
    if (perTonCfm >= min && perTonCfm <= max) return [];
    const low = perTonCfm < min;
    const findings = [
      tools.finding({
        severity: 'caution',
        title: `Airflow ${fmt(perTonCfm, 0)} CFM per ton is ${low ? `below ${min}` : `above ${max}`}: set the blower to about ${targetCfm} CFM`,
        detail: `The ${cabinet}'s rated ${fmt(ah.airflowCfm, 0)} CFM for ${withArticle(`${fmtTons(tons)}-ton`)} outdoor unit is ${fmt(perTonCfm, 0)} CFM/ton, outside the ${min}–${max} CFM/ton band; a rated figure is one speed tap, so another tap may land inside.`,
        fix: low
          ? `Set the blower to about ${targetCfm} CFM (${lowCfm}–${highCfm}): a higher speed tap, and check duct static pressure; if no tap reaches it, use a larger ${cabinet}.`
          : `Set the blower to about ${targetCfm} CFM (${lowCfm}–${highCfm}): a lower speed tap.`,
        values: { airflowCfm: ah.airflowCfm, outdoorTons: tons, cfmPerTon: Math.round(perTonCfm), bandMin: min, bandMax: max, targetCfm },
      }),
    ];
    if (table) findings.push(tools.missing('measured external static pressure', 'blower taps not checked against the band'));
    return findings;
  },
});
