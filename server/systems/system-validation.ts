import { SystemCreateSchema, type SystemCreate } from '../../shared/schemas/systems';
import { parseCheckRequest } from '../checks/check-validation';
import { validationError } from '../lib/errors';

/**
 * Validates a record body: the check part first (so a part given wrongly is reported at its own
 * field paths, as POST /api/checks does), then the record's own fields.
 */
export function parseSystemCreate(body: unknown): SystemCreate {
  const result = SystemCreateSchema.safeParse(body);
  if (result.success) return result.data;
  parseCheckRequest(body);
  throw validationError(result.error);
}

type CheckPart = Omit<SystemCreate, 'label' | 'serials' | 'checklist'>;

/** The record's own fields: each is validated on its own, none depends on the check part. */
const RecordFieldsSchema = SystemCreateSchema.pick({ label: true, serials: true, checklist: true });

// Check parts that passed validation, by their JSON text (the schema is code: the same text always
// validates to the same value). Shared between saves and never changed by them.
const validCheckParts = new Map<string, CheckPart>();
const MAX_KNOWN_CHECK_PARTS = 500;

/**
 * parseSystemCreate for the merged content of an edit. The object schema validates each key apart, so
 * when the check part is one that validated before (an edit of serials, checklist or label), only the
 * record's own fields are validated again; anything else, and every failure, takes the full path.
 */
export function parseEditedContent(merged: Record<string, unknown>): SystemCreate {
  const { label, serials, checklist, ...checkPart } = merged;
  const key = JSON.stringify(checkPart);
  const known = validCheckParts.get(key);
  if (known) {
    const own = RecordFieldsSchema.safeParse({ label, serials, checklist });
    if (own.success) return { ...known, ...dropUndefined(own.data) };
  }
  const parsed = parseSystemCreate(merged);
  const { label: _label, serials: _serials, checklist: _checklist, ...validated } = parsed;
  if (validCheckParts.size >= MAX_KNOWN_CHECK_PARTS) validCheckParts.clear();
  validCheckParts.set(key, validated);
  return parsed;
}

/** The fields given (a missing optional field stays missing, as the full parse leaves it). */
function dropUndefined<T extends object>(value: T): T {
  return Object.fromEntries(Object.entries(value).filter(([, v]) => v !== undefined)) as T;
}
