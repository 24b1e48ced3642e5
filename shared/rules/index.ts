import { airflowRules } from './airflow';
import { capacityRules } from './capacity';
import { coilRules } from './coil';
import { condensateRules } from './condensate';
import { controlsRules } from './controls';
import { efficiencyRules } from './efficiency';
import { electricalRules } from './electrical';
import { fitRules } from './fit';
import { linesetRules } from './lineset';
import { meteringRules } from './metering';
import { ratingRules } from './rating';
import { refrigerantRules } from './refrigerant';
import { regulationRules } from './regulation';
import type { Rule } from './types';

/**
 * The explicit rule registry, in the order findings of equal severity are shown.
 * A test keeps it in step with DESIGN.md §3 and with the rule files on disk.
 */
export const RULES: readonly Rule[] = [
  ...refrigerantRules,
  ...regulationRules,
  ...capacityRules,
  ...airflowRules,
  ...fitRules,
  ...meteringRules,
  ...controlsRules,
  ...linesetRules,
  ...electricalRules,
  ...efficiencyRules,
  ...ratingRules,
  ...coilRules,
  ...condensateRules,
];

/** A rule by its id, or undefined. */
export function ruleById(id: string): Rule | undefined {
  return RULES.find((r) => r.id === id);
}
