import type { Role } from '../../shared/schemas/auth';
import { recordForRole } from './record-price-visibility';
import type { RevisionView } from './system-view';

/** The JSON text of a new revision's stored columns, made once (before the write lock) for the insert. */
export interface StoredJson {
  content: string;
  check: string;
  parts: string;
  /** null when the check found no rated combination (the column is NULL). */
  ratedCombination: string | null;
  prices: string;
}

/** What a save answers: the revision it wrote, and the JSON text that revision's columns were written from. */
export interface SavedRevision {
  view: RevisionView;
  stored: StoredJson;
}

/**
 * The JSON text of a save's answer as `role` may see it. The check, parts and rated combination (and the
 * prices, for a role that sees amounts) are the text just written to the database, not serialised again:
 * the check is most of the answer. The result parses to exactly what `JSON.stringify` of the view gives.
 */
export function savedRevisionJson(role: Role, saved: SavedRevision): string {
  const shown = recordForRole(role, saved.view);
  const { check: _check, parts: _parts, ratedCombination: _combo, prices, ...rest } = shown;
  const { stored } = saved;
  const pricesJson = shown === saved.view ? stored.prices : JSON.stringify(prices);
  const head = JSON.stringify(rest);
  return `${head.slice(0, -1)},"check":${stored.check},"parts":${stored.parts},"ratedCombination":${stored.ratedCombination ?? 'null'},"prices":${pricesJson}}`;
}
