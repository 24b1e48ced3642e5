import { Router } from 'express';
import { z } from 'zod';
import { requireAuth, requireRole } from '../auth/auth.middleware';
import type { AppContext } from '../context';
import { IdParamSchema, parseParams } from '../lib/validate';
import { listOutbox, outboxAttachment } from './outbox.service';

const PageSchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(50),
});

/** /api/outbox (contract, admin): every report e-mail attempt and the PDF as sent. */
export function outboxRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireAuth(ctx), requireRole('admin'));
  router.get('/', async (req, res) => {
    const { page, pageSize } = parseParams(PageSchema, req.query);
    res.json(await listOutbox(ctx, page, pageSize));
  });
  router.get('/:id/attachment', async (req, res) => {
    const { fileName, pdf } = await outboxAttachment(ctx, parseParams(IdParamSchema, req.params).id);
    res.type('application/pdf').setHeader('Content-Disposition', `inline; filename="${fileName}"`);
    res.send(pdf);
  });
  return router;
}
