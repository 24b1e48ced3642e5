import type { Rule } from '../types';
import { rebateTier } from './rebate-tier';
import { regionalMinimumRule } from './regional-minimum';

/** The efficiency family, one rule per file named by its id. */
export const efficiencyRules: Rule[] = [regionalMinimumRule, rebateTier];
