import { IsNull, MoreThan } from 'typeorm';
import type { AppContext } from '../context';
import { AppError } from '../lib/errors';
import { OutboundEmailRow } from './outbound-email.entity';

/** A second send of the same report or proposal within this window asks first (409 unless `confirm`). */
export const RESEND_WINDOW_MS = 60_000;

/**
 * Refuses with 409 `recently-sent` when the same document (a record's report, or a job's proposal) went
 * out under a minute ago, so a double tap or a second device does not mail the customer twice.
 */
export async function assertNotRecentlySent(
  ctx: AppContext,
  sentFor: { systemId: number } | { jobId: number },
  what: 'report' | 'proposal',
): Promise<void> {
  const since = new Date(Date.now() - RESEND_WINDOW_MS).toISOString();
  // A proposal is the job's e-mail with no system record; a report is the record's.
  const about = 'systemId' in sentFor ? { systemId: sentFor.systemId } : { jobId: sentFor.jobId, systemId: IsNull() };
  const recent = await ctx.dataSource
    .getRepository(OutboundEmailRow)
    .findOne({ where: { ...about, status: 'sent', createdAt: MoreThan(since) }, order: { id: 'DESC' } });
  if (recent) {
    throw new AppError('recently-sent', `This ${what} was sent to ${recent.to} less than a minute ago. Send it again?`, 409, {
      sentAt: recent.createdAt,
      to: recent.to,
      confirmWith: { confirm: true },
    });
  }
}
