import { Router } from 'express';
import { z } from 'zod';
import { EnergyQuerySchema, OptionInputSchema, ProposalSendSchema, RepairOrReplaceInputSchema } from '../../shared/schemas/options';
import { currentUser, requireAuth, requireRole } from '../auth/auth.middleware';
import type { AppContext } from '../context';
import { IdParamSchema, parseBody, parseParams } from '../lib/validate';
import { sendProposal } from '../mail/send-proposal';
import { renderProposal } from '../reports/proposal-report';
import { createOption, listOptions } from './options.service';
import { repairOrReplace } from './repair-or-replace.service';

const ProposalQuerySchema = EnergyQuerySchema.extend({ paper: z.enum(['letter', 'a4']).default('letter') });

/**
 * /api/jobs/:id/options, /repair-or-replace, /proposal.pdf, /proposal/send — estimators and admins. Mounted beside
 * the jobs router; the role check sits on each route so other /api/jobs paths keep the jobs router's answers.
 */
export function jobOptionsRouter(ctx: AppContext): Router {
  const router = Router();
  const allowed = [requireAuth(ctx), requireRole('estimator', 'admin')];
  router.get('/:id/options', ...allowed, async (req, res) => {
    res.json(await listOptions(ctx, parseParams(IdParamSchema, req.params).id, parseParams(EnergyQuerySchema, req.query)));
  });
  router.post('/:id/options', ...allowed, async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    res.status(201).json(await createOption(ctx, id, parseBody(OptionInputSchema, req.body), currentUser(req).id));
  });
  router.post('/:id/repair-or-replace', ...allowed, async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    res.json(await repairOrReplace(ctx, id, parseBody(RepairOrReplaceInputSchema, req.body)));
  });
  router.get('/:id/proposal.pdf', ...allowed, async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    const { paper, ...energy } = parseParams(ProposalQuerySchema, req.query);
    const { pdf, fileName } = await renderProposal(ctx, id, { paper, energy });
    res.type('application/pdf').setHeader('Content-Disposition', `inline; filename="${fileName}"`);
    res.send(pdf);
  });
  router.post('/:id/proposal/send', ...allowed, async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    res.json(await sendProposal(ctx, id, parseBody(ProposalSendSchema, req.body), currentUser(req).id));
  });
  return router;
}
