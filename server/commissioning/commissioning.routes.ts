import { Router } from 'express';
import { CommissioningEvaluateSchema } from '../../shared/schemas/commissioning';
import { requireAuth } from '../auth/auth.middleware';
import type { AppContext } from '../context';
import { parseBody } from '../lib/validate';
import { evaluateCommissioning } from './commissioning.service';

/** POST /api/commissioning/evaluate (contract, DESIGN.md §5): any signed-in role. */
export function commissioningRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireAuth(ctx));
  router.post('/evaluate', async (req, res) => {
    res.json(await evaluateCommissioning(ctx, parseBody(CommissioningEvaluateSchema, req.body)));
  });
  return router;
}
