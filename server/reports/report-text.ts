import type { Finding } from '../../shared/rules/types';
import type { SystemView } from '../systems/system-view';

/** Plain words for the report (no internal codes on paper). */
export const SEVERITY_WORDS: Record<Finding['severity'], string> = { blocker: 'Blocker', caution: 'Caution', info: 'Note' };
export const STATE_WORDS = { done: 'Done', 'not-applicable': 'N/A', open: 'Open' } as const;
export const READING_VERDICT_WORDS: Record<string, string> = {
  'on-target': 'On target',
  'off-target': 'Off target',
  'not-evaluated': 'Not evaluated',
};
export const PART_LABELS = {
  outdoor: 'Outdoor unit',
  indoorCoil: 'Indoor coil',
  airHandler: 'Air handler / furnace',
  metering: 'Metering device',
} as const;

export const SAFETY_NOTE =
  'Installation, brazing, pressure testing, refrigerant handling and electrical work are for licensed and certified people only. ' +
  'Follow the equipment’s installation instructions. A2L (mildly flammable) refrigerants need the A2L-specific procedures, tools and leak detection. ' +
  'Local codes and the authority having jurisdiction take precedence over anything in this report.';

/** A date-time as "2026-12-02 14:05 UTC" (ISO in, text out). */
export function dateTimeText(iso: string): string {
  return `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC`;
}

/** "12.3 °F" or an em dash for a missing number. */
export function fmt(value: number | undefined | null, unit: string, digits = 1): string {
  return value === undefined || value === null || Number.isNaN(value) ? '—' : `${value.toFixed(digits)}${unit ? ` ${unit}` : ''}`;
}

/** The regional-minimum line: the rated figures against the minimum of the site's region, and whether they meet it. */
export function regionalLine(record: SystemView): string {
  const min = record.check.computed.regionalMinimum as { regionName: string; seer2?: number; eer2?: number; hspf2?: number } | undefined;
  if (!min) return 'Regional minimum: not checked (site state or rated figures missing).';
  const parts = [
    min.seer2 !== undefined ? `SEER2 ${min.seer2}` : '',
    min.eer2 !== undefined ? `EER2 ${min.eer2}` : '',
    min.hspf2 !== undefined ? `HSPF2 ${min.hspf2}` : '',
  ].filter(Boolean);
  const findings = record.check.findings.filter((f) => f.ruleId === 'efficiency.regional-minimum');
  const below = findings.some((f) => f.severity === 'blocker');
  const unchecked = findings.some((f) => f.values.missing !== undefined);
  const outcome = below ? 'does NOT meet it' : unchecked ? 'not fully checked (figures missing)' : 'meets it';
  return `Regional minimum (${min.regionName}): ${parts.join(', ')} — this combination ${outcome}.`;
}

/** The rated-combination line, or why there is none. */
export function ratingLine(record: SystemView): string {
  const c = record.ratedCombination as { reference?: string; seer2?: number; eer2?: number; hspf2?: number; coolingBtuh?: number } | null;
  if (!c) return 'Rated combination: none found for these parts; efficiency figures are the outdoor unit’s own.';
  const figures = [
    c.coolingBtuh !== undefined ? `${c.coolingBtuh.toLocaleString('en-US')} Btuh` : '',
    c.seer2 !== undefined ? `SEER2 ${c.seer2}` : '',
    c.eer2 !== undefined ? `EER2 ${c.eer2}` : '',
    c.hspf2 !== undefined ? `HSPF2 ${c.hspf2}` : '',
  ].filter(Boolean);
  return `Rated combination${c.reference ? ` ${c.reference}` : ''}: ${figures.join(', ')}.`;
}
