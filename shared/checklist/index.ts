export { deriveChecklist, DEFAULT_EVACUATION_TARGET_MICRONS, type ChecklistItem, type ChecklistOptions } from './derive-checklist';
export { applyChecklistStates, openChecklistItems, type ChecklistRow } from './checklist-status';
