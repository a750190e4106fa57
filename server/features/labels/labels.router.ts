import { Router } from 'express';
import { labelSheetBodySchema } from '@shared/schemas/labels';
import { badgeCandidates } from '../../accounts/badge.service';
import { requireRole, requireUser } from '../../middleware/auth';
import { parseInput } from '../../lib/validate';
import { buildLabelSheet, listLayouts } from './labels.service';

/** Label sheets for the quartermaster (and the lead): the layouts, and a PDF of labels for tools, bins and people's badges. */
export function labelsRouter() {
  const router = Router();
  router.use(requireRole('quartermaster'));

  router.get('/layouts', (_req, res) => {
    res.json({ data: listLayouts() });
  });

  router.get('/people', (req, res) => {
    res.json({ data: badgeCandidates(req.ctx) });
  });

  router.post('/sheet', async (req, res) => {
    const { filename, pdf } = await buildLabelSheet(req.ctx, requireUser(req), parseInput(labelSheetBodySchema, req.body));
    res.setHeader('Content-Type', 'application/pdf');
    res.setHeader('Content-Disposition', `attachment; filename="${filename}"`);
    res.send(pdf);
  });

  return router;
}
