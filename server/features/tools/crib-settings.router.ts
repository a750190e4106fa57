import { Router } from 'express';
import { updateCribSettingsBodySchema } from '@shared/schemas/signoffs';
import { requireRole } from '../../middleware/auth';
import { parseInput } from '../../lib/validate';
import { readCribSettings, writeCribSetting } from '../../settings/crib-settings';

/** The chapter's crib settings: everyone may read them, a chapter lead changes them. */
export function cribSettingsRouter() {
  const router = Router();
  router.use(requireRole('member'));

  router.get('/crib', (req, res) => {
    res.json(readCribSettings(req.ctx.db));
  });

  /** A new hold time applies to the next offer; offers already made keep their expiry. */
  router.patch('/crib', requireRole('lead'), (req, res) => {
    const { holdHours } = parseInput(updateCribSettingsBodySchema, req.body);
    writeCribSetting(req.ctx.db, 'holdHours', holdHours);
    res.json(readCribSettings(req.ctx.db));
  });

  return router;
}
