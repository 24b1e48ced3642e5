import { Router } from 'express';
import { z } from 'zod';
import { CATALOG_KINDS } from '../../shared/schemas/equipment';
import { normalizeRefrigerantName, REFRIGERANT_IDS } from '../../shared/schemas/fields';
import { currentUser, requireAuth } from '../auth/auth.middleware';
import type { AppContext } from '../context';
import { notFound } from '../lib/errors';
import { IdParamSchema, parseParams } from '../lib/validate';
import { getCatalogDetail, listCatalog } from './catalog.service';
import { seesPrices, visiblePrices } from './price-visibility';

const KindSchema = z.enum(CATALOG_KINDS);
const ListQuerySchema = z.object({
  q: z.string().max(100).optional(),
  refrigerant: z.preprocess((v) => (v === '' ? undefined : normalizeRefrigerantName(v)), z.enum(REFRIGERANT_IDS).optional()),
  tons: z.preprocess((v) => (v === '' ? undefined : v), z.coerce.number().min(0.5).max(25).optional()),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
});

/** Parses :kind; an unknown kind is a 404 (there is no such collection). */
function kindOf(raw: string) {
  const parsed = KindSchema.safeParse(raw);
  if (!parsed.success) throw notFound(`Catalog kind "${raw}"`);
  return parsed.data;
}

/** /api/catalog/:kind (list, search, filters) and /api/catalog/:kind/:id (detail); any signed-in role (prices: estimator and admin). */
export function catalogRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireAuth(ctx));
  router.get('/:kind', async (req, res) => {
    const kind = kindOf(req.params.kind);
    res.json(await listCatalog(ctx, kind, parseParams(ListQuerySchema, req.query)));
  });
  router.get('/:kind/:id', async (req, res) => {
    const kind = kindOf(req.params.kind);
    const { id } = parseParams(IdParamSchema, { id: req.params.id });
    const { role } = currentUser(req);
    const detail = await getCatalogDetail(ctx, kind, id);
    res.json({ ...detail, prices: visiblePrices(role, detail.prices), pricesVisible: seesPrices(role) });
  });
  return router;
}
