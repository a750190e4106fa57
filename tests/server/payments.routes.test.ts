import request from 'supertest';
import { describe, expect } from 'vitest';
import { refusedCheckoutListSchema } from '@shared/schemas/payments';
import { outboxMail } from '../../server/db/schema/mail';
import { onlinePayments } from '../../server/db/schema/payments';
import { memberPayments } from '../../server/db/schema/stock';
import { paymentsTest } from '../helpers/crew-test';
import { checkout, drawOnTab as drawQuantity, sessionIdOf } from '../helpers/payments-app';
import { post } from '../helpers/crib';
import type { SignedInAgent } from '../helpers/test-app';

// blindRivetBin costs $0.12 a rivet: 120 drawn is a tab of 120 × 12 = 1440 cents.
const TAB_CENTS = 120 * 12;

const balanceOf = async (who: SignedInAgent) => (await who.agent.get('/api/stock/tab')).body.balanceCents as number;

/** Presses a button on the fake's hosted page; answers where the payer is sent. */
async function press(url: string, choice: 'pay' | 'cancel'): Promise<string> {
  const page = await fetch(url);
  expect(await page.text()).toContain('to the chapter');
  const res = await fetch(url, { method: 'POST', body: new URLSearchParams({ choice }), redirect: 'manual' });
  expect(res.status).toBe(303);
  return res.headers.get('location')!;
}

/** The app listens for real: the fake provider sends its webhook to it over loopback, as in production. */
paymentsTest.override('t', ({ payments }) => payments.t);

const test = paymentsTest
  .extend('fake', ({ payments }) => payments.fake)
  .extend('setup', ({ payments }) => payments.setup)
  /** What the app logged at warn and above, one JSON line each. */
  .extend('logged', ({ payments }) => payments.logged)
  .extend('drawOnTab', ({ qm }) => (who: SignedInAgent, quantity: number) => drawQuantity(qm, who, quantity))
  /** A completion event as the provider sends it, for a session the SDK retrieves from the fake. */
  .extend('completionEvent', ({ setup }) => async (sessionId: string, eventId: string, change: Record<string, unknown> = {}): Promise<string> => {
    const session = await setup.provider.checkout.sessions.retrieve(sessionId);
    return JSON.stringify({ id: eventId, object: 'event', type: 'checkout.session.completed', created: Math.floor(Date.now() / 1000), data: { object: { ...session, payment_status: 'paid', status: 'complete', ...change } } });
  })
  .extend('deliver', ({ t }) => (payload: string, signature?: string) => {
    const req = request(t.app).post('/api/payments/webhook').set('content-type', 'application/json');
    return (signature === undefined ? req : req.set('stripe-signature', signature)).send(payload);
  })
  .extend('signed', ({ setup, fake }) => (payload: string, opts: { secret?: string; timestamp?: number } = {}) =>
    setup.provider.webhooks.generateTestHeaderString({ payload, secret: opts.secret ?? fake.webhookSecret, timestamp: opts.timestamp }))
  .extend('paymentCount', ({ t }) => () => t.db.select().from(memberPayments).all().length);

describe('POST /api/payments/checkout', () => {
  test('opens a hosted checkout for the whole of the member’s own balance', async ({ t, crew, member, fake, setup, drawOnTab }) => {
    await drawOnTab(member, 120);
    const url = await checkout(member);
    expect(url).toMatch(new RegExp(`^http://127\\.0\\.0\\.1:${fake.port}/pay/cs_test_`));
    const session = await setup.provider.checkout.sessions.retrieve(sessionIdOf(url));
    expect(session).toMatchObject({
      object: 'checkout.session',
      amount_total: TAB_CENTS,
      currency: 'usd',
      customer_email: 'member@example.org',
      client_reference_id: `member-${crew.member.id}`,
      payment_status: 'unpaid',
      status: 'open',
      success_url: 'http://gripline.test/tab?payment=paid&checkout={CHECKOUT_SESSION_ID}',
      cancel_url: 'http://gripline.test/tab?payment=cancelled',
    });
    expect(t.db.select().from(onlinePayments).all()).toMatchObject([{ sessionId: session.id, userId: crew.member.id, amountCents: TAB_CENTS, state: 'open', eventId: null }]);
  });

  test('takes a part of the balance, but never more than the member owes nor less than the minimum', async ({ member, setup, drawOnTab }) => {
    await drawOnTab(member, 120);
    const part = await checkout(member, { amountCents: 500 });
    expect((await setup.provider.checkout.sessions.retrieve(sessionIdOf(part))).amount_total).toBe(500);

    const above = await post(member, '/api/payments/checkout', { amountCents: TAB_CENTS + 1 });
    expect(above.status).toBe(400);
    expect(above.body.error).toMatchObject({ code: 'ABOVE_BALANCE', message: 'You owe $14.40; pay that much or less.' });
    const tiny = await post(member, '/api/payments/checkout', { amountCents: 49 });
    expect(tiny.status).toBe(400);
    expect(tiny.body.error.message).toContain('Online payments are at least $0.50.');
  });

  test('pays only the signed-in member’s own tab: another member’s balance cannot be reached', async ({ t, crew, member, drawOnTab }) => {
    await t.addUser({ email: 'other@example.org', name: 'Otto Other' });
    const other = await t.signIn('other@example.org');
    await drawOnTab(other, 300);
    await drawOnTab(member, 120);

    const naming = await post(member, '/api/payments/checkout', { userId: crew.quartermaster.id });
    expect(naming.status).toBe(400);
    expect(naming.body.error.issues).toEqual([{ path: 'userId', message: 'Unknown field "userId".' }]);
    const otherSum = await post(member, '/api/payments/checkout', { amountCents: 300 * 12 });
    expect(otherSum.status).toBe(400);
    expect(otherSum.body.error.code).toBe('ABOVE_BALANCE');
  });

  test('answers 400 with a message when nothing is owed', async ({ t, member }) => {
    const res = await post(member, '/api/payments/checkout', {});
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'NOTHING_OWED', message: 'Your tab is settled: there is nothing to pay.' });
    expect(t.db.select().from(onlinePayments).all()).toEqual([]);
  });

  test('answers 400 when the member has paid ahead', async ({ crew, qm, member, drawOnTab }) => {
    await drawOnTab(member, 10);
    expect((await post(qm, '/api/stock/payments', { userId: crew.member.id, amountCents: 500 })).status).toBe(201);
    expect(await balanceOf(member)).toBe(10 * 12 - 500);
    const res = await post(member, '/api/payments/checkout', { amountCents: 50 });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('NOTHING_OWED');
  });

  test('answers 400 when the balance is under the online minimum', async ({ member, drawOnTab }) => {
    await drawOnTab(member, 3);
    const res = await post(member, '/api/payments/checkout', {});
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'BELOW_MINIMUM', message: 'Your tab is $0.36, under the $0.50 online minimum. Pay it in cash to the quartermaster.' });
  });

  test('answers 401 when signed out', async ({ t }) => {
    const anon = await t.anonymous();
    expect((await post(anon, '/api/payments/checkout', {})).status).toBe(401);
  });
});

describe('the hosted page and the signed webhook', () => {
  test('Pay completes the payment through the webhook: the balance drops by the amount and a receipt is mailed', async ({ t, crew, member, drawOnTab }) => {
    await drawOnTab(member, 120);
    const url = await checkout(member, { amountCents: 1000 });
    expect(await press(url, 'pay')).toBe(`http://gripline.test/tab?payment=paid&checkout=${sessionIdOf(url)}`);

    expect(await balanceOf(member)).toBe(TAB_CENTS - 1000);
    const [row] = t.db.select().from(onlinePayments).all();
    expect(row).toMatchObject({ state: 'paid', eventId: expect.stringMatching(/^evt_/), memberPaymentId: expect.any(Number) });
    const tab = (await member.agent.get('/api/stock/tab')).body;
    expect(tab.payments).toMatchObject([{ amountCents: 1000, note: 'Paid online', recordedBy: { id: crew.member.id } }]);
    const receipt = await t.lastMailTo('member@example.org');
    expect(receipt?.subject).toBe('Payment received: $10.00 on your tab');
    expect(receipt?.text).toContain('You still owe $4.40.');
  });

  test('Cancel sends the member back and records nothing', async ({ t, member, drawOnTab }) => {
    await drawOnTab(member, 120);
    const url = await checkout(member);
    expect(await press(url, 'cancel')).toBe('http://gripline.test/tab?payment=cancelled');
    expect(await balanceOf(member)).toBe(TAB_CENTS);
    expect(t.db.select().from(onlinePayments).all()).toMatchObject([{ state: 'open' }]);
  });

  test('records the same event delivered twice once, and a later duplicate completion not at all', async ({ t, member, drawOnTab, completionEvent, deliver, signed, paymentCount }) => {
    await drawOnTab(member, 120);
    const id = sessionIdOf(await checkout(member));
    const payload = await completionEvent(id, 'evt_test_once');
    expect((await deliver(payload, signed(payload))).status).toBe(200);
    expect((await deliver(payload, signed(payload))).status).toBe(200);
    const again = await completionEvent(id, 'evt_test_again');
    expect((await deliver(again, signed(again))).status).toBe(200);

    expect(paymentCount()).toBe(1);
    expect(await balanceOf(member)).toBe(0);
    expect(t.db.select().from(onlinePayments).all()).toMatchObject([{ state: 'paid', eventId: 'evt_test_once' }]);
  });

  test('refuses a forged, missing or stale signature with 400 and changes nothing', async ({ t, member, drawOnTab, completionEvent, deliver, signed, paymentCount }) => {
    await drawOnTab(member, 120);
    const payload = await completionEvent(sessionIdOf(await checkout(member)), 'evt_test_forged');
    const forged = await deliver(payload, signed(payload, { secret: 'whsec_not_the_chapters' }));
    expect(forged.status).toBe(400);
    expect(forged.body.error.code).toBe('BAD_SIGNATURE');
    expect((await deliver(payload)).status).toBe(400);
    const tenMinutesAgo = Math.floor(Date.now() / 1000) - 600;
    expect((await deliver(payload, signed(payload, { timestamp: tenMinutesAgo }))).status).toBe(400);
    const tampered = await deliver(payload.replace(String(TAB_CENTS), '1'), signed(payload));
    expect(tampered.status).toBe(400);

    expect(paymentCount()).toBe(0);
    expect(await balanceOf(member)).toBe(TAB_CENTS);
    expect(t.db.select().from(onlinePayments).all()).toMatchObject([{ state: 'open', eventId: null }]);
  });

  test('refuses a completion whose amount is not the checkout’s: nothing comes off the tab', async ({ t, crew, member, fake, logged, drawOnTab, completionEvent, deliver, signed, paymentCount }) => {
    await drawOnTab(member, 120);
    const payload = await completionEvent(sessionIdOf(await checkout(member)), 'evt_test_short', { amount_total: 100 });
    expect((await deliver(payload, signed(payload))).status).toBe(200);
    expect(paymentCount()).toBe(0);
    expect(await balanceOf(member)).toBe(TAB_CENTS);
    expect(t.db.select().from(onlinePayments).all()).toMatchObject([{ state: 'refused', eventId: 'evt_test_short' }]);
    const warning = logged.map((l) => JSON.parse(l) as Record<string, unknown>).find((l) => l.msg === 'an online payment was refused: its amount does not match the checkout');
    expect(warning).toMatchObject({ eventId: 'evt_test_short', userId: crew.member.id, expected: { amountCents: TAB_CENTS }, received: { amountCents: 100 } });
    expect(logged.join('')).not.toContain(fake.webhookSecret);
    expect(logged.join('')).not.toContain(fake.secretKey);
  });

  test('keeps what the provider reported on a refused completion, mails the lead and lists it for the lead and the quartermaster', async ({ t, crew, qm, member, drawOnTab, completionEvent, deliver, signed }) => {
    await drawOnTab(member, 120);
    const sessionId = sessionIdOf(await checkout(member));
    const payload = await completionEvent(sessionId, 'evt_test_euros', { amount_total: 900, currency: 'eur' });
    expect((await deliver(payload, signed(payload))).status).toBe(200);
    expect(t.db.select().from(onlinePayments).all()).toMatchObject([{ state: 'refused', amountCents: TAB_CENTS, currency: 'usd', receivedAmountCents: 900, receivedCurrency: 'eur' }]);

    const mails = t.db.select().from(outboxMail).all();
    expect(mails.map((m) => m.toAddress)).toEqual(['lead@example.org']);
    expect(mails[0]!.subject).toBe(`An online payment from ${crew.member.name} was refused`);
    expect(mails[0]!.textBody).toContain(`asked ${crew.member.name} for $14.40`);
    expect(mails[0]!.textBody).toContain('the provider reported €9.00');
    expect(mails[0]!.textBody).toContain('refund it in the provider’s dashboard or record the payment by hand');

    expect((await member.agent.get('/api/payments/refused')).status).toBe(403);
    const lead = await t.signIn('lead@example.org');
    for (const who of [qm, lead]) {
      const res = await who.agent.get('/api/payments/refused');
      expect(res.status).toBe(200);
      expect(refusedCheckoutListSchema.parse(res.body).data).toEqual([
        { id: expect.any(Number), member: { id: crew.member.id, name: crew.member.name }, askedCents: TAB_CENTS, currency: 'usd', receivedCents: 900, receivedCurrency: 'eur', at: expect.any(String), sessionId },
      ]);
    }
  });

  test('lists no refused checkouts when every completion matched', async ({ payments: p, t, qm, member, drawOnTab }) => {
    await drawOnTab(member, 120);
    await p.payOnline(member);
    const res = await qm.agent.get('/api/payments/refused');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ data: [] });
    expect(t.db.select().from(outboxMail).all().map((m) => m.toAddress)).toEqual(['member@example.org']);
  });
});

describe('when the provider cannot be reached', () => {
  test('answers 502 with a message, and opens no checkout', async ({ t, member, fake, drawOnTab }) => {
    await drawOnTab(member, 120);
    await fake.close();
    const res = await post(member, '/api/payments/checkout', {});
    expect(res.status).toBe(502);
    expect(res.body.error).toMatchObject({ code: 'PROVIDER_UNAVAILABLE', message: 'The payment provider could not be reached. Try again in a minute, or pay the quartermaster in cash.' });
    expect(t.db.select().from(onlinePayments).all()).toEqual([]);
  });
});
