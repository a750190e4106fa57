import express, { Router } from 'express';
import { checkoutBodySchema, checkoutSessionParams } from '@shared/schemas/payments';
import type { ServiceContext } from '../../context';
import { HttpError } from '../../lib/http-error';
import { parseInput } from '../../lib/validate';
import { requireRole, requireUser } from '../../middleware/auth';
import type { PaymentsSetup } from '../../payments/payments-client';
import { readCheckoutStatus } from './checkout-status';
import { receiveProviderEvent, startCheckout, type TabLedger } from './payments.service';

const notSetUp = () => new HttpError(503, 'PAYMENTS_OFF', 'Online payment is not set up for this chapter. Pay the quartermaster in cash.');

/**
 * /api/payments: a signed-in member opens a hosted checkout for their own tab. `tab` (from the stock
 * feature) says what they owe and records what they paid.
 */
export function paymentsRouter(setup: PaymentsSetup | undefined, tab: TabLedger) {
  const router = Router();
  router.post('/checkout', requireRole('member'), async (req, res) => {
    if (!setup) throw notSetUp();
    res.status(201).json(await startCheckout(req.ctx, setup, tab, requireUser(req), parseInput(checkoutBodySchema, req.body)));
  });
  router.get('/checkouts/:sessionId', requireRole('member'), (req, res) => {
    res.json(readCheckoutStatus(req.ctx.db, requireUser(req).id, parseInput(checkoutSessionParams, req.params, 'path').sessionId));
  });
  return router;
}

/**
 * /api/payments/webhook: the provider's signed events. Mounted ahead of the session, JSON and CSRF
 * stack: the signature over the raw body is its only credential.
 */
export function paymentsWebhookRouter(ctx: ServiceContext, setup: PaymentsSetup | undefined, tab: TabLedger) {
  const router = Router();
  router.post('/', express.raw({ type: '*/*', limit: '256kb' }), (req, res) => {
    if (!setup) throw notSetUp();
    const body = Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0);
    receiveProviderEvent(ctx, setup, tab, req.log, body, req.headers['stripe-signature']);
    res.json({ received: true });
  });
  return router;
}
