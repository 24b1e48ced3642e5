import { z } from 'zod';
import { CheckRequestSchema } from './check';
import { CommissioningEvaluateSchema } from './commissioning';

/**
 * Matched-system records (DESIGN.md §2, §5 contract): the body of a check plus serial numbers and the
 * checklist. Every save carries the revision it started from; see server/systems for the revision rules.
 */

export const SYSTEM_STATUSES = ['draft', 'final'] as const;
export type SystemStatus = (typeof SYSTEM_STATUSES)[number];

const serial = z
  .string()
  .trim()
  .min(1)
  .max(60)
  .regex(/^[\w\-./ #]+$/, { error: 'letters, digits, spaces and - . / # only' });

export const SerialsSchema = z
  .object({ outdoor: serial.optional(), indoorCoil: serial.optional(), airHandler: serial.optional(), metering: serial.optional() })
  .strict();
export type Serials = z.infer<typeof SerialsSchema>;

export const CHECKLIST_STATES = ['open', 'done', 'not-applicable'] as const;
export type ChecklistState = (typeof CHECKLIST_STATES)[number];

/** One checklist item's state as the tech sets it; "not applicable" needs a word why. */
export const ChecklistEntrySchema = z
  .object({ state: z.enum(CHECKLIST_STATES), note: z.string().trim().max(300).optional() })
  .strict()
  .refine((e) => e.state !== 'not-applicable' || (e.note !== undefined && e.note.length > 0), {
    error: 'say why the item does not apply',
    path: ['note'],
  });
export type ChecklistEntry = z.infer<typeof ChecklistEntrySchema>;

export const ChecklistStatesSchema = z.record(
  z.string().regex(/^[a-z0-9-]{1,40}$/, { error: 'unknown checklist item' }),
  ChecklistEntrySchema,
);
export type ChecklistStates = z.infer<typeof ChecklistStatesSchema>;

/** POST /api/jobs/:id/systems: a check body, serials, an optional label and initial checklist states. */
export const SystemCreateSchema = CheckRequestSchema.extend({
  label: z.string().trim().max(80).optional(),
  serials: SerialsSchema.optional(),
  checklist: ChecklistStatesSchema.optional(),
});
export type SystemCreate = z.infer<typeof SystemCreateSchema>;

/**
 * PATCH /api/systems/:id and POST /api/systems/:id/revisions: the revision the edit started from and
 * any top-level group of the record; a group given replaces the stored one (null removes an optional
 * group), serials and checklist entries are merged by key.
 */
const nullable = <T extends z.ZodType>(s: T) => z.union([z.null(), s]).optional();
export const SystemPatchSchema = z
  .object({
    revision: z.number().int().positive(),
    label: nullable(z.string().trim().max(80)),
    scope: CheckRequestSchema.shape.scope.optional(),
    installDate: nullable(CheckRequestSchema.shape.installDate.unwrap()),
    site: nullable(CheckRequestSchema.shape.site.unwrap()),
    outdoor: CheckRequestSchema.shape.outdoor.optional(),
    indoorCoil: nullable(CheckRequestSchema.shape.indoorCoil.unwrap()),
    airHandler: nullable(CheckRequestSchema.shape.airHandler.unwrap()),
    metering: nullable(CheckRequestSchema.shape.metering.unwrap()),
    controls: nullable(CheckRequestSchema.shape.controls.unwrap()),
    lineSet: nullable(CheckRequestSchema.shape.lineSet.unwrap()),
    electrical: nullable(CheckRequestSchema.shape.electrical.unwrap()),
    indoorElectrical: nullable(CheckRequestSchema.shape.indoorElectrical.unwrap()),
    serials: SerialsSchema.partial().optional(),
    checklist: ChecklistStatesSchema.optional(),
  })
  .strict();
export type SystemPatch = z.infer<typeof SystemPatchSchema>;

/** POST /api/systems/:id/finalize: with checklist items open, a reason is required (it prints on the report). */
export const SystemFinalizeSchema = z
  .object({ revision: z.number().int().positive(), openItemsReason: z.string().trim().min(1).max(500).optional() })
  .strict();
export type SystemFinalize = z.infer<typeof SystemFinalizeSchema>;

/** Evacuation: final vacuum and the rise over a decay test with the valves closed. */
export const EvacuationSchema = z
  .object({
    finalMicrons: z.number().min(0).max(30000),
    decayMicrons: z.number().min(0).max(30000).optional(),
    holdMinutes: z.number().min(0).max(240).optional(),
  })
  .strict();

/** Standing pressure test with dry nitrogen: test pressure, hold time, the drop seen, the unit's limit and temperatures. */
export const PressureTestSchema = z
  .object({
    pressurePsig: z.number().min(0).max(800),
    holdMinutes: z.number().min(0).max(1440),
    dropPsig: z.number().min(-50).max(800).optional(),
    maxTestPsig: z.number().min(0).max(800).optional(),
    startTempF: z.number().min(-40).max(150).optional(),
    endTempF: z.number().min(-40).max(150).optional(),
    altitudeFt: z.number().min(-1500).max(15000).optional(),
  })
  .strict();

/** POST /api/systems/:id/readings: any of refrigerant-side readings, an evacuation, a nitrogen test. */
export const ReadingCreateSchema = z
  .object({
    takenAt: z.iso.datetime({ offset: true }).optional(),
    label: z.string().trim().max(80).optional(),
    charge: CommissioningEvaluateSchema.optional(),
    evacuation: EvacuationSchema.optional(),
    pressureTest: PressureTestSchema.optional(),
    notes: z.string().trim().max(1000).optional(),
  })
  .strict()
  .refine((r) => r.charge || r.evacuation || r.pressureTest, {
    error: 'enter charge readings, an evacuation or a pressure test',
    path: ['charge'],
  });
export type ReadingCreate = z.infer<typeof ReadingCreateSchema>;

/** POST /api/systems/:id/send. */
export const SendReportSchema = z
  .object({
    to: z.email({ error: 'enter a valid e-mail' }).max(254),
    confirm: z.boolean().optional(),
    paper: z.enum(['letter', 'a4']).optional(),
  })
  .strict();
export type SendReport = z.infer<typeof SendReportSchema>;

export const PAPER_SIZES = ['letter', 'a4'] as const;
