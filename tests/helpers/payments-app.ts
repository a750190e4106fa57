import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { expect } from 'vitest';
import { checkoutResponseSchema } from '@shared/schemas/payments';
import { startFakeProvider, type FakeProvider } from '../../server/payments/fake-provider';
import { createPaymentsSetup, type PaymentsSetup } from '../../server/payments/payments-client';
import { addBinAs, blindRivetBin, post } from './crib';
import { buildTestApp, type SignedInAgent, type TestApp } from './test-app';
import type { AppConfig } from '../../server/config';

export interface PaymentsTestApp {
  t: TestApp;
  fake: FakeProvider;
  setup: PaymentsSetup;
  close(): Promise<void>;
  /** Draws `quantity` blind rivets at $0.12 onto `who`'s tab (the bin added by `stocker`). */
  drawOnTab(stocker: SignedInAgent, who: SignedInAgent, quantity: number): Promise<void>;
  /** Opens a checkout for `amountCents` and presses Pay on the fake's hosted page; the webhook records it before this returns. */
  payOnline(who: SignedInAgent, amountCents?: number): Promise<void>;
  /** Posts a body to the webhook, signed with the chapter's secret. */
  deliverSigned(payload: string): request.Test;
}

/**
 * A test app that listens on loopback for real, with the fake provider beside it: the fake sends
 * its signed webhooks to the app as the real provider would.
 */
export async function startPaymentsApp(overrides: Partial<AppConfig> = {}): Promise<PaymentsTestApp> {
  const server: Server = createServer();
  await new Promise<void>((ok) => server.listen(0, '127.0.0.1', () => ok()));
  const { port } = server.address() as AddressInfo;
  const fake = await startFakeProvider({ webhookUrl: `http://127.0.0.1:${port}/api/payments/webhook` });
  const setup = createPaymentsSetup({ secretKey: fake.secretKey, webhookSecret: fake.webhookSecret, fake });
  const t = await buildTestApp({ payments: setup, ...overrides });
  server.on('request', t.app);

  return {
    t,
    fake,
    setup,
    async close() {
      await new Promise<void>((ok) => {
        server.close(() => ok());
        server.closeAllConnections();
      });
      await fake.close();
      await t.close();
    },
    async drawOnTab(stocker, who, quantity) {
      const rivets = await addBinAs(stocker, blindRivetBin());
      expect((await post(who, `/api/bins/${rivets.code}/draw`, { quantity })).status).toBe(201);
    },
    async payOnline(who, amountCents) {
      const res = await post(who, '/api/payments/checkout', amountCents === undefined ? {} : { amountCents });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      const url = checkoutResponseSchema.parse(res.body).url;
      const paid = await fetch(url, { method: 'POST', body: new URLSearchParams({ choice: 'pay' }), redirect: 'manual' });
      expect(paid.status).toBe(303);
    },
    deliverSigned(payload) {
      const signature = setup.provider.webhooks.generateTestHeaderString({ payload, secret: fake.webhookSecret });
      return request(t.app).post('/api/payments/webhook').set('content-type', 'application/json').set('stripe-signature', signature).send(payload);
    },
  };
}
