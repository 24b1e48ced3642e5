import type { SendReport } from '../../shared/schemas/systems';
import type { AppContext } from '../context';
import { JobRow } from '../jobs/job.entity';
import { AppError } from '../lib/errors';
import { renderSystemReport } from '../reports/system-report';
import { SAFETY_NOTE } from '../reports/report-text';
import { loadCurrent } from '../systems/systems.service';
import { deliverPdf } from './deliver';
import { outboxView } from './outbox.service';
import { assertNotRecentlySent } from './resend-guard';

/**
 * POST /api/systems/:id/send: renders the report and sends it over SMTP. A failure answers 502 and
 * records the attempt; nothing else changes (the record, its revision and status stay as they were).
 */
export async function sendReport(ctx: AppContext, id: number, body: SendReport, userId: number) {
  const { record } = await loadCurrent(ctx.dataSource.manager, id);
  const smtp = ctx.config.smtp;
  if (!smtp)
    throw new AppError('mail-not-configured', 'E-mail is not set up on this server: ask your office to add the SMTP settings.', 503);
  if (!body.confirm) await assertNotRecentlySent(ctx, { systemId: id }, 'report');
  const job = await ctx.dataSource.getRepository(JobRow).findOneByOrFail({ id: record.jobId });
  const report = await renderSystemReport(ctx, id, { paper: body.paper ?? 'letter' });
  const shop = ctx.config.shopName ?? 'Tandem';
  const subject = `${shop}: system record for ${job.siteAddress} (revision ${report.revision})`.slice(0, 200);
  const attempt = { systemId: id, revision: report.revision, to: body.to, subject, sentBy: userId, createdAt: new Date().toISOString() };

  const row = await deliverPdf(ctx, smtp, attempt, {
    fromName: shop,
    text: `Hello ${job.customerName},\n\nAttached is the record of the heating and cooling system installed at ${job.siteAddress}: the equipment with serial numbers, the compatibility check, the start-up readings and the checklist.\n\nSafety: ${SAFETY_NOTE}\n\n${shop}\n`,
    pdf: report.pdf,
    fileName: report.fileName,
    what: 'report',
  });
  return outboxView(row);
}
