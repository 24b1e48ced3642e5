import { z } from 'zod';
import type { RuleSettings, TransitionRule } from '../rules/types';
import { isoDate, refrigerant } from './fields';

/**
 * Shop rule settings and refrigerant transition rules as an admin edits them
 * (GET/PUT /api/settings/rules). The same schema validates the server's PUT and the admin form.
 * Rebate tiers are not among them: the one list is the shop settings' (PUT /api/settings/shop); GET
 * /api/settings/rules carries it in `settings.rebateTiers` so checks on the phone use it too.
 */

const optionalNumber = (min: number, max: number) => z.number().min(min).max(max).optional();

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
    defaultStandardLineLengthFt: z.number().min(5).max(500).optional(),
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
