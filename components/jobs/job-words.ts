import type { Job } from '@/shared/schemas/jobs';

/** "Open" / "Closed", as a tech reads it. */
export const JOB_STATUS_WORDS: Record<Job['status'], string> = { open: 'Open', closed: 'Closed' };

/** A date-time as the phone shows it, in the device's locale ("Dec 2, 2026, 10:58 AM"). */
export function whenText(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? '' : d.toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
}

/** One line naming a job: the customer and the site. */
export function jobLine(job: Pick<Job, 'customerName' | 'siteAddress' | 'state'>): string {
  return `${job.customerName} — ${job.siteAddress}, ${job.state}`;
}

/** "Page 2 of 5" figures from a total and a page size; at least one page. */
export function pageCount(total: number, pageSize: number): number {
  return Math.max(1, Math.ceil(total / Math.max(1, pageSize)));
}

const FIELD_WORDS: Record<string, string> = {
  customerName: 'customer',
  siteAddress: 'site address',
  state: 'state',
  contactEmail: 'contact e-mail',
  contactPhone: 'contact phone',
  notes: 'notes',
  status: 'status',
};

/** A changed job field in plain words ("contact e-mail"); an unknown one reads "details". */
export function fieldWord(field: string): string {
  return FIELD_WORDS[field] ?? 'details';
}
