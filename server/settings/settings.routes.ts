import { Router } from 'express';
import { RulesSettingsBodySchema } from '../../shared/schemas/settings';
import { currentUser, requireAuth, requireRole } from '../auth/auth.middleware';
import type { AppContext } from '../context';
import { parseBody } from '../lib/validate';
import { getRulesSettings, saveRulesSettings } from './settings.service';

/** /api/settings/rules: every role reads (the app keeps them for offline checks); admins replace. */
export function settingsRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireAuth(ctx));
  router.get('/rules', async (_req, res) => {
    res.json(await getRulesSettings(ctx));
  });
  router.put('/rules', requireRole('admin'), async (req, res) => {
    const body = parseBody(RulesSettingsBodySchema, req.body);
    res.json(await saveRulesSettings(ctx, body, currentUser(req).id));
  });
  return router;
}
