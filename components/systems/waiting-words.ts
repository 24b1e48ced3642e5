import type { OutboxItem } from '@/hooks/record-outbox-queue';

/** "1 change" / "3 changes". */
export const changesText = (n: number) => `${n} change${n === 1 ? '' : 's'}`;

/** The banner over a record with changes kept on the phone, by what is happening to them. */
export function waitingBanner(count: number, state: { online: boolean; sending: boolean; held: boolean }): string {
  if (state.held) return `${changesText(count)} could not be sent as they are: choose below what to keep.`;
  if (!state.online) return `${changesText(count)} waiting for signal. They are kept on this phone and sent when it returns.`;
  return state.sending ? `Sending ${changesText(count)}…` : `${changesText(count)} waiting to be sent.`;
}

/** One waiting item in plain words ("Serial numbers and 2 checklist items", "Reading: After adjustment"). */
export function waitingItemText(item: OutboxItem): string {
  if (item.kind === 'reading') return `Reading${item.body.label ? `: ${item.body.label}` : ''} (not yet sent)`;
  if (item.kind === 'create') return `New record: ${item.title} (not yet sent)`;
  const parts: string[] = [];
  const serials = Object.keys(item.change.serials ?? {}).length;
  const checks = Object.keys(item.change.checklist ?? {}).length;
  if (serials) parts.push(serials === 1 ? 'a serial number' : `${serials} serial numbers`);
  if (checks) parts.push(checks === 1 ? 'a checklist item' : `${checks} checklist items`);
  const other = Object.keys(item.change).filter((k) => k !== 'serials' && k !== 'checklist').length;
  if (other) parts.push('record details');
  const what = parts.length ? parts.join(' and ') : 'a change';
  return `${what.charAt(0).toUpperCase()}${what.slice(1)} from revision ${item.baseRevision} (not yet sent)`;
}
