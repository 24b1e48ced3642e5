import { CheckRequestSchema, ControlsSchema, ElectricalSchema, LineSetSchema, SiteSchema, type CheckRequest } from '@/shared/schemas/check';
import type { z } from 'zod';
import type { FieldDesc, FieldValues } from './field-types';
import { SECTIONS, SECTION_KEYS, type SectionKey } from './check-sections';
import type { CheckFormState, PickedPart } from './check-store';
import { plainError } from './field-errors';
import { nameplateFields, SPEC_SCHEMAS } from './nameplate-fields';
import { PART_INFO, PART_SLOTS, type PartSlot } from './part-slots';

const SECTION_SCHEMAS: Record<SectionKey, z.ZodType> = {
  lineSet: LineSetSchema,
  electrical: ElectricalSchema,
  indoorElectrical: ElectricalSchema,
  site: SiteSchema,
  controls: ControlsSchema,
};

export type BuiltCheck =
  | { ok: true; request: CheckRequest; picked: Partial<Record<PartSlot, PickedPart>> }
  | { ok: false; errors: Record<string, string> };

/** Turns the form into a check request validated by the shared schemas; errors keyed "outdoor.nominalTons". */
export function buildCheckRequest(form: CheckFormState): BuiltCheck {
  const errors: Record<string, string> = {};
  const body: Record<string, unknown> = { scope: form.scope };
  const picked: Partial<Record<PartSlot, PickedPart>> = {};

  for (const slot of PART_SLOTS) {
    const part = form.parts[slot];
    if (part.mode === 'catalog') {
      if (part.picked) {
        body[slot] = { id: part.picked.id, kept: part.kept };
        picked[slot] = part.picked;
      } else if (!PART_INFO[slot].optional) errors[slot] = `Pick the ${PART_INFO[slot].title.toLowerCase()} or type it from the nameplate.`;
      continue;
    }
    // Typed text goes through the same schema as a catalog CSV row (it reads "3", "yes", "R-22;R-410A").
    const result = SPEC_SCHEMAS[slot].safeParse(blankless(part.typed));
    if (result.success) body[slot] = { spec: result.data, kept: part.kept };
    else collect(errors, slot, result.error, nameplateFields(slot), part.typed);
  }

  for (const key of SECTION_KEYS) {
    const values = form.sections[key];
    if (!Object.values(values).some((v) => v !== '')) continue;
    const result = SECTION_SCHEMAS[key].safeParse(toTyped(SECTIONS[key].fields, values));
    if (result.success) body[key] = result.data;
    else collect(errors, key, result.error, SECTIONS[key].fields, values);
  }

  if (Object.keys(errors).length) return { ok: false, errors };
  const request = CheckRequestSchema.safeParse(body);
  if (!request.success) {
    collect(errors, '', request.error);
    return { ok: false, errors };
  }
  return { ok: true, request: request.data, picked };
}

/** Issues keyed by field path, in plain words beside the field (the field's own label and the text typed). */
function collect(errors: Record<string, string>, prefix: string, error: z.ZodError, fields: FieldDesc[] = [], values: FieldValues = {}) {
  for (const issue of error.issues) {
    const key = [prefix, ...issue.path.map(String)].filter(Boolean).join('.');
    const fieldKey = issue.path.length ? String(issue.path[0]) : undefined;
    const field = fields.find((f) => f.key === fieldKey);
    errors[key] ??= field ? plainError(issue, field, values[field.key]) : plainError(issue, undefined, 'given');
  }
}

const blankless = (values: FieldValues) => Object.fromEntries(Object.entries(values).filter(([, v]) => v.trim() !== ''));

/** Section text to typed values: numbers, yes/no to booleans, numeric choices to numbers. */
function toTyped(fields: FieldDesc[], values: FieldValues): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const f of fields) {
    const raw = (values[f.key] ?? '').trim();
    if (raw === '') continue;
    if (f.type === 'bool') out[f.key] = raw === 'yes';
    else if (f.type === 'number' || (f.type === 'choice' && /^\d+(\.\d+)?$/.test(raw) && f.key !== 'state')) {
      const n = Number(raw.replace(/,/g, ''));
      out[f.key] = Number.isFinite(n) ? n : raw;
    } else out[f.key] = raw;
  }
  return out;
}
