import express, { Router } from 'express';
import { checkoutBodySchema, checkoutSessionParams, paymentParams, paymentsQuerySchema, refundBodySchema } from '@shared/schemas/payments';
import { sendCsv } from '../../lib/csv';
import type { ServiceContext } from '../../context';
import { HttpError } from '../../lib/http-error';
import { parseInput } from '../../lib/validate';
import { requireRole, requireUser } from '../../middleware/auth';
import type { PaymentsSetup } from '../../payments/payments-client';
import { readCheckoutStatus } from './checkout-status';
import { listPayments, paymentsCsv } from './payment-list.service';
import { receiveProviderEvent, startCheckout } from './payments.service';
import { refundPayment } from './refunds.service';
import { listRefusedCheckouts } from './refused-checkouts';

const notSetUp = () => new HttpError(503, 'PAYMENTS_OFF', 'Online payment is not set up for this chapter. Pay the quartermaster in cash.');

/**
 * /api/payments: a signed-in member opens a hosted checkout for their own tab; the lead and the
 * quartermaster list and export payments, and the lead refunds online ones. The tabs are stock's: read
 * through `stock.reads`, written by stock's reactions to the payments' events.
 */
export function paymentsRouter(setup: PaymentsSetup | undefined) {
  const router = Router();
  router.post('/checkout', requireRole('member'), async (req, res) => {
    if (!setup) throw notSetUp();
    res.status(201).json(await startCheckout(req.ctx, setup, requireUser(req), parseInput(checkoutBodySchema, req.body)));
  });
  router.get('/checkouts/:sessionId', requireRole('member'), (req, res) => {
    res.json(readCheckoutStatus(req.ctx.db, requireUser(req).id, parseInput(checkoutSessionParams, req.params, 'path').sessionId));
  });
  paymentsLedgerRoutes(router, setup);
  return router;
}

/**
 * The lead's and quartermaster's view of payments: cash and online together, as JSON or CSV, and
 * the lead's refund of an online payment through the provider.
 */
function paymentsLedgerRoutes(router: Router, setup: PaymentsSetup | undefined) {
  const quartermaster = requireRole('quartermaster');
  router.get('/', quartermaster, (req, res) => {
    res.json({ data: listPayments(req.ctx, parseInput(paymentsQuerySchema, req.query, 'query')) });
  });
  router.get('/export.csv', quartermaster, (req, res) => {
    const { filename, csv } = paymentsCsv(req.ctx, parseInput(paymentsQuerySchema, req.query, 'query'));
    sendCsv(res, filename, csv);
  });
  router.get('/refused', quartermaster, (req, res) => {
    res.json({ data: listRefusedCheckouts(req.ctx) });
  });
  router.post('/:id/refund', requireRole('lead'), async (req, res) => {
    if (!setup) throw notSetUp();
    const { id } = parseInput(paymentParams, req.params, 'path');
    res.status(201).json(await refundPayment(req.ctx, setup, requireUser(req), id, parseInput(refundBodySchema, req.body ?? {})));
  });
}

/**
 * /api/payments/webhook: the provider's signed events. Mounted ahead of the session, JSON and CSRF
 * stack: the signature over the raw body is its only credential.
 */
export function paymentsWebhookRouter(ctx: ServiceContext, setup: PaymentsSetup | undefined) {
  const router = Router();
  router.post('/', express.raw({ type: '*/*', limit: '256kb' }), async (req, res) => {
    if (!setup) throw notSetUp();
    const body = Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0);
    await receiveProviderEvent(ctx, setup, req.log, body, req.headers['stripe-signature']);
    res.json({ received: true });
  });
  return router;
}
