import { Router } from 'express';
import { EnergyQuerySchema, OptionPatchSchema } from '../../shared/schemas/options';
import { currentUser, requireAuth, requireRole } from '../auth/auth.middleware';
import type { AppContext } from '../context';
import { IdParamSchema, parseBody, parseParams } from '../lib/validate';
import { chooseOption, deleteOption, getOption, makeRecord, patchOption } from './options.service';

/** /api/options/:id — one priced option (estimators and admins: it carries prices). */
export function optionsRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireAuth(ctx), requireRole('estimator', 'admin'));
  router.get('/:id', async (req, res) => {
    res.json(await getOption(ctx, parseParams(IdParamSchema, req.params).id, parseParams(EnergyQuerySchema, req.query)));
  });
  router.patch('/:id', async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    res.json(await patchOption(ctx, id, parseBody(OptionPatchSchema, req.body)));
  });
  router.delete('/:id', async (req, res) => {
    await deleteOption(ctx, parseParams(IdParamSchema, req.params).id);
    res.status(204).end();
  });
  router.post('/:id/choose', async (req, res) => {
    res.json(await chooseOption(ctx, parseParams(IdParamSchema, req.params).id));
  });
  router.post('/:id/make-record', async (req, res) => {
    res.status(201).json(await makeRecord(ctx, parseParams(IdParamSchema, req.params).id, currentUser(req).id));
  });
  return router;
}
