import type { AppContext } from '../context';
import { notFound } from '../lib/errors';
import { storageFor } from '../storage/storage-for';
import { OutboundEmailRow } from './outbound-email.entity';

/** An outbox entry as the API answers it (the storage key stays inside). */
export function outboxView(row: OutboundEmailRow) {
  return {
    id: row.id,
    systemId: row.systemId,
    jobId: row.jobId,
    revision: row.revision,
    to: row.to,
    subject: row.subject,
    status: row.status,
    messageId: row.messageId,
    error: row.error,
    sentAt: row.createdAt,
    hasAttachment: row.reportKey !== null,
    attachmentUrl: row.reportKey ? `/api/outbox/${row.id}/attachment` : null,
  };
}

/** Every attempt, newest first, paged. */
export async function listOutbox(ctx: AppContext, page: number, pageSize: number) {
  const [rows, total] = await ctx.dataSource
    .getRepository(OutboundEmailRow)
    .findAndCount({ order: { id: 'DESC' }, skip: (page - 1) * pageSize, take: pageSize });
  return { items: rows.map(outboxView), total, page, pageSize };
}

/** The PDF as it was sent. */
export async function outboxAttachment(ctx: AppContext, id: number): Promise<{ fileName: string; pdf: Buffer }> {
  const row = await ctx.dataSource.getRepository(OutboundEmailRow).findOneBy({ id });
  if (!row?.reportKey) throw notFound('Sent report');
  const pdf = await storageFor(ctx).get(row.reportKey);
  if (!pdf) throw notFound('Sent report');
  return { fileName: row.reportFileName ?? `report-${row.id}.pdf`, pdf };
}
