import { Router } from 'express';
import { z } from 'zod';
import { requireRole, requireUser } from '../../middleware/auth';
import { parseInput } from '../../lib/validate';
import { loanStats } from './loan-stats.service';
import { listLoanHistory } from './loans.service';

const mineQuery = z.object({ state: z.enum(['open', 'all'], { error: 'state is open or all.' }).default('all') });

export function loansRouter() {
  const router = Router();

  /** The signed-in person's loans: open ones first, then history. */
  router.get('/mine', requireRole('member'), (req, res) => {
    const { state } = parseInput(mineQuery, req.query, 'query');
    res.json({ data: listLoanHistory(req.ctx, { userId: requireUser(req).id, open: state === 'open' }) });
  });

  /** Who holds what: every open loan (quartermaster and lead). */
  router.get('/open', requireRole('quartermaster'), (req, res) => {
    res.json({ data: listLoanHistory(req.ctx, { open: true }) });
  });

  /** The lead's overview of the crib: loans and late days per week, the tools used most and those idle. */
  router.get('/stats', requireRole('lead'), (req, res) => {
    res.json(loanStats(req.ctx));
  });

  return router;
}
