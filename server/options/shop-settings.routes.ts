import { Router } from 'express';
import { ShopSettingsSchema } from '../../shared/schemas/options';
import { currentUser, requireAuth, requireRole } from '../auth/auth.middleware';
import type { AppContext } from '../context';
import { parseBody } from '../lib/validate';
import { getShopSettings, saveShopSettings } from './shop-settings.service';

/** /api/settings/shop: pricing defaults, repair-or-replace threshold, energy assumptions, rebate tiers. Estimators read; admins replace. */
export function shopSettingsRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireAuth(ctx), requireRole('estimator', 'admin'));
  router.get('/', async (_req, res) => {
    res.json(await getShopSettings(ctx));
  });
  router.put('/', requireRole('admin'), async (req, res) => {
    res.json(await saveShopSettings(ctx, parseBody(ShopSettingsSchema, req.body), currentUser(req).id));
  });
  return router;
}
