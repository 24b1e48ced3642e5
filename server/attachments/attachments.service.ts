import { createHash } from 'node:crypto';
import type { AppContext } from '../context';
import { withWriteLock } from '../db/write-transaction';
import { requireJob } from '../jobs/jobs.service';
import { AppError, notFound } from '../lib/errors';
import { storageFor } from '../storage/storage-for';
import { SystemRecordRow } from '../systems/system-record.entity';
import { attachmentView, type AttachmentView } from '../systems/system-view';
import { AttachmentRow } from './attachment.entity';
import { detectImageType } from './image-type';

export const ATTACHMENT_KINDS = ['nameplate', 'install', 'other'] as const;
export type AttachmentKind = (typeof ATTACHMENT_KINDS)[number];

export interface UploadInput {
  jobId: number;
  kind: AttachmentKind;
  systemId?: number;
  fileName: string;
  data: Buffer;
  userId: number;
}

/**
 * Keeps a photo: the type from its bytes (415 otherwise), the bytes through the storage interface
 * under a random key, and the row with size and sha256. A row that fails to save removes the bytes.
 */
export async function saveAttachment(ctx: AppContext, input: UploadInput): Promise<AttachmentView> {
  await requireJob(ctx, input.jobId);
  const type = await detectImageType(input.data);
  if (!type) throw new AppError('unsupported-type', 'Only JPEG, PNG, WebP or HEIC photos can be attached.', 415);
  const store = storageFor(ctx);
  const key = await store.put(input.data);
  try {
    const row = await withWriteLock(ctx, async (manager) => {
      if (input.systemId !== undefined) {
        const record = await manager.getRepository(SystemRecordRow).findOneBy({ id: input.systemId, jobId: input.jobId });
        if (!record)
          throw new AppError('validation-failed', 'The request did not pass validation.', 422, [
            { path: 'systemId', message: 'no record with this id on this job' },
          ]);
        if (record.status === 'final')
          throw new AppError('record-final', 'This record is final: start a new revision to add photos.', 409, {
            currentRevision: record.revision,
          });
      }
      return manager.getRepository(AttachmentRow).save({
        jobId: input.jobId,
        systemId: input.systemId ?? null,
        kind: input.kind,
        fileName: displayName(input.fileName, type.ext),
        contentType: type.mime,
        sizeBytes: input.data.length,
        sha256: createHash('sha256').update(input.data).digest('hex'),
        storageKey: key,
        uploadedBy: input.userId,
        createdAt: new Date().toISOString(),
      });
    });
    return attachmentView(row);
  } catch (err) {
    await store.delete(key);
    throw err;
  }
}

/** The attachment's row and bytes (404 when either is missing). */
export async function readAttachment(ctx: AppContext, id: number): Promise<{ row: AttachmentRow; data: Buffer }> {
  const row = await ctx.dataSource.getRepository(AttachmentRow).findOneBy({ id });
  if (!row) throw notFound('Attachment');
  const data = await storageFor(ctx).get(row.storageKey);
  if (!data) throw notFound('Attachment');
  return { row, data };
}

/** Attachments of a job, newest first. */
export async function listAttachments(ctx: AppContext, jobId: number): Promise<AttachmentView[]> {
  await requireJob(ctx, jobId);
  const rows = await ctx.dataSource.getRepository(AttachmentRow).find({ where: { jobId }, order: { id: 'DESC' } });
  return rows.map(attachmentView);
}

/**
 * The sent name reduced to a plain display name: the last path segment, safe characters only, with
 * the extension of the detected type. It is only ever shown; files are found by their random key.
 */
export function displayName(sent: string, ext: string): string {
  const base = sent.split(/[\\/]/).pop() ?? '';
  const stem = base
    .replace(/\.[^.]*$/, '')
    .replace(/[^\w\- ]+/g, '')
    .replace(/^[-\s]+/, '')
    .trim()
    .slice(0, 80);
  return `${stem || 'photo'}.${ext}`;
}
