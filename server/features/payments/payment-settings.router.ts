import { Router } from 'express';
import { MIN_ONLINE_PAYMENT_CENTS, updatePaymentSettingsBodySchema, type PaymentSettingsView } from '@shared/schemas/payments';
import type { Executor } from '../../db/client';
import { parseInput } from '../../lib/validate';
import { requireRole } from '../../middleware/auth';
import type { PaymentsSetup } from '../../payments/payments-client';
import { readPaymentSettings, writePaymentSettings } from '../../settings/payment-settings';

/** What anyone signed in may know of the chapter's payments: never a key, only which provider answers. */
function paymentSettingsView(db: Executor, setup: PaymentsSetup | undefined): PaymentSettingsView {
  const { offered, currency } = readPaymentSettings(db);
  return { offered: offered && setup !== undefined, currency, minimumCents: MIN_ONLINE_PAYMENT_CENTS, provider: setup?.connection ?? 'local-fake' };
}

/** /api/payments/settings: everyone signed in reads them; a chapter lead replaces them. */
export function paymentSettingsRouter(setup: PaymentsSetup | undefined) {
  const router = Router();
  router.get('/', requireRole('member'), (req, res) => {
    res.json(paymentSettingsView(req.ctx.db, setup));
  });
  router.put('/', requireRole('lead'), (req, res) => {
    writePaymentSettings(req.ctx.db, parseInput(updatePaymentSettingsBodySchema, req.body));
    res.json(paymentSettingsView(req.ctx.db, setup));
  });
  return router;
}
