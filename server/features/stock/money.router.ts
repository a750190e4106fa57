import { Router } from 'express';
import { recordPaymentBodySchema, spendQuerySchema, tabUserParams } from '@shared/schemas/stock-money';
import { parseInput } from '../../lib/validate';
import { requireRole, requireUser } from '../../middleware/auth';
import { chapterSpend, listTabs, readTab, recordPayment } from './money.service';

/**
 * /api/stock: members' tabs for what they drew, their payments, and the chapter's consumable spend.
 */
export function stockMoneyRouter() {
  const router = Router();
  // Guards sit on each route, not on the router: other routers share the /stock prefix.
  const member = requireRole('member');
  const quartermaster = requireRole('quartermaster');

  router.get('/tab', member, (req, res) => {
    const me = requireUser(req);
    res.json(readTab(req.ctx, me, me.id));
  });

  router.get('/tabs', quartermaster, (req, res) => {
    res.json({ data: listTabs(req.ctx) });
  });

  router.get('/tabs/:userId', member, (req, res) => {
    res.json(readTab(req.ctx, requireUser(req), parseInput(tabUserParams, req.params, 'path').userId));
  });

  router.post('/payments', quartermaster, (req, res) => {
    res.status(201).json(recordPayment(req.ctx, requireUser(req), parseInput(recordPaymentBodySchema, req.body)));
  });

  router.get('/spend', requireRole('lead'), (req, res) => {
    res.json(chapterSpend(req.ctx, parseInput(spendQuerySchema, req.query, 'query').months));
  });

  return router;
}
