import { z } from 'zod';
import type { RuleSettings, TransitionRule } from '../rules/types';
import { isoDate, refrigerant } from './fields';

/**
 * Shop rule settings and refrigerant transition rules as an admin edits them
 * (GET/PUT /api/settings/rules). The same schema validates the server's PUT and the admin form.
 */

const optionalNumber = (min: number, max: number) => z.number().min(min).max(max).optional();

export const RebateTierSchema = z
  .object({
    name: z.string().trim().min(1).max(80),
    seer2: optionalNumber(8, 40),
    eer2: optionalNumber(5, 25),
    hspf2: optionalNumber(4, 15),
  })
  .refine((t) => t.seer2 !== undefined || t.eer2 !== undefined || t.hspf2 !== undefined, {
    error: 'a rebate tier needs at least one of seer2, eer2, hspf2',
    path: ['seer2'],
  });

export const RuleSettingsSchema = z
  .object({
    cfmPerTonMin: z.number().min(200).max(600),
    cfmPerTonMax: z.number().min(200).max(600),
    defaultTargetSubcoolingF: z.number().min(0).max(30),
    defaultMaxLineLengthFt: z.number().min(5).max(500),
    defaultMaxLiftFt: z.number().min(0).max(300),
    // Start-up readings (issue 9): the verdict's margins and the evacuation limits; blank keeps the default.
    superheatToleranceF: optionalNumber(0.5, 15),
    subcoolingToleranceF: optionalNumber(0.5, 10),
    evacuationTargetMicrons: z.number().int().min(50).max(5000).optional(),
    decayLimitMicrons: z.number().int().min(50).max(5000).optional(),
    decayHoldMinutes: z.number().int().min(1).max(120).optional(),
    rebateTier: RebateTierSchema.optional(),
  })
  .refine((s) => s.cfmPerTonMax > s.cfmPerTonMin, { error: 'cfmPerTonMax must be above cfmPerTonMin', path: ['cfmPerTonMax'] })
  .refine((s) => s.decayLimitMicrons === undefined || s.evacuationTargetMicrons === undefined || s.decayLimitMicrons > s.evacuationTargetMicrons, {
    error: 'the decay test limit must be above the evacuation target',
    path: ['decayLimitMicrons'],
  });

export const TransitionRuleSchema = z
  .object({
    id: z.string().trim().regex(/^[a-z0-9][a-z0-9-]{0,63}$/, { error: 'id: lowercase letters, digits and dashes' }),
    refrigerants: z.array(refrigerant).min(1),
    scope: z.enum(['new-system', 'component-replacement', 'any']),
    installFrom: isoDate,
    manufacturedBefore: isoDate.optional(),
    severity: z.enum(['blocker', 'caution']),
    citation: z.string().trim().min(1).max(300),
    note: z.string().trim().max(2000),
  })
  .strict();

export const RulesSettingsBodySchema = z.object({
  settings: RuleSettingsSchema,
  transitionRules: z
    .array(TransitionRuleSchema)
    .max(100)
    .refine((rules) => new Set(rules.map((r) => r.id)).size === rules.length, { error: 'transition rule ids must be unique' }),
});
export type RulesSettingsBody = z.infer<typeof RulesSettingsBodySchema>;

/** GET /api/settings/rules: what checks run with, plus the shared defaults for "reset". */
export interface RulesSettingsResponse {
  settings: RuleSettings;
  transitionRules: TransitionRule[];
  defaults: RuleSettings;
  updatedAt: string | null;
}
