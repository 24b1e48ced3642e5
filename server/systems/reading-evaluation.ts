import type { RuleSettings } from '../../shared/rules/types';
import type { ReadingCreate } from '../../shared/schemas/systems';
import type { ReadingResults } from './system-types';

/** The one place readings meet the shared commissioning computations (shared/commissioning). */
export function evaluateReading(body: ReadingCreate, settings: RuleSettings): ReadingResults {
  void settings;
  void body;
  throw new Error('pending shared/commissioning');
}
