import { RuleSettingsRow } from './rule-settings.entity';
import { TransitionRuleRow } from './transition-rule.entity';

/** The settings module's entities, for server/db/entities.ts. */
export const settingsEntities = [RuleSettingsRow, TransitionRuleRow];
