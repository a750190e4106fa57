import request from 'supertest';
import { describe, expect } from 'vitest';
import { checkoutStatusSchema, paymentSettingsSchema } from '@shared/schemas/payments';
import { onlinePayments } from '../../server/db/schema/payments';
import { memberPayments } from '../../server/db/schema/stock';
import { post } from '../helpers/crib';
import { paymentsTest } from '../helpers/crew-test';
import { checkout, drawOnTab, press, sessionIdOf } from '../helpers/payments-app';
import { buildTestApp, type SignedInAgent } from '../helpers/test-app';

// blindRivetBin costs $0.12 a rivet: 120 drawn is a tab of 1440 cents.
const TAB_CENTS = 120 * 12;

const balanceOf = async (who: SignedInAgent) => (await who.agent.get('/api/stock/tab')).body.balanceCents as number;

paymentsTest.override('t', ({ payments }) => payments.t);

const put = (who: SignedInAgent, body: unknown) => who.agent.put('/api/payments/settings').set('X-CSRF-Token', who.csrf).send(body as object);

const test = paymentsTest
  .extend('rows', ({ t }) => () => t.db.select().from(onlinePayments).orderBy(onlinePayments.id).all())
  /** An event about a checkout, signed as the provider signs it, delivered to the webhook. */
  .extend('deliverEvent', ({ payments: p }) => async (type: 'checkout.session.completed' | 'checkout.session.expired', eventId: string, session: object) => {
    const payload = JSON.stringify({ id: eventId, object: 'event', type, created: Math.floor(Date.now() / 1000), data: { object: session } });
    const signature = p.setup.provider.webhooks.generateTestHeaderString({ payload, secret: p.fake.webhookSecret });
    const res = await request(p.t.app).post('/api/payments/webhook').set('content-type', 'application/json').set('stripe-signature', signature).send(payload);
    expect(res.status).toBe(200);
  });

/** The fake provider's webhooks go to a closed port, as when its delivery is delayed. */
const lostWebhooksTest = test.extend('paymentsOptions', { webhooksLost: true });

describe('GET /api/payments/settings', () => {
  test('tells any signed-in person that payments are offered in US dollars through the local stand-in, with no key in the answer', async ({ payments: p, member }) => {
    const res = await member.agent.get('/api/payments/settings');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(paymentSettingsSchema.parse(res.body)).toEqual({ offered: true, currency: 'usd', minimumCents: 50, provider: 'local-fake' });
    const text = JSON.stringify(res.body);
    expect(text).not.toContain(p.fake.secretKey);
    expect(text).not.toContain(p.fake.webhookSecret);
    expect(text).not.toMatch(/sk_|whsec_|secret|key/i);
  });

  test('answers 401 when signed out', async ({ payments: p }) => {
    expect((await (await p.t.anonymous()).agent.get('/api/payments/settings')).status).toBe(401);
  });

  test('says online payment is off when the app has no provider at all', async () => {
    const bare = await buildTestApp();
    try {
      await bare.addCrew();
      const someone = await bare.signIn('member@example.org');
      expect((await someone.agent.get('/api/payments/settings')).body).toMatchObject({ offered: false });
    } finally {
      await bare.close();
    }
  });
});

describe('PUT /api/payments/settings', () => {
  test('lets the lead turn online payment off and choose a currency; everyone reads the change', async ({ lead, member }) => {
    const res = await put(lead, { offered: false, currency: 'cad' });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ offered: false, currency: 'cad', minimumCents: 50, provider: 'local-fake' });
    expect((await member.agent.get('/api/payments/settings')).body).toMatchObject({ offered: false, currency: 'cad' });
  });

  test('answers 400 naming the currency when it is not one of the list', async ({ lead, member }) => {
    const res = await put(lead, { offered: true, currency: 'XYZ' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.issues).toEqual([{ path: 'currency', message: 'Choose one of usd, cad, eur, gbp, aud, nzd.' }]);
    expect((await member.agent.get('/api/payments/settings')).body.currency).toBe('usd');
  });

  test('answers 400 naming offered when it is not true or false, and refuses an unknown field', async ({ lead }) => {
    const res = await put(lead, { offered: 'yes', currency: 'usd' });
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toEqual([{ path: 'offered', message: 'Say whether online payment is offered: true or false.' }]);
    const key = await put(lead, { offered: true, currency: 'usd', secretKey: 'sk_live_x' });
    expect(key.status).toBe(400);
    expect(key.body.error.issues).toEqual([{ path: 'secretKey', message: 'Unknown field "secretKey".' }]);
  });

  test('answers 403 to a quartermaster or a member and changes nothing', async ({ qm, member }) => {
    expect((await put(qm, { offered: false, currency: 'eur' })).status).toBe(403);
    expect((await put(member, { offered: false, currency: 'eur' })).status).toBe(403);
    expect((await member.agent.get('/api/payments/settings')).body).toMatchObject({ offered: true, currency: 'usd' });
  });

  test('asks the next checkout in the chosen currency', async ({ payments: p, lead, qm, member }) => {
    await drawOnTab(qm, member, 120);
    expect((await put(lead, { offered: true, currency: 'eur' })).status).toBe(200);
    const url = await checkout(member);
    expect((await p.setup.provider.checkout.sessions.retrieve(sessionIdOf(url))).currency).toBe('eur');
    expect(await (await fetch(url)).text()).toContain('Pay €14.40 to the chapter');
  });
});

describe('POST /api/payments/checkout when the chapter does not offer online payment', () => {
  test('answers 409 ONLINE_PAYMENT_OFF pointing to cash, and opens nothing at the provider', async ({ lead, qm, member, rows }) => {
    await drawOnTab(qm, member, 120);
    await put(lead, { offered: false, currency: 'usd' });
    const res = await post(member, '/api/payments/checkout', {});
    expect(res.status).toBe(409);
    expect(res.body.error).toEqual({ code: 'ONLINE_PAYMENT_OFF', message: 'The chapter does not take payments online. Pay your tab in cash to the quartermaster.' });
    expect(rows()).toEqual([]);
  });
});

describe('coming back from the hosted page', () => {
  test('the success URL carries the placeholder, and the fake puts the session id in its place when sending the payer back', async ({ payments: p, qm, member }) => {
    await drawOnTab(qm, member, 120);
    const url = await checkout(member);
    const id = sessionIdOf(url);
    const session = await p.setup.provider.checkout.sessions.retrieve(id);
    expect(session.success_url).toBe('http://gripline.test/tab?payment=paid&checkout={CHECKOUT_SESSION_ID}');
    expect(await press(url, 'pay')).toBe(`http://gripline.test/tab?payment=paid&checkout=${id}`);
  });

  test('GET /api/payments/checkouts/:sessionId says open, then paid, with the amount and currency', async ({ qm, member }) => {
    await drawOnTab(qm, member, 120);
    const url = await checkout(member, { amountCents: 1000 });
    const id = sessionIdOf(url);
    const before = await member.agent.get(`/api/payments/checkouts/${id}`);
    expect(before.status).toBe(200);
    expect(checkoutStatusSchema.parse(before.body)).toEqual({ state: 'open', amountCents: 1000, currency: 'usd' });
    await press(url, 'pay');
    expect((await member.agent.get(`/api/payments/checkouts/${id}`)).body).toEqual({ state: 'paid', amountCents: 1000, currency: 'usd' });
  });

  test('answers 404 for another member’s checkout, the same as for one that does not exist', async ({ payments: p, qm, member }) => {
    await p.t.addUser({ email: 'other@example.org', name: 'Otto Other' });
    const other = await p.t.signIn('other@example.org');
    await drawOnTab(qm, other, 120);
    const theirs = sessionIdOf(await checkout(other));

    const res = await member.agent.get(`/api/payments/checkouts/${theirs}`);
    expect(res.status).toBe(404);
    expect(res.body.error).toEqual({ code: 'CHECKOUT_NOT_FOUND', message: 'No checkout of yours has that id.' });
    const none = await member.agent.get('/api/payments/checkouts/cs_test_none');
    expect(none.status).toBe(404);
    expect(none.body).toEqual(res.body);
  });

  test('answers 400 for an id that cannot be a checkout, and 401 when signed out', async ({ payments: p, member }) => {
    const bad = await member.agent.get('/api/payments/checkouts/not%20an%20id');
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues).toEqual([{ path: 'sessionId', message: 'That is not a checkout id.' }]);
    expect((await (await p.t.anonymous()).agent.get('/api/payments/checkouts/cs_test_x')).status).toBe(401);
  });
});

describe('several open checkouts', () => {
  test('a new checkout expires the member’s earlier open one at the provider; its page says so and offers the way back', async ({ payments: p, qm, member, rows }) => {
    await drawOnTab(qm, member, 120);
    const first = await checkout(member);
    const second = await checkout(member, { amountCents: 500 });

    expect(rows()).toMatchObject([
      { sessionId: sessionIdOf(first), state: 'expired', eventId: expect.stringMatching(/^evt_/) },
      { sessionId: sessionIdOf(second), state: 'open' },
    ]);
    expect((await p.setup.provider.checkout.sessions.retrieve(sessionIdOf(first))).status).toBe('expired');
    const page = await (await fetch(first)).text();
    expect(page).toContain('This checkout has expired');
    expect(page).toContain('<a href="http://gripline.test/tab">Back to My tab</a>');
    expect(page).not.toContain('value="pay"');
    expect((await member.agent.get(`/api/payments/checkouts/${sessionIdOf(first)}`)).body.state).toBe('expired');
  });

  test('Pay on a page left open on the expired checkout charges nothing and shows it expired', async ({ payments: p, qm, member }) => {
    await drawOnTab(qm, member, 120);
    const first = await checkout(member);
    await checkout(member);
    expect(await press(first, 'pay')).toBe(`/pay/${sessionIdOf(first)}`);
    expect(await balanceOf(member)).toBe(TAB_CENTS);
    expect(p.t.db.select().from(memberPayments).all()).toEqual([]);
  });

  test('leaves other members’ open checkouts alone', async ({ payments: p, qm, member }) => {
    await p.t.addUser({ email: 'other@example.org', name: 'Otto Other' });
    const other = await p.t.signIn('other@example.org');
    await drawOnTab(qm, other, 120);
    await drawOnTab(qm, member, 120);
    const theirs = await checkout(other);
    await checkout(member);
    expect((await other.agent.get(`/api/payments/checkouts/${sessionIdOf(theirs)}`)).body.state).toBe('open');
  });

  test('a completion for an expired checkout records no payment and is logged for the lead', async ({ payments: p, crew, qm, member, rows, deliverEvent }) => {
    await drawOnTab(qm, member, 120);
    const first = sessionIdOf(await checkout(member));
    await checkout(member);
    const session = await p.setup.provider.checkout.sessions.retrieve(first);
    await deliverEvent('checkout.session.completed', 'evt_test_late', { ...session, status: 'complete', payment_status: 'paid' });

    expect(p.t.db.select().from(memberPayments).all()).toEqual([]);
    expect(await balanceOf(member)).toBe(TAB_CENTS);
    expect(rows()[0]).toMatchObject({ state: 'expired' });
    const warning = p.logged.map((l) => JSON.parse(l) as Record<string, unknown>).find((l) => l.msg === 'a completion for an expired checkout was not recorded');
    expect(warning).toMatchObject({ sessionId: first, eventId: 'evt_test_late', userId: crew.member.id });
  });

  test('an expiry the provider sends on its own (the checkout lapsed) closes the open checkout', async ({ payments: p, qm, member, rows, deliverEvent }) => {
    await drawOnTab(qm, member, 120);
    const id = sessionIdOf(await checkout(member));
    const session = await p.setup.provider.checkout.sessions.retrieve(id);
    await deliverEvent('checkout.session.expired', 'evt_test_lapsed', { ...session, status: 'expired' });
    expect(rows()).toMatchObject([{ state: 'expired', eventId: 'evt_test_lapsed' }]);
  });

  lostWebhooksTest('leaves open a checkout the provider will not expire (paid, its completion still on the way), and records that completion when it comes', async ({ payments: p, qm, member, rows, deliverEvent }) => {
    await drawOnTab(qm, member, 120);
    const first = await checkout(member, { amountCents: 1000 });
    // Paid at the provider; its webhook does not reach Gripline this time.
    await fetch(first, { method: 'POST', body: new URLSearchParams({ choice: 'pay' }), redirect: 'manual' });
    expect((await p.setup.provider.checkout.sessions.retrieve(sessionIdOf(first))).status).toBe('complete');

    await checkout(member, { amountCents: 440 });
    expect(rows().map((r) => r.state)).toEqual(['open', 'open']);

    const session = await p.setup.provider.checkout.sessions.retrieve(sessionIdOf(first));
    await deliverEvent('checkout.session.completed', 'evt_test_delayed', session);
    expect(rows().map((r) => r.state)).toEqual(['paid', 'open']);
    expect(await balanceOf(member)).toBe(TAB_CENTS - 1000);
  });
});
