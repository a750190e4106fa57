import { Router } from 'express';
import { labelSheetBodySchema } from '@shared/schemas/labels';
import { requireRole } from '../../middleware/auth';
import { parseInput } from '../../lib/validate';
import { buildLabelSheet, listLayouts } from './labels.service';

/** Label sheets for the quartermaster (and the lead): the layouts, and a PDF of labels for tools and bins. */
export function labelsRouter() {
  const router = Router();
  router.use(requireRole('quartermaster'));

  router.get('/layouts', (_req, res) => {
    res.json({ data: listLayouts() });
  });

  router.post('/sheet', async (req, res) => {
    const { filename, pdf } = await buildLabelSheet(req.ctx, parseInput(labelSheetBodySchema, req.body));
    res.setHeader('Content-Type', 'application/pdf');
    res.setHeader('Content-Disposition', `attachment; filename="${filename}"`);
    res.send(pdf);
  });

  return router;
}
