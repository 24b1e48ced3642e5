import type { CommissioningEvaluateResult } from '@/shared/schemas/commissioning';

export type ReadingTone = 'ok' | 'caution' | 'info';

/** The verdict in plain words with its icon (never colour alone). */
export function readingVerdictWords(verdict: CommissioningEvaluateResult['verdict'] | undefined): {
  word: string;
  icon: string;
  tone: ReadingTone;
} {
  if (verdict === 'on-target') return { word: 'On target', icon: 'check-circle', tone: 'ok' };
  if (verdict === 'off-target') return { word: 'Off target', icon: 'alert', tone: 'caution' };
  if (verdict === 'not-evaluated') return { word: 'Not evaluated', icon: 'information-outline', tone: 'info' };
  return { word: 'Waiting for readings', icon: 'gauge', tone: 'info' };
}

/** "suction pressure, liquid pressure and outdoor dry bulb" */
export function listInWords(items: string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}
