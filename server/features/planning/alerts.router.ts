import { Router } from 'express';
import { noFieldsBodySchema } from '@shared/schemas/fields';
import { alertIdParams, alertListQuerySchema, dismissBodySchema, markOrderedBodySchema } from '@shared/schemas/forecast';
import { chapterDay } from '@shared/time/chapter-time';
import { sendCsv } from '../../lib/csv';
import { parseInput } from '../../lib/validate';
import { requireRole, requireUser } from '../../middleware/auth';
import { readChapterTimeZone } from '../../settings/chapter-time-zone';
import { closeAlert, dismissAlert, listAlertsIn, markOrdered, refreshAlerts } from './alerts.service';
import { purchaseList, purchaseListCsv } from './purchase-list';

/**
 * /api/alerts: reorder alerts and the purchase list, for quartermasters (and leads). Opening the
 * list refreshes the alerts first when the last refresh is more than 5 minutes old.
 */
export function alertsRouter() {
  const router = Router();
  router.use(requireRole('quartermaster'));

  router.get('/', (req, res) => {
    const { state } = parseInput(alertListQuerySchema, req.query, 'query');
    res.json({ data: listAlertsIn(req.ctx, state) });
  });

  router.post('/refresh', (req, res) => {
    parseInput(noFieldsBodySchema, req.body);
    const { raised, plan } = refreshAlerts(req.ctx);
    res.json({ raised: raised.length, data: listAlertsIn(req.ctx, 'active', plan) });
  });

  router.get('/purchase-list', (req, res) => {
    res.json(purchaseList(req.ctx));
  });

  router.get('/purchase-list.csv', (req, res) => {
    sendCsv(res, `gripline-purchase-list-${chapterDay(req.ctx.now(), readChapterTimeZone(req.ctx.db))}.csv`, purchaseListCsv(req.ctx));
  });

  router.post('/:id/ordered', (req, res) => {
    const { id } = parseInput(alertIdParams, req.params, 'path');
    const body = parseInput(markOrderedBodySchema, req.body);
    res.json(markOrdered(req.ctx, requireUser(req), id, body));
  });

  router.post('/:id/close', (req, res) => {
    const { id } = parseInput(alertIdParams, req.params, 'path');
    parseInput(noFieldsBodySchema, req.body);
    res.json(closeAlert(req.ctx, requireUser(req), id));
  });

  router.post('/:id/dismiss', (req, res) => {
    const { id } = parseInput(alertIdParams, req.params, 'path');
    const { reason } = parseInput(dismissBodySchema, req.body);
    res.json(dismissAlert(req.ctx, requireUser(req), id, reason));
  });

  return router;
}
