import { Router } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { currentUser, requireAuth } from '../auth/auth.middleware';
import type { AppContext } from '../context';
import { AppError } from '../lib/errors';
import { IdParamSchema, parseBody, parseParams } from '../lib/validate';
import { ATTACHMENT_KINDS, listAttachments, readAttachment, saveAttachment } from './attachments.service';

/** 10 MB: a full-resolution phone photo fits; anything larger is refused with 413 (Issue 10). */
export const MAX_PHOTO_BYTES = 10 * 1024 * 1024;

const UploadFieldsSchema = z.object({
  kind: z.enum(ATTACHMENT_KINDS).default('install'),
  systemId: z.coerce.number().int().positive().optional(),
});

/** Adds POST/GET /api/jobs/:id/attachments to the jobs router (multipart `file`, `kind`, optional `systemId`). */
export function attachmentUpload(ctx: AppContext, router: Router) {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_PHOTO_BYTES, files: 1, fields: 5 } });
  router.post('/:id/attachments', upload.single('file'), async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    if (!req.file)
      throw new AppError('validation-failed', 'The request did not pass validation.', 422, [{ path: 'file', message: 'attach a photo' }]);
    const fields = parseBody(UploadFieldsSchema, req.body ?? {});
    const view = await saveAttachment(ctx, {
      jobId: id,
      ...fields,
      fileName: req.file.originalname,
      data: req.file.buffer,
      userId: currentUser(req).id,
    });
    res.status(201).json(view);
  });
  router.get('/:id/attachments', async (req, res) => {
    res.json({ items: await listAttachments(ctx, parseParams(IdParamSchema, req.params).id) });
  });
}

/** GET /api/attachments/:id: the stored bytes, to signed-in users only, never cached by shared caches. */
export function attachmentsRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireAuth(ctx));
  router.get('/:id', async (req, res) => {
    const { row, data } = await readAttachment(ctx, parseParams(IdParamSchema, req.params).id);
    res.setHeader('Content-Type', row.contentType);
    res.setHeader('Content-Disposition', `inline; filename="${row.fileName}"`);
    res.setHeader('Cache-Control', 'private, max-age=3600');
    res.setHeader('X-Content-Type-Options', 'nosniff');
    res.send(data);
  });
  return router;
}
