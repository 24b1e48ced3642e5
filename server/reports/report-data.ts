import type { AppContext } from '../context';
import { JobRow } from '../jobs/job.entity';
import { notFound } from '../lib/errors';
import { storageFor } from '../storage/storage-for';
import { AttachmentRow } from '../attachments/attachment.entity';
import { loadView } from '../systems/systems.service';
import type { SystemView } from '../systems/system-view';

/** Everything one report shows, loaded before drawing starts (drawing is synchronous). */
export interface ReportData {
  shopName: string;
  job: JobRow;
  record: SystemView;
  photos: { fileName: string; data: Buffer }[];
  generatedAt: string;
}

// pdfkit embeds JPEG and PNG only; a record's first few nameplate photos are enough for the page.
const PRINTABLE = new Set(['image/jpeg', 'image/png']);
const MAX_PHOTOS = 4;

/** Loads a record (latest or a given revision), its job and its printable nameplate photos. */
export async function loadReportData(ctx: AppContext, id: number, revision?: number): Promise<ReportData> {
  const record = await loadView(ctx, id, revision);
  const job = await ctx.dataSource.getRepository(JobRow).findOneBy({ id: record.jobId });
  if (!job) throw notFound('Job');
  const rows = await ctx.dataSource.getRepository(AttachmentRow).find({ where: { systemId: id, kind: 'nameplate' }, order: { id: 'ASC' } });
  const photos: ReportData['photos'] = [];
  for (const row of rows.filter((r) => PRINTABLE.has(r.contentType)).slice(0, MAX_PHOTOS)) {
    const data = await storageFor(ctx).get(row.storageKey);
    if (data) photos.push({ fileName: row.fileName, data });
  }
  return { shopName: ctx.config.shopName ?? 'Tandem', job, record, photos, generatedAt: new Date().toISOString() };
}
