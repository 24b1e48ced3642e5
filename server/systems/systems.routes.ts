import { Router } from 'express';
import { z } from 'zod';
import { ReadingCreateSchema, SendReportSchema, SystemFinalizeSchema, SystemPatchSchema } from '../../shared/schemas/systems';
import { currentUser, requireAuth } from '../auth/auth.middleware';
import type { AppContext } from '../context';
import { IdParamSchema, parseBody, parseParams } from '../lib/validate';
import { sendReport } from '../mail/send-report';
import { ReportQuerySchema, renderSystemReport } from '../reports/system-report';
import { addReading } from './readings.service';
import { recordForRole } from './record-price-visibility';
import { savedRevisionJson } from './saved-revision';
import { finalizeSystem, getRevision, getSystem, patchSystem, reviseSystem } from './systems.service';

const RevisionParamSchema = IdParamSchema.extend({ n: z.coerce.number().int().positive() });

/** /api/systems/:id (contract, DESIGN.md §5): every signed-in role reads and edits records. */
export function systemsRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireAuth(ctx));
  router.get('/:id', async (req, res) => {
    res.json(recordForRole(currentUser(req).role, await getSystem(ctx, parseParams(IdParamSchema, req.params).id)));
  });
  router.patch('/:id', async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    const saved = await patchSystem(ctx, id, parseBody(SystemPatchSchema, req.body), currentUser(req));
    res.type('json').send(savedRevisionJson(currentUser(req).role, saved));
  });
  router.post('/:id/revisions', async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    const saved = await reviseSystem(ctx, id, parseBody(SystemPatchSchema, req.body), currentUser(req));
    res.status(201).type('json').send(savedRevisionJson(currentUser(req).role, saved));
  });
  router.get('/:id/revisions/:n', async (req, res) => {
    const { id, n } = parseParams(RevisionParamSchema, req.params);
    res.json(recordForRole(currentUser(req).role, await getRevision(ctx, id, n)));
  });
  router.post('/:id/finalize', async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    res.json(recordForRole(currentUser(req).role, await finalizeSystem(ctx, id, parseBody(SystemFinalizeSchema, req.body), currentUser(req).id)));
  });
  router.post('/:id/readings', async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    res.status(201).json(await addReading(ctx, id, parseBody(ReadingCreateSchema, req.body), currentUser(req).id));
  });
  router.get('/:id/report.pdf', async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    const { paper, revision } = parseParams(ReportQuerySchema, req.query);
    const report = await renderSystemReport(ctx, id, { paper, revision });
    res.type('application/pdf').setHeader('Content-Disposition', `inline; filename="${report.fileName}"`);
    res.setHeader('Cache-Control', 'private, no-store');
    res.send(report.pdf);
  });
  router.post('/:id/send', async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    res.json(await sendReport(ctx, id, parseBody(SendReportSchema, req.body), currentUser(req).id));
  });
  return router;
}
