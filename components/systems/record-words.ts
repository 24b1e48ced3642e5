import type { CheckResult } from '@/shared/rules/types';
import type { ChecklistState, SystemStatus } from '@/shared/schemas/systems';
import { verdictWords } from '@/components/check/verdict-words';

export const RECORD_STATUS_WORDS: Record<SystemStatus, string> = { draft: 'Draft', final: 'Final' };

export const CHECKLIST_STATE_WORDS: Record<ChecklistState, string> = { open: 'Open', done: 'Done', 'not-applicable': 'Not applicable' };

/** The verdict of a stored check in the banner's words ("Compatible with cautions"). */
export function verdictText(check: Pick<CheckResult, 'verdict' | 'findings'>): string {
  return verdictWords(check).word;
}

const VERDICT_WORDS: Record<string, string> = { compatible: 'Compatible', 'compatible-with-cautions': 'Compatible with cautions', incompatible: 'Not compatible' };

/** A stored verdict code in plain words (a list shows no findings, so no "Not allowed" here). */
export function verdictCodeText(verdict: string): string {
  return VERDICT_WORDS[verdict] ?? 'Unknown';
}

export const SERIAL_SLOTS = [
  { slot: 'outdoor', label: 'Outdoor unit' },
  { slot: 'indoorCoil', label: 'Indoor coil' },
  { slot: 'airHandler', label: 'Air handler or furnace' },
  { slot: 'metering', label: 'Metering device' },
] as const;
export type SerialSlot = (typeof SERIAL_SLOTS)[number]['slot'];
