import { SCOPES } from '@/shared/schemas/check';
import type { CheckFormState, CheckOutcome, PartState, PickedPart } from './check-store';
import type { FieldValues } from './field-types';

/** Where the form is kept on the web. Bump the version when CheckFormState changes shape. */
export const CHECK_FORM_KEY = 'tandem.check-form.v1';

type Json = Record<string, unknown>;
const isObject = (v: unknown): v is Json => typeof v === 'object' && v !== null && !Array.isArray(v);

/** The form as stored: inputs and the last answer; error marks are recomputed at the next tap. */
export function serializeCheckForm(form: CheckFormState): string {
  const { scope, parts, sections, outcome } = form;
  return JSON.stringify({ scope, parts, sections, outcome });
}

function fieldValues(v: unknown): FieldValues | undefined {
  if (!isObject(v)) return undefined;
  return Object.values(v).every((x) => typeof x === 'string') ? (v as FieldValues) : undefined;
}

function picked(v: unknown): PickedPart | undefined {
  if (!isObject(v)) return undefined;
  return typeof v.id === 'number' && typeof v.label === 'string' && isObject(v.spec) ? { id: v.id, label: v.label, spec: v.spec } : undefined;
}

function part(v: unknown, fallback: PartState): PartState {
  if (!isObject(v) || (v.mode !== 'catalog' && v.mode !== 'typed')) return fallback;
  return { mode: v.mode, picked: picked(v.picked), typed: fieldValues(v.typed) ?? fallback.typed, kept: v.kept === true };
}

function outcome(v: unknown): CheckOutcome | null {
  if (!isObject(v) || !isObject(v.result) || !Array.isArray(v.result.findings) || typeof v.result.verdict !== 'string') return null;
  return { result: v.result as unknown as CheckOutcome['result'], offline: v.offline === true };
}

/**
 * The stored form merged over a fresh one, field group by field group: anything missing or of the
 * wrong shape (an older build, a hand-edited value) falls back to the fresh form's value.
 */
export function restoreCheckForm(raw: string | null, fresh: CheckFormState): CheckFormState {
  if (!raw) return fresh;
  let saved: unknown;
  try {
    saved = JSON.parse(raw);
  } catch {
    return fresh;
  }
  if (!isObject(saved)) return fresh;
  const savedParts = isObject(saved.parts) ? saved.parts : {};
  const savedSections = isObject(saved.sections) ? saved.sections : {};
  return {
    scope: (SCOPES as readonly unknown[]).includes(saved.scope) ? (saved.scope as CheckFormState['scope']) : fresh.scope,
    parts: Object.fromEntries(Object.entries(fresh.parts).map(([slot, p]) => [slot, part(savedParts[slot], p)])) as CheckFormState['parts'],
    sections: Object.fromEntries(Object.entries(fresh.sections).map(([key, s]) => [key, fieldValues(savedSections[key]) ?? s])) as CheckFormState['sections'],
    errors: {},
    outcome: outcome(saved.outcome),
  };
}

function storage(): Storage | undefined {
  try {
    return typeof window !== 'undefined' ? window.localStorage : undefined;
  } catch {
    return undefined;
  }
}

/** The stored form's text, or null (native, private mode, nothing kept yet). */
export function readStoredCheckForm(): string | null {
  try {
    return storage()?.getItem(CHECK_FORM_KEY) ?? null;
  } catch {
    return null;
  }
}

/** Keeps the form so a reload (or a browser that drops the tab) brings it back. */
export function writeStoredCheckForm(form: CheckFormState): void {
  try {
    storage()?.setItem(CHECK_FORM_KEY, serializeCheckForm(form));
  } catch {
    // Storage full or refused: the form still lives until the tab closes.
  }
}

/** Typing and tapping write the copy at most this often (ms); leaving the page writes it at once. */
const SAVE_DELAY_MS = 300;
let latest: CheckFormState | null = null;
let timer: ReturnType<typeof setTimeout> | null = null;

function flush() {
  if (timer) clearTimeout(timer);
  timer = null;
  if (latest) writeStoredCheckForm(latest);
  latest = null;
}

// Phones may kill a hidden tab without a pagehide: leaving the screen writes the copy too.
if (typeof window !== 'undefined' && typeof window.addEventListener === 'function') {
  window.addEventListener('pagehide', flush);
  document.addEventListener('visibilitychange', () => document.visibilityState === 'hidden' && flush());
}

/** Keeps the form soon, off the tap's path: serializing an answer costs time the verdict should not wait for. */
export function saveCheckFormSoon(form: CheckFormState): void {
  latest = form;
  if (!timer) timer = setTimeout(flush, SAVE_DELAY_MS);
}
