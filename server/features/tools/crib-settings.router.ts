import { Router } from 'express';
import { updateCribSettingsBodySchema, type CribSettingsView } from '@shared/schemas/signoffs';
import type { Database } from '../../db/client';
import { requireRole } from '../../middleware/auth';
import { parseInput } from '../../lib/validate';
import { readChapterTimeZone, writeChapterTimeZone } from '../../settings/chapter-time-zone';
import { readCribSettings, writeCribSetting } from '../../settings/crib-settings';

const cribSettingsView = (db: Database): CribSettingsView => ({ ...readCribSettings(db), timeZone: readChapterTimeZone(db) });

/** The chapter's crib settings: everyone may read them, a chapter lead changes them. */
export function cribSettingsRouter() {
  const router = Router();
  router.use(requireRole('member'));

  router.get('/crib', (req, res) => {
    res.json(cribSettingsView(req.ctx.db));
  });

  /**
   * A new hold time applies to the next offer; offers already made keep their expiry. A new time
   * zone moves the chapter's days from now on; due moments already set stay where they are.
   */
  router.patch('/crib', requireRole('lead'), (req, res) => {
    const { holdHours, timeZone } = parseInput(updateCribSettingsBodySchema, req.body);
    req.ctx.db.transaction((tx) => {
      if (holdHours !== undefined) writeCribSetting(tx, 'holdHours', holdHours);
      if (timeZone !== undefined) writeChapterTimeZone(tx, timeZone);
    });
    res.json(cribSettingsView(req.ctx.db));
  });

  return router;
}
