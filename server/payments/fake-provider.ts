import { randomBytes } from 'node:crypto';
import { createServer, request as httpRequest, type IncomingMessage, type ServerResponse } from 'node:http';
import { request as httpsRequest } from 'node:https';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { centsWords } from '@shared/stock/money';
import { fakeRefunds } from './fake-refunds';

/** The key the SDK sends to the fake; any other key is refused as the provider would. */
export const FAKE_SECRET_KEY = 'sk_test_gripline_local_fake';

export interface FakeProvider {
  host: string;
  port: number;
  secretKey: string;
  webhookSecret: string;
  /** A refund made in the provider's own dashboard: announced by `charge.refunded` like any other. */
  refundInDashboard(paymentIntent: string, amountCents?: number): Promise<{ id: string }>;
  close(): Promise<void>;
}

export interface FakeProviderOptions {
  /** Where the signed completion goes, e.g. http://127.0.0.1:3000/api/payments/webhook. */
  webhookUrl: string;
  webhookSecret?: string;
}

interface FakeSession {
  id: string;
  object: 'checkout.session';
  url: string;
  amount_total: number;
  currency: string;
  client_reference_id: string | null;
  customer_email: string | null;
  payment_status: 'unpaid' | 'paid';
  /** The payment a paid checkout made; what a refund names. */
  payment_intent: string | null;
  status: 'open' | 'complete' | 'expired';
  mode: string;
  metadata: Record<string, string>;
  success_url: string;
  cancel_url: string;
  created: number;
  livemode: false;
}

const token = (prefix: string) => `${prefix}_${randomBytes(12).toString('hex')}`;

function readBody(req: IncomingMessage): Promise<string> {
  return new Promise((resolve, reject) => {
    let body = '';
    req.setEncoding('utf8');
    req.on('data', (chunk: string) => (body += chunk));
    req.on('end', () => resolve(body));
    req.on('error', reject);
  });
}

function sendJson(res: ServerResponse, status: number, body: unknown): void {
  res.writeHead(status, { 'content-type': 'application/json' }).end(JSON.stringify(body));
}

const providerError = (res: ServerResponse, status: number, message: string) =>
  sendJson(res, status, { error: { type: 'invalid_request_error', message } });

/** A request the provider understood and refused, with its error code (an over-refund, an unknown payment). */
const providerRefusal = (res: ServerResponse, refusal: { code: string; message: string }) =>
  sendJson(res, 400, { error: { type: 'invalid_request_error', ...refusal } });

/** metadata[userId]=7 → { userId: '7' }: the SDK sends nested objects form-encoded with brackets. */
function nested(form: URLSearchParams, prefix: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, value] of form) {
    const match = key.startsWith(`${prefix}[`) && /^\w+\[([^\]]+)\]$/.exec(key);
    if (match) out[match[1]!] = value;
  }
  return out;
}

/**
 * Posts a webhook and waits for the answer. Over HTTPS the certificate is not checked: the target is
 * Gripline's own loopback listener (often on a self-signed or LAN certificate), and the signature, not
 * the connection, is what Gripline trusts.
 */
function postWebhook(url: string, payload: string, signature: string): Promise<number> {
  const target = new URL(url);
  const send = target.protocol === 'https:' ? httpsRequest : httpRequest;
  return new Promise((resolve, reject) => {
    const req = send(
      target,
      { method: 'POST', rejectUnauthorized: false, headers: { 'content-type': 'application/json', 'content-length': Buffer.byteLength(payload), 'stripe-signature': signature } },
      (res) => {
        res.resume();
        res.on('end', () => resolve(res.statusCode ?? 0));
      },
    );
    req.on('error', reject);
    req.end(payload);
  });
}

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

const pageStyle = `<style>body{font:1rem/1.5 system-ui,sans-serif;max-width:28rem;margin:3rem auto;padding:0 1rem;color:#1d2430}
main{border:1px solid #c7ced8;border-radius:.5rem;padding:1.5rem}button{font:inherit;padding:.5rem 1.25rem;margin-right:.5rem}
.pay{background:#1f5fa8;color:#fff;border:0;border-radius:.25rem}</style>`;

const pageShell = (title: string, body: string) => `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${title}</title>
${pageStyle}</head>
<body><main><h1>${title}</h1>
${body}</main></body></html>`;

/** The payer's way back when there is nothing to pay here: the page the cancel URL names, without its query. */
const wayBack = (session: FakeSession) => {
  const back = new URL(session.cancel_url);
  return `${back.origin}${back.pathname}`;
};

function hostedPage(session: FakeSession): string {
  const amount = escapeHtml(centsWords(session.amount_total, session.currency));
  if (session.status === 'expired') {
    return pageShell(
      'This checkout has expired',
      `<p>Nothing was charged. A newer checkout replaced this one, or it ran out of time.</p>
<p><a href="${escapeHtml(wayBack(session))}">Back to My tab</a></p>`,
    );
  }
  if (session.status === 'complete') {
    return pageShell(`${amount} is paid`, `<p>This checkout is paid.</p>\n<p><a href="${escapeHtml(wayBack(session))}">Back to My tab</a></p>`);
  }
  return pageShell(
    `Pay ${amount} to the chapter`,
    `<p>Local test checkout: no card is charged and nothing leaves this computer.</p>
<form method="post" action="/pay/${escapeHtml(session.id)}"><button class="pay" type="submit" name="choice" value="pay">Pay</button>
<button type="submit" name="choice" value="cancel">Cancel</button></form>`,
  );
}

/** As the provider does on its way back: the success URL's {CHECKOUT_SESSION_ID} becomes the session's id. */
const successUrlOf = (session: FakeSession) => session.success_url.replaceAll('{CHECKOUT_SESSION_ID}', session.id);

/**
 * A stand-in for the hosted payment provider on a free loopback port, started when no real key is
 * set. It answers the SDK calls Gripline makes (create, retrieve and expire a checkout session, create
 * and list refunds) in the provider's shapes, serves a plain hosted page, and on Pay sends the signed
 * completion webhook exactly as the provider signs it before sending the payer back to the success
 * URL. Every expiry and refund is announced by its signed event (`checkout.session.expired`,
 * `charge.refunded`) before it is answered.
 */
export async function startFakeProvider(options: FakeProviderOptions): Promise<FakeProvider> {
  const webhookSecret = options.webhookSecret ?? token('whsec');
  const signer = new Stripe(FAKE_SECRET_KEY);
  const sessions = new Map<string, FakeSession>();
  let base = '';

  async function createSession(req: IncomingMessage, res: ServerResponse) {
    const form = new URLSearchParams(await readBody(req));
    const amount = Number(form.get('line_items[0][price_data][unit_amount]'));
    const quantity = Number(form.get('line_items[0][quantity]') ?? '1');
    const currency = form.get('line_items[0][price_data][currency]');
    const successUrl = form.get('success_url');
    const cancelUrl = form.get('cancel_url');
    if (!Number.isInteger(amount) || amount < 50 || !currency) return providerError(res, 400, 'A line item with an amount of at least 50 and a currency is required.');
    if (!successUrl || !cancelUrl) return providerError(res, 400, 'success_url and cancel_url are required.');
    const id = token('cs_test');
    const session: FakeSession = {
      id,
      object: 'checkout.session',
      url: `${base}/pay/${id}`,
      amount_total: amount * quantity,
      currency,
      client_reference_id: form.get('client_reference_id'),
      customer_email: form.get('customer_email'),
      payment_status: 'unpaid',
      payment_intent: null,
      status: 'open',
      mode: form.get('mode') ?? 'payment',
      metadata: nested(form, 'metadata'),
      success_url: successUrl,
      cancel_url: cancelUrl,
      created: Math.floor(Date.now() / 1000),
      livemode: false,
    };
    sessions.set(id, session);
    sendJson(res, 200, session);
  }

  /** Signs an event exactly as the provider does and posts it to Gripline's webhook. */
  async function sendEvent(type: string, object: object): Promise<void> {
    const event = { id: token('evt'), object: 'event', type, created: Math.floor(Date.now() / 1000), livemode: false, pending_webhooks: 1, data: { object } };
    const payload = JSON.stringify(event);
    const signature = signer.webhooks.generateTestHeaderString({ payload, secret: webhookSecret });
    await postWebhook(options.webhookUrl, payload, signature);
  }

  // A refund stands whether or not Gripline could be told of it, as with the real provider.
  const refunds = fakeRefunds((type, object) => sendEvent(type, object).then(() => undefined, () => undefined));

  async function completeSession(session: FakeSession): Promise<void> {
    session.status = 'complete';
    session.payment_status = 'paid';
    session.payment_intent = refunds.takePayment(session.amount_total, session.currency);
    await sendEvent('checkout.session.completed', session);
  }

  /** Only an open session can be expired, as at the provider; its expiry event goes out before the answer. */
  async function expireSession(res: ServerResponse, session: FakeSession) {
    if (session.status !== 'open') {
      return providerError(res, 400, `Only Checkout Sessions with a status in [open] can be expired. This Checkout Session has a status of ${session.status}.`);
    }
    session.status = 'expired';
    await sendEvent('checkout.session.expired', session);
    sendJson(res, 200, session);
  }

  /** POST /v1/refunds (payment_intent, optional amount, form-encoded as the SDK sends them). */
  async function createRefund(req: IncomingMessage, res: ServerResponse) {
    const form = new URLSearchParams(await readBody(req));
    const amount = form.get('amount');
    const refund = await refunds.refund(form.get('payment_intent'), amount === null ? undefined : Number(amount), nested(form, 'metadata'));
    return 'object' in refund ? sendJson(res, 200, refund) : providerRefusal(res, refund);
  }

  async function answerPage(req: IncomingMessage, res: ServerResponse, session: FakeSession) {
    if (req.method === 'GET') {
      res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' }).end(hostedPage(session));
      return;
    }
    const choice = new URLSearchParams(await readBody(req)).get('choice');
    // A page left open on an expired or paid checkout shows that state again rather than pretending to pay.
    if (session.status !== 'open') return void res.writeHead(303, { location: `/pay/${session.id}` }).end();
    if (choice === 'pay') await completeSession(session);
    res.writeHead(303, { location: choice === 'pay' ? successUrlOf(session) : session.cancel_url }).end();
  }

  async function route(req: IncomingMessage, res: ServerResponse) {
    const path = new URL(req.url ?? '/', 'http://fake').pathname;
    const page = /^\/pay\/([\w]+)$/.exec(path);
    if (page) {
      const session = sessions.get(page[1]!);
      if (!session) return providerError(res, 404, 'No such checkout session.');
      return answerPage(req, res, session);
    }
    if (req.headers.authorization !== `Bearer ${FAKE_SECRET_KEY}`) return providerError(res, 401, 'Invalid API Key provided.');
    if (req.method === 'POST' && path === '/v1/checkout/sessions') return createSession(req, res);
    if (req.method === 'POST' && path === '/v1/refunds') return createRefund(req, res);
    if (req.method === 'GET' && path === '/v1/refunds') return sendJson(res, 200, refunds.list(new URL(req.url ?? '/', 'http://fake').searchParams.get('payment_intent')));
    const retrieve = /^\/v1\/checkout\/sessions\/([\w]+)$/.exec(path);
    if (req.method === 'GET' && retrieve) {
      const session = sessions.get(retrieve[1]!);
      return session ? sendJson(res, 200, session) : providerError(res, 404, `No such checkout.session: '${retrieve[1]}'`);
    }
    const expire = /^\/v1\/checkout\/sessions\/([\w]+)\/expire$/.exec(path);
    if (req.method === 'POST' && expire) {
      const session = sessions.get(expire[1]!);
      return session ? expireSession(res, session) : providerError(res, 404, `No such checkout.session: '${expire[1]}'`);
    }
    providerError(res, 404, `Unrecognized request URL (${req.method} ${path}).`);
  }

  const server = createServer((req, res) => {
    route(req, res).catch((err: Error) => {
      if (!res.headersSent) providerError(res, 500, err.message);
    });
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => resolve());
  });
  const { port } = server.address() as AddressInfo;
  base = `http://127.0.0.1:${port}`;
  return {
    host: '127.0.0.1',
    port,
    secretKey: FAKE_SECRET_KEY,
    webhookSecret,
    async refundInDashboard(paymentIntent, amountCents) {
      const refund = await refunds.refund(paymentIntent, amountCents);
      if (!('object' in refund)) throw new Error(refund.message);
      return { id: refund.id };
    },
    close: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}
