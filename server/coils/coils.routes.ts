import { Router } from 'express';
import { CoilsQuerySchema } from '../../shared/schemas/coils';
import { requireAuth, requireRole } from '../auth/auth.middleware';
import type { AppContext } from '../context';
import { parseParams } from '../lib/validate';
import { compatibleCoils } from './coils.service';

/** GET /api/coils/compatible (contract, DESIGN.md §5): estimators and admins (the answer carries prices). */
export function coilsRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireAuth(ctx), requireRole('estimator', 'admin'));
  router.get('/compatible', async (req, res) => {
    res.json(await compatibleCoils(ctx, parseParams(CoilsQuerySchema, req.query)));
  });
  return router;
}
