import type { CompatibleCoil } from '@/shared/schemas/coils';
import { calendarDate, money, ratings, tonRange } from '@/components/catalog/spec-format';

/** Plain words for one coil row (app-only display helpers, no React). */

const CONFIGURATION_WORDS: Record<string, string> = { upflow: 'Upflow', downflow: 'Downflow', horizontal: 'Horizontal', 'multi-position': 'Multi-position' };
const MATERIAL_WORDS: Record<string, string> = { copper: 'Copper', aluminum: 'Aluminum' };

export function configurationWord(value: string | undefined): string {
  return value ? (CONFIGURATION_WORDS[value] ?? value) : 'Not listed';
}

export function materialWord(value: string | undefined): string {
  return value ? (MATERIAL_WORDS[value] ?? value) : 'Not listed';
}

/** "1.5–3 tons" for the coil's listed range. */
export function coilTons(item: CompatibleCoil): string {
  return tonRange(item.coil.minTons, item.coil.maxTons) ?? 'Not listed';
}

/** "SEER2 15.2" of the rated combination, or words saying there is none. */
export function ratedSeer2(item: CompatibleCoil): string {
  return item.ratedCombination?.seer2 != null ? `SEER2 ${item.ratedCombination.seer2}` : 'Not rated together';
}

/** The rated figures in full for the detail view. */
export function ratedFigures(item: CompatibleCoil): string {
  if (!item.ratedCombination) return 'No rated combination with this outdoor unit';
  return ratings(item.ratedCombination) ?? 'Rated combination with no figures';
}

/** "$712.40" or "No current price". */
export function priceText(item: CompatibleCoil): string {
  return item.bestPrice ? money(item.bestPrice.priceCents) : 'No current price';
}

/** "$712.40 from Harbor Supply, since Mar 4, 2025". */
export function priceDetail(item: CompatibleCoil): string {
  const p = item.bestPrice;
  if (!p) return 'No distributor has a current price for this coil.';
  return `${money(p.priceCents)} from ${p.distributor}, since ${calendarDate(p.effectiveFrom)}`;
}

/** Regional minimum in words for the detail view; undefined when not judged. */
export function regionalWords(item: CompatibleCoil, state: string | undefined): string | undefined {
  if (item.meetsRegionalMinimum === undefined || !state) return undefined;
  return item.meetsRegionalMinimum ? `Meets the regional minimum for ${state}` : `Below the regional minimum for ${state}`;
}
