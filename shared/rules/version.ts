/**
 * Version of the rule set (year.month.revision). Bump it whenever a rule, threshold default or
 * registered id changes: saved system records keep the version that produced their check.
 */
export const RULES_VERSION = '2026.12.2';
