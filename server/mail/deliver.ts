import type { AppContext } from '../context';
import { withWriteLock } from '../db/write-transaction';
import { AppError } from '../lib/errors';
import { storageFor } from '../storage/storage-for';
import type { SmtpConfig } from './smtp-config';
import { createMailTransport } from './mail-transport';
import { OutboundEmailRow } from './outbound-email.entity';

/** What the outbox records of one e-mail besides its outcome (record report or job proposal). */
export type OutboxAttempt = Pick<OutboundEmailRow, 'systemId' | 'revision' | 'to' | 'subject' | 'sentBy' | 'createdAt'> & { jobId?: number | null };

/**
 * Sends one PDF over SMTP and records the outcome in the outbox. A refusal records a failed attempt
 * and answers 502 with nothing else changed; a success stores the PDF as sent and records it.
 */
export async function deliverPdf(
  ctx: AppContext,
  smtp: SmtpConfig,
  attempt: OutboxAttempt,
  mail: { fromName: string; text: string; pdf: Buffer; fileName: string; what: 'report' | 'proposal' },
): Promise<OutboundEmailRow> {
  let messageId: string;
  try {
    const info = await createMailTransport(smtp).sendMail({
      from: { name: mail.fromName, address: smtp.from },
      to: attempt.to,
      subject: attempt.subject,
      text: mail.text,
      attachments: [{ filename: mail.fileName, content: mail.pdf, contentType: 'application/pdf' }],
    });
    messageId = info.messageId;
  } catch (err) {
    const reason = err instanceof Error ? err.message.slice(0, 300) : 'unknown error';
    await withWriteLock(ctx, (manager) =>
      manager
        .getRepository(OutboundEmailRow)
        .insert({ ...attempt, status: 'failed', messageId: null, error: reason, reportKey: null, reportFileName: null }),
    );
    ctx.logger.warn({ systemId: attempt.systemId, jobId: attempt.jobId, err: reason }, `${mail.what} e-mail failed`);
    throw new AppError('mail-failed', `The mail server did not accept the ${mail.what}. Nothing was sent; try again later.`, 502, { reason });
  }
  const reportKey = await storageFor(ctx).put(mail.pdf);
  return withWriteLock(ctx, (manager) =>
    manager
      .getRepository(OutboundEmailRow)
      .save({ ...attempt, status: 'sent', messageId, error: null, reportKey, reportFileName: mail.fileName }),
  );
}
