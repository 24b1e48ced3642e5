import { Router } from 'express';
import { JobCreateSchema, JobListQuerySchema, JobPatchSchema } from '../../shared/schemas/jobs';
import { currentUser, requireAuth } from '../auth/auth.middleware';
import type { AppContext } from '../context';
import { IdParamSchema, parseBody, parseParams } from '../lib/validate';
import { attachmentUpload } from '../attachments/attachments.routes';
import { recordForRole } from '../systems/record-price-visibility';
import { createSystem, listSystems } from '../systems/systems.service';
import { parseSystemCreate } from '../systems/system-validation';
import { createJob, getJob, listJobs, updateJob } from './jobs.service';

/** /api/jobs (contract, DESIGN.md §5): every signed-in role creates, reads and edits jobs. */
export function jobsRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireAuth(ctx));
  router.get('/', async (req, res) => {
    res.json(await listJobs(ctx, parseParams(JobListQuerySchema, req.query)));
  });
  router.post('/', async (req, res) => {
    res.status(201).json(await createJob(ctx, parseBody(JobCreateSchema, req.body), currentUser(req).id));
  });
  router.get('/:id', async (req, res) => {
    res.json(await getJob(ctx, parseParams(IdParamSchema, req.params).id));
  });
  router.patch('/:id', async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    res.json(await updateJob(ctx, id, parseBody(JobPatchSchema, req.body), currentUser(req).id));
  });
  router.get('/:id/systems', async (req, res) => {
    res.json({ items: await listSystems(ctx, parseParams(IdParamSchema, req.params).id) });
  });
  router.post('/:id/systems', async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    res.status(201).json(recordForRole(currentUser(req).role, await createSystem(ctx, id, parseSystemCreate(req.body), currentUser(req))));
  });
  attachmentUpload(ctx, router);
  return router;
}
