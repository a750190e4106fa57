import { Router } from 'express';
import { updateCribSettingsBodySchema } from '@shared/schemas/signoffs';
import { requireRole } from '../../middleware/auth';
import { parseInput } from '../../lib/validate';
import { changeCribSettings, cribSettingsView } from './crib-settings.service';

/** The chapter's crib settings: everyone may read them, a chapter lead changes them. */
export function cribSettingsRouter() {
  const router = Router();
  router.use(requireRole('member'));

  router.get('/crib', (req, res) => {
    res.json(cribSettingsView(req.ctx));
  });

  router.patch('/crib', requireRole('lead'), (req, res) => {
    res.json(changeCribSettings(req.ctx, parseInput(updateCribSettingsBodySchema, req.body)));
  });

  return router;
}
