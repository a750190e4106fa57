import { randomBytes } from 'node:crypto';

/** A payment the fake took: what a refund names, and what is left to hand back. */
interface FakeIntent {
  id: string;
  chargeId: string;
  amount: number;
  currency: string;
  created: number;
}

/** The provider's refund object, as its SDK reads it. */
export interface FakeRefund {
  id: string;
  object: 'refund';
  amount: number;
  currency: string;
  payment_intent: string;
  charge: string;
  status: 'succeeded';
  created: number;
  metadata: Record<string, string>;
}

/** A refund the fake refuses, in the provider's error shape (HTTP 400). */
export interface FakeRefusal {
  code: string;
  message: string;
}

const token = (prefix: string) => `${prefix}_${randomBytes(12).toString('hex')}`;
const nowSeconds = () => Math.floor(Date.now() / 1000);

/**
 * The fake provider's payments and refunds: each paid checkout becomes a payment intent with its
 * charge; a refund is at most what is left, and each one is announced by a `charge.refunded` event
 * (sent by `announce`, which the fake signs and posts like any webhook) before it is answered.
 */
export function fakeRefunds(announce: (type: string, object: object) => Promise<void>) {
  const intents = new Map<string, FakeIntent>();
  const refunds: FakeRefund[] = [];

  const refundsOf = (intentId: string) => refunds.filter((r) => r.payment_intent === intentId);
  const refundedOf = (intentId: string) => refundsOf(intentId).reduce((sum, r) => sum + r.amount, 0);

  function chargeOf(intent: FakeIntent) {
    const refunded = refundedOf(intent.id);
    return {
      id: intent.chargeId,
      object: 'charge',
      amount: intent.amount,
      amount_captured: intent.amount,
      amount_refunded: refunded,
      currency: intent.currency,
      payment_intent: intent.id,
      paid: true,
      refunded: refunded === intent.amount,
      status: 'succeeded',
      created: intent.created,
      livemode: false,
    };
  }

  return {
    /** A checkout was paid: its payment intent id, for the session and for refunds. */
    takePayment(amount: number, currency: string): string {
      const intent = { id: token('pi'), chargeId: token('ch'), amount, currency, created: nowSeconds() };
      intents.set(intent.id, intent);
      return intent.id;
    },

    /** Refunds `amount` (all that is left when absent) of a payment intent, or says why not. */
    async refund(intentId: string | null, amount: number | undefined, metadata: Record<string, string> = {}): Promise<FakeRefund | FakeRefusal> {
      const intent = intentId ? intents.get(intentId) : undefined;
      if (!intent) return { code: 'resource_missing', message: `No such payment_intent: '${intentId ?? ''}'` };
      const left = intent.amount - refundedOf(intent.id);
      if (left <= 0) return { code: 'charge_already_refunded', message: `Charge ${intent.chargeId} has already been refunded.` };
      const asked = amount ?? left;
      if (!Number.isInteger(asked) || asked <= 0) return { code: 'parameter_invalid_integer', message: 'The refund amount must be a positive whole number of cents.' };
      if (asked > left) return { code: 'amount_too_large', message: `Refund amount (${asked}) is greater than unrefunded amount on charge (${left}).` };
      const refund: FakeRefund = {
        id: token('re'),
        object: 'refund',
        amount: asked,
        currency: intent.currency,
        payment_intent: intent.id,
        charge: intent.chargeId,
        status: 'succeeded',
        created: nowSeconds(),
        metadata,
      };
      refunds.push(refund);
      await announce('charge.refunded', chargeOf(intent));
      return refund;
    },

    /** The refunds of one payment intent, newest first, as the provider lists them. */
    list(intentId: string | null) {
      const data = (intentId ? refundsOf(intentId) : refunds).slice().reverse();
      return { object: 'list', data, has_more: false, url: '/v1/refunds' };
    },
  };
}
