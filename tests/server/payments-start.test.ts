import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { AddressInfo } from 'node:net';
import type Stripe from 'stripe';
import { readEnv } from '../../server/env';
import { ensureLanCertificate } from '../../server/lan/lan-certificate';
import { startFakeProvider } from '../../server/payments/fake-provider';
import { createPaymentsSetup } from '../../server/payments/payments-client';
import { createTlsServer } from '../../server/tls';
import { startGripline } from '../../server/main';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { signIn, type Member } from '../helpers/http-sign-in';

let dir: string;
beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'gripline-payments-'));
});
afterEach(() => rmSync(dir, { recursive: true, force: true }));

const asMember = (who: Member, method: string, body?: object): RequestInit => ({
  method,
  headers: { cookie: who.cookie, 'x-csrf-token': who.csrf, 'content-type': 'application/json' },
  body: body && JSON.stringify(body),
});

describe('Gripline started without a payment key', () => {
  it('starts its own fake provider: a demo member settles the tab on its page, and the fake stops with the app', async () => {
    const running = await startGripline(readEnv({ DATABASE_PATH: join(dir, 'demo.db'), PORT: '0', HOST: '127.0.0.1', LOG_LEVEL: 'silent' }));
    let payPage = '';
    try {
      const member = await signIn(running.url, 'member@example.org', DEMO_PASSWORD);
      const balance = async () => ((await (await fetch(`${running.url}/api/stock/tab`, asMember(member, 'GET'))).json()) as { balanceCents: number }).balanceCents;
      const owed = await balance();
      expect(owed).toBeGreaterThanOrEqual(50);

      const res = await fetch(`${running.url}/api/payments/checkout`, asMember(member, 'POST', {}));
      expect(res.status).toBe(201);
      payPage = ((await res.json()) as { url: string }).url;
      expect(payPage).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/pay\/cs_test_\w+$/);
      const shown = await (await fetch(payPage)).text();
      expect(shown).toContain('to the chapter');

      const paid = await fetch(payPage, { method: 'POST', body: new URLSearchParams({ choice: 'pay' }), redirect: 'manual' });
      expect(paid.headers.get('location')).toBe(`${running.url}/tab?payment=paid&checkout=${payPage.split('/').pop()}`);
      expect(await balance()).toBe(0);
    } finally {
      await running.close();
    }
    await expect(fetch(payPage)).rejects.toThrow();
  });

  it('refuses a real key without its webhook secret, naming the setting', () => {
    expect(() => readEnv({ PAYMENTS_SECRET_KEY: 'sk_live_x' })).toThrow(/PAYMENTS_WEBHOOK_SECRET: not set/);
    expect(readEnv({ PAYMENTS_SECRET_KEY: 'sk_live_x', PAYMENTS_WEBHOOK_SECRET: 'whsec_x' }).PAYMENTS_SECRET_KEY).toBe('sk_live_x');
  });
});

describe('the fake provider', () => {
  it('delivers its signed completion to a Gripline serving HTTPS on its own certificate', async () => {
    const lan = await ensureLanCertificate({ dir, hostNames: ['localhost'], ipv4: ['127.0.0.1'] });
    const received: { body: string; signature: string }[] = [];
    const server = createTlsServer(lan);
    server.on('request', (req, res) => {
      let body = '';
      req.on('data', (chunk: Buffer) => (body += chunk.toString('utf8')));
      req.on('end', () => {
        received.push({ body, signature: String(req.headers['stripe-signature']) });
        res.end('{}');
      });
    });
    await new Promise<void>((ok) => server.listen(0, '127.0.0.1', () => ok()));
    const fake = await startFakeProvider({ webhookUrl: `https://127.0.0.1:${(server.address() as AddressInfo).port}/api/payments/webhook` });
    try {
      const { provider, webhookSecret } = createPaymentsSetup({ secretKey: fake.secretKey, webhookSecret: fake.webhookSecret, fake });
      const session = await provider.checkout.sessions.create({
        mode: 'payment',
        line_items: [{ quantity: 1, price_data: { currency: 'usd', unit_amount: 1240, product_data: { name: 'Consumables tab' } } }],
        success_url: 'https://127.0.0.1/tab?payment=paid',
        cancel_url: 'https://127.0.0.1/tab?payment=cancelled',
      });
      expect(await (await fetch(session.url!)).text()).toContain('<h1>Pay $12.40 to the chapter</h1>');
      const paid = await fetch(session.url!, { method: 'POST', body: new URLSearchParams({ choice: 'pay' }), redirect: 'manual' });
      expect(paid.headers.get('location')).toBe('https://127.0.0.1/tab?payment=paid');

      expect(received).toHaveLength(1);
      const event = provider.webhooks.constructEvent(received[0]!.body, received[0]!.signature, webhookSecret);
      expect(event.type).toBe('checkout.session.completed');
      const completed = event.data.object as Stripe.Checkout.Session;
      expect(completed).toMatchObject({ id: session.id, amount_total: 1240, payment_status: 'paid', status: 'complete' });
      expect((await provider.checkout.sessions.retrieve(session.id)).status).toBe('complete');
    } finally {
      await fake.close();
      await new Promise<void>((ok) => server.close(() => ok()));
    }
  });

  it('refuses an SDK call made with another key, as the provider would', async () => {
    const fake = await startFakeProvider({ webhookUrl: 'http://127.0.0.1:9/unused' });
    try {
      const { provider } = createPaymentsSetup({ secretKey: 'sk_test_someone_else', webhookSecret: fake.webhookSecret, fake });
      await expect(provider.checkout.sessions.retrieve('cs_test_x')).rejects.toThrow(/Invalid API Key/);
    } finally {
      await fake.close();
    }
  });
});
