import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { pino } from 'pino';
import request from 'supertest';
import { expect } from 'vitest';
import { checkoutResponseSchema } from '@shared/schemas/payments';
import { startFakeProvider, type FakeProvider } from '../../server/payments/fake-provider';
import { createPaymentsSetup, type PaymentsSetup } from '../../server/payments/payments-client';
import { addBinAs, blindRivetBin, post } from './crib';
import { buildTestApp, type SignedInAgent, type TestApp } from './test-app';

/** Puts `quantity` blind rivets at $0.12 on `who`'s tab by a real draw from a new bin. */
export async function drawOnTab(quartermaster: SignedInAgent, who: SignedInAgent, quantity: number): Promise<void> {
  const rivets = await addBinAs(quartermaster, blindRivetBin());
  const res = await post(who, `/api/bins/${rivets.code}/draw`, { quantity });
  expect(res.status).toBe(201);
}

/** Opens a checkout for the member's tab and answers the hosted page's address. */
export async function checkout(who: SignedInAgent, body: object = {}): Promise<string> {
  const res = await post(who, '/api/payments/checkout', body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return checkoutResponseSchema.parse(res.body).url;
}

/** Presses a button on the fake's hosted page; answers where the payer is sent. */
export async function press(url: string, choice: 'pay' | 'cancel'): Promise<string> {
  const res = await fetch(url, { method: 'POST', body: new URLSearchParams({ choice }), redirect: 'manual' });
  expect(res.status).toBe(303);
  return res.headers.get('location')!;
}

export const sessionIdOf = (url: string) => url.split('/').pop()!;

/** A test app that listens for real, with the fake provider sending its webhooks to it over loopback. */
export interface PaymentsApp {
  t: TestApp;
  fake: FakeProvider;
  setup: PaymentsSetup;
  /** What the app logged at warn and above, one JSON line each. */
  logged: string[];
  close(): Promise<void>;
  /** Draws `quantity` blind rivets at $0.12 onto `who`'s tab (the bin added by `stocker`). */
  drawOnTab(stocker: SignedInAgent, who: SignedInAgent, quantity: number): Promise<void>;
  /** Opens a checkout for `amountCents` and presses Pay on the fake's hosted page; the webhook records it before this returns. */
  payOnline(who: SignedInAgent, amountCents?: number): Promise<void>;
  /** Posts a body to the webhook, signed with the chapter's secret. */
  deliverSigned(payload: string): request.Test;
}
export type PaymentsTestApp = PaymentsApp;

export interface PaymentsAppOptions {
  /** The fake's webhooks go to a closed port, as when the provider's delivery is delayed. */
  webhooksLost?: boolean;
}

export async function startPaymentsApp({ webhooksLost = false }: PaymentsAppOptions = {}): Promise<PaymentsApp> {
  const server: Server = createServer();
  await new Promise<void>((ok) => server.listen(0, '127.0.0.1', () => ok()));
  const { port } = server.address() as AddressInfo;
  const fake = await startFakeProvider({ webhookUrl: `http://127.0.0.1:${webhooksLost ? 1 : port}/api/payments/webhook` });
  const setup = createPaymentsSetup({ secretKey: fake.secretKey, webhookSecret: fake.webhookSecret, fake });
  const logged: string[] = [];
  const t = await buildTestApp({ payments: setup, logger: pino({ level: 'warn' }, { write: (line: string) => logged.push(line) }) });
  server.on('request', t.app);
  return {
    t,
    fake,
    setup,
    logged,
    async close() {
      await new Promise<void>((ok) => {
        server.close(() => ok());
        server.closeAllConnections();
      });
      await fake.close();
      await t.close();
    },
    drawOnTab,
    async payOnline(who, amountCents) {
      await press(await checkout(who, amountCents === undefined ? {} : { amountCents }), 'pay');
    },
    deliverSigned(payload) {
      const signature = setup.provider.webhooks.generateTestHeaderString({ payload, secret: fake.webhookSecret });
      return request(t.app).post('/api/payments/webhook').set('content-type', 'application/json').set('stripe-signature', signature).send(payload);
    },
  };
}
