import type { ProposalSend, ProposalSendResult } from '../../shared/schemas/options';
import type { AppContext } from '../context';
import { AppError } from '../lib/errors';
import { renderProposal } from '../reports/proposal-report';
import { SAFETY_NOTE } from '../reports/report-text';
import { deliverPdf } from './deliver';
import { assertNotRecentlySent } from './resend-guard';

/**
 * POST /api/jobs/:id/proposal/send: renders the proposal and sends it over SMTP (a second send within a
 * minute asks first: 409 `recently-sent` unless `confirm`). A failure answers 502 and
 * the outbox records the failed attempt; nothing else changes.
 */
export async function sendProposal(ctx: AppContext, jobId: number, body: ProposalSend, userId: number): Promise<ProposalSendResult> {
  const smtp = ctx.config.smtp;
  if (!smtp)
    throw new AppError('mail-not-configured', 'E-mail is not set up on this server: ask your office to add the SMTP settings.', 503);
  if (!body.confirm) await assertNotRecentlySent(ctx, { jobId }, 'proposal');
  const { pdf, fileName, job } = await renderProposal(ctx, jobId, { paper: body.paper ?? 'letter', energy: body.energy ?? {} });
  const shop = ctx.config.shopName ?? 'Tandem';
  const subject = `${shop}: your heating and cooling options for ${job.siteAddress}`.slice(0, 200);
  const attempt = { systemId: null, revision: null, jobId, to: body.to, subject, sentBy: userId, createdAt: new Date().toISOString() };
  const row = await deliverPdf(ctx, smtp, attempt, {
    fromName: shop,
    text: `Hello ${job.customerName},\n\nAttached are the options we discussed for ${job.siteAddress}, with prices, the compatibility check, rated efficiency and estimated energy savings.\n\nSafety: ${SAFETY_NOTE}\n\n${shop}\n`,
    pdf,
    fileName,
    what: 'proposal',
  });
  return { emailId: row.id, messageId: row.messageId, to: body.to };
}
