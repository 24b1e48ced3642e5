import { AIRFLOW_BLOCKER_MARGIN_CFM_PER_TON, cfmPerTon } from '../../airflow/airflow';
import { defineRule } from '../define-rule';
import { fmt, fmtTons } from '../facts';
import { withArticle } from '../text';

/**
 * Blower airflow per outdoor ton against the shop's band (settings, default 350–450 CFM/ton).
 * Outside the band: caution (a blower tap or duct change may fix it). More than
 * AIRFLOW_BLOCKER_MARGIN_CFM_PER_TON outside (default: under 300 or over 500): blocker, because
 * the coil then freezes and floods back, or blows water off the coil and leaves the house humid.
 */
export const perTon = defineRule({
  id: 'airflow.per-ton',
  title: 'Airflow per ton',
  basis: { kind: 'common-practice', citation: 'About 400 CFM per ton, 350–450 by climate (trade practice; ACCA Manual S sizes blower CFM from the sensible load)' },
  evaluate(pairing, context, tools) {
    const ah = pairing.airHandler?.spec;
    if (!ah) return [tools.missing('air handler or furnace', 'airflow per ton not checked')];
    if (ah.airflowCfm === undefined) return [tools.missing('air handler rated airflow (CFM)', 'airflow per ton not checked')];
    const tons = pairing.outdoor.spec.nominalTons;
    const perTonCfm = cfmPerTon(ah.airflowCfm, tons);
    const { cfmPerTonMin: min, cfmPerTonMax: max } = context.settings;
    if (perTonCfm >= min && perTonCfm <= max) return [];
    const low = perTonCfm < min;
    const far = low ? perTonCfm < min - AIRFLOW_BLOCKER_MARGIN_CFM_PER_TON : perTonCfm > max + AIRFLOW_BLOCKER_MARGIN_CFM_PER_TON;
    const targetLow = Math.round(min * tons);
    const targetHigh = Math.round(max * tons);
    return [
      tools.finding({
        severity: far ? 'blocker' : 'caution',
        title: `Airflow ${fmt(perTonCfm, 0)} CFM per ton is ${low ? `below ${min}` : `above ${max}`}`,
        detail: `Blower moves ${fmt(ah.airflowCfm, 0)} CFM for ${withArticle(`${fmtTons(tons)}-ton`)} outdoor unit: ${fmt(perTonCfm, 0)} CFM/ton, outside the ${min}–${max} CFM/ton band.`,
        fix: low
          ? `Aim for ${targetLow}–${targetHigh} CFM: set a higher blower speed and check duct static pressure${far ? ', or use a larger air handler' : ''}.`
          : `Aim for ${targetLow}–${targetHigh} CFM: set a lower blower speed${far ? ', or use an air handler sized for this tonnage' : ''}.`,
        values: { airflowCfm: ah.airflowCfm, outdoorTons: tons, cfmPerTon: Math.round(perTonCfm), bandMin: min, bandMax: max },
      }),
    ];
  },
});
