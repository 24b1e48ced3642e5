import { useSyncExternalStore } from 'react';
import type { CheckResult } from '@/shared/rules/types';
import type { CheckRequest } from '@/shared/schemas/check';
import { readStoredCheckForm, restoreCheckForm, saveCheckFormSoon } from './check-form-storage';
import type { FieldValues } from './field-types';
import { NAMEPLATE_DEFAULTS } from './nameplate-fields';
import { PART_SLOTS, type PartSlot } from './part-slots';
import { SECTION_KEYS, type SectionKey } from './check-sections';

/** A catalog part the tech picked, with its full spec kept for an offline check. */
export interface PickedPart {
  id: number;
  label: string;
  spec: Record<string, unknown>;
}

export interface PartState {
  mode: 'catalog' | 'typed';
  picked?: PickedPart;
  typed: FieldValues;
  kept: boolean;
}

export interface CheckOutcome {
  result: CheckResult;
  offline: boolean;
}

export interface CheckFormState {
  scope: CheckRequest['scope'];
  parts: Record<PartSlot, PartState>;
  sections: Record<SectionKey, FieldValues>;
  errors: Record<string, string>;
  outcome: CheckOutcome | null;
}

export function initialCheckForm(): CheckFormState {
  return {
    scope: 'new-system',
    parts: Object.fromEntries(PART_SLOTS.map((s) => [s, { mode: 'catalog', typed: { ...NAMEPLATE_DEFAULTS[s] }, kept: false }])) as Record<PartSlot, PartState>,
    sections: Object.fromEntries(SECTION_KEYS.map((k) => [k, {}])) as Record<SectionKey, FieldValues>,
    errors: {},
    outcome: null,
  };
}

// A module store, not component state: the form survives a tab switch (the screen unmounts), and
// on the web it is kept in localStorage so it survives a reload too.
let state = restoreCheckForm(readStoredCheckForm(), initialCheckForm());
const listeners = new Set<() => void>();

export function useCheckForm(): CheckFormState {
  return useSyncExternalStore(
    (listener) => {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    () => state,
  );
}

export function updateCheckForm(change: (s: CheckFormState) => CheckFormState) {
  state = change(state);
  saveCheckFormSoon(state);
  listeners.forEach((l) => l());
}

export const setPart = (slot: PartSlot, patch: Partial<PartState>) =>
  updateCheckForm((s) => ({ ...s, parts: { ...s.parts, [slot]: { ...s.parts[slot], ...patch } } }));

export const setSectionField = (section: SectionKey, key: string, value: string) =>
  updateCheckForm((s) => ({ ...s, sections: { ...s.sections, [section]: { ...s.sections[section], [key]: value } } }));

export const setTypedField = (slot: PartSlot, key: string, value: string) =>
  updateCheckForm((s) => ({ ...s, parts: { ...s.parts, [slot]: { ...s.parts[slot], typed: { ...s.parts[slot].typed, [key]: value } } } }));
