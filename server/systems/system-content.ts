import type { SystemPatch } from '../../shared/schemas/systems';
import type { RecordContent } from './system-types';

/**
 * The content of the next revision: a group given in the patch replaces the stored one (null removes
 * it), serials and checklist entries merge by key. The result is validated again by the caller.
 */
export function mergeContent(current: RecordContent, patch: SystemPatch): Record<string, unknown> {
  const { revision: _revision, serials, checklist, ...groups } = patch;
  const next: Record<string, unknown> = { ...current };
  for (const [key, value] of Object.entries(groups)) {
    if (value === undefined) continue;
    if (value === null) delete next[key];
    else next[key] = value;
  }
  if (serials) {
    const merged: Record<string, string> = { ...(current.serials ?? {}) };
    for (const [slot, value] of Object.entries(serials)) if (value !== undefined) merged[slot] = value;
    next.serials = merged;
  }
  if (checklist) next.checklist = { ...(current.checklist ?? {}), ...checklist };
  return next;
}
