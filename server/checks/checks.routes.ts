import { Router } from 'express';
import { requireAuth } from '../auth/auth.middleware';
import type { AppContext } from '../context';
import { parseCheckRequest } from './check-validation';
import { runCheck } from './checks.service';

/** POST /api/checks (contract, DESIGN.md §5): any signed-in role. */
export function checksRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireAuth(ctx));
  router.post('/', async (req, res) => {
    res.json(await runCheck(ctx, parseCheckRequest(req.body)));
  });
  return router;
}
