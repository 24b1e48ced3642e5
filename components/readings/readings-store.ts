import { useSyncExternalStore } from 'react';
import { initialReadingsDraft, type ReadingsDraft } from './readings-draft';
import { initialEvacuationDraft, type EvacuationDraft } from './evacuation-draft';

/** The Readings screen's typed values, kept while the tech moves between tabs (not persisted). */
export interface ReadingsState {
  readings: ReadingsDraft;
  evacuation: EvacuationDraft;
}

let state: ReadingsState = { readings: initialReadingsDraft(), evacuation: initialEvacuationDraft() };
const listeners = new Set<() => void>();

export function updateReadings(change: (s: ReadingsState) => ReadingsState): void {
  state = change(state);
  listeners.forEach((l) => l());
}

export function resetReadings(): void {
  updateReadings(() => ({ readings: initialReadingsDraft(), evacuation: initialEvacuationDraft() }));
}

export function useReadingsState(): ReadingsState {
  return useSyncExternalStore(
    (l) => (listeners.add(l), () => listeners.delete(l)),
    () => state,
    () => state,
  );
}
