import type { ChecklistState, ChecklistStates } from '../schemas/systems';
import type { ChecklistItem } from './derive-checklist';

/** A checklist item with the state the tech gave it (open until set). */
export interface ChecklistRow extends ChecklistItem {
  state: ChecklistState;
  note?: string;
}

/** Joins derived items with saved states; states of items the facts no longer call for are dropped. */
export function applyChecklistStates(items: ChecklistItem[], states: ChecklistStates | undefined): ChecklistRow[] {
  return items.map((item) => {
    const saved = states?.[item.id];
    return saved ? { ...item, state: saved.state, ...(saved.note ? { note: saved.note } : {}) } : { ...item, state: 'open' };
  });
}

/** The ids of items still open (count of items, no units). */
export function openChecklistItems(rows: ChecklistRow[]): string[] {
  return rows.filter((r) => r.state === 'open').map((r) => r.id);
}
