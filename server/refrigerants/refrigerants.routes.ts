import { Router } from 'express';
import { SaturationQuerySchema } from '../../shared/schemas/commissioning';
import { RefrigerantParamSchema } from '../../shared/schemas/refrigerants';
import { requireAuth } from '../auth/auth.middleware';
import type { AppContext } from '../context';
import { parseBody, parseParams } from '../lib/validate';
import { findRefrigerant, refrigerantSummaries, saturation } from './refrigerants.service';

/** Blank query values ("?psig=") count as not given: z.coerce would read them as 0. */
function withoutBlanks(query: Record<string, unknown>): Record<string, unknown> {
  return Object.fromEntries(Object.entries(query).filter(([, v]) => !(typeof v === 'string' && v.trim() === '')));
}

/** /api/refrigerants (contract, DESIGN.md §5): any signed-in role. */
export function refrigerantsRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireAuth(ctx));
  router.get('/', (_req, res) => {
    res.json({ items: refrigerantSummaries() });
  });
  router.get('/:id/saturation', (req, res) => {
    const { id } = parseParams(RefrigerantParamSchema, req.params);
    const refrigerant = findRefrigerant(id);
    // A reading that can not be a pressure or temperature is bad input of the field (422, issue 9).
    const query = parseBody(SaturationQuerySchema, withoutBlanks(req.query as Record<string, unknown>));
    res.json(saturation(refrigerant, query));
  });
  return router;
}
