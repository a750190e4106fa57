import { eq } from 'drizzle-orm';
import Papa from 'papaparse';
import { describe, expect } from 'vitest';
import { paymentListSchema, refundSchema, type PaymentListItem } from '@shared/schemas/payments';
import { migrateDatabase } from '../../server/db/client';
import { outboxMail } from '../../server/db/schema/mail';
import { onlinePayments } from '../../server/db/schema/payments';
import { memberPayments, paymentRefunds } from '../../server/db/schema/stock';
import { writeChapterTimeZone } from '../../server/settings/chapter-time-zone';
import { post } from '../helpers/crib';
import { withDatabaseBefore } from '../helpers/migrations-before';
import { paymentsTest } from '../helpers/crew-test';
import type { SignedInAgent } from '../helpers/test-app';

// blindRivetBin costs $0.12 a rivet: 120 drawn is a tab of 120 × 12 = 1440 cents.
const TAB_CENTS = 120 * 12;

const balanceOf = async (who: SignedInAgent) => (await who.agent.get('/api/stock/tab')).body.balanceCents as number;

const refund = (who: SignedInAgent, id: number, body: object = {}) => post(who, `/api/payments/${id}/refund`, body);

/** A `charge.refunded` event for a payment intent, as the provider sends it. */
function chargeRefunded(paymentIntent: string, eventId: string): string {
  const charge = { id: 'ch_test_refunded', object: 'charge', amount: TAB_CENTS, amount_refunded: TAB_CENTS, currency: 'usd', payment_intent: paymentIntent, refunded: true, status: 'succeeded' };
  return JSON.stringify({ id: eventId, object: 'event', type: 'charge.refunded', created: Math.floor(Date.now() / 1000), data: { object: charge } });
}

paymentsTest.override('t', ({ payments }) => payments.t);

const test = paymentsTest
  .extend('listed', ({ lead }) => async (who: SignedInAgent = lead, query = ''): Promise<PaymentListItem[]> => {
    const res = await who.agent.get(`/api/payments${query}`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    return paymentListSchema.parse(res.body).data;
  })
  /** The member draws 120 rivets and pays `amountCents` of it online; answers the member payment. */
  .extend('paidOnline', ({ qm, member, payments, listed }) => async (amountCents = TAB_CENTS): Promise<PaymentListItem> => {
    await payments.drawOnTab(qm, member, 120);
    await payments.payOnline(member, amountCents);
    const [payment] = await listed();
    expect(payment).toMatchObject({ method: 'online', amountCents, refundedCents: 0, refundableCents: amountCents });
    return payment!;
  })
  .extend('refundRows', ({ t }) => () => t.db.select().from(paymentRefunds).all())
  .extend('refundMails', ({ t }) => () => t.db.select().from(outboxMail).all().filter((m) => m.subject.startsWith('Refund:')))
  .extend('intentOf', ({ t }) => (memberPaymentId: number) => t.db.select().from(onlinePayments).where(eq(onlinePayments.memberPaymentId, memberPaymentId)).get()!.paymentIntentId!)
  .extend('refundAtFake', ({ payments }) => (form: Record<string, string>) =>
    fetch(`http://127.0.0.1:${payments.fake.port}/v1/refunds`, { method: 'POST', headers: { authorization: `Bearer ${payments.fake.secretKey}` }, body: new URLSearchParams(form) }))
  .extend('cashPayment', ({ t, qm, crew }) => async (amountCents: number, at: string, note = '') => {
    t.clock.now = new Date(at);
    const res = await post(qm, '/api/stock/payments', { userId: crew.member.id, amountCents, note });
    expect(res.status).toBe(201);
  });

describe('POST /api/payments/:id/refund', () => {
  test('refunds the whole online payment through the provider: the balance goes back up and the member is mailed', async ({ t, crew, lead, member, payments, listed, paidOnline, refundRows, refundMails, intentOf }) => {
    const payment = await paidOnline();
    expect(await balanceOf(member)).toBe(0);
    const intent = intentOf(payment.id);
    expect(intent).toMatch(/^pi_/);

    const res = await refund(lead, payment.id);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const made = refundSchema.parse(res.body);
    expect(made).toMatchObject({ paymentId: payment.id, amountCents: TAB_CENTS, refundedCents: TAB_CENTS, refundableCents: 0, providerRefundId: expect.stringMatching(/^re_/) });

    const atProvider = await payments.setup.provider.refunds.list({ payment_intent: intent });
    expect(atProvider.data).toMatchObject([{ id: made.providerRefundId, object: 'refund', amount: TAB_CENTS, currency: 'usd', payment_intent: intent, status: 'succeeded' }]);
    expect(await balanceOf(member)).toBe(TAB_CENTS);
    // The provider's charge.refunded reached Gripline before the SDK call answered: still one refund, in the lead's name.
    expect(refundRows()).toMatchObject([{ memberPaymentId: payment.id, amountCents: TAB_CENTS, providerRefundId: made.providerRefundId, recordedById: crew.lead.id }]);
    expect(refundMails()).toHaveLength(1);
    const mail = await t.lastMailTo('member@example.org');
    expect(mail?.subject).toBe('Refund: $14.40 back to your card');
    expect(mail?.text).toContain('Your tab now shows $14.40 owed.');
    expect(await listed()).toMatchObject([{ id: payment.id, refundedCents: TAB_CENTS, refundableCents: 0 }]);
  });

  test('refunds a part, then the rest when no amount is given, then refuses a third time', async ({ lead, member, paidOnline, refundRows }) => {
    const payment = await paidOnline();
    const part = await refund(lead, payment.id, { amountCents: 500 });
    expect(part.status).toBe(201);
    expect(part.body).toMatchObject({ amountCents: 500, refundedCents: 500, refundableCents: TAB_CENTS - 500 });
    expect(await balanceOf(member)).toBe(500);

    const rest = await refund(lead, payment.id);
    expect(rest.status).toBe(201);
    expect(rest.body).toMatchObject({ amountCents: TAB_CENTS - 500, refundedCents: TAB_CENTS, refundableCents: 0 });
    expect(await balanceOf(member)).toBe(TAB_CENTS);

    const again = await refund(lead, payment.id);
    expect(again.status).toBe(409);
    expect(again.body.error).toMatchObject({ code: 'ALREADY_REFUNDED', message: 'This payment of $14.40 has been refunded in full.' });
    expect(refundRows().map((r) => r.amountCents)).toEqual([500, TAB_CENTS - 500]);
  });

  test('refuses more than is left with 400 naming amountCents, and refunds nothing', async ({ lead, member, payments, paidOnline, intentOf }) => {
    const payment = await paidOnline();
    expect((await refund(lead, payment.id, { amountCents: 1000 })).status).toBe(201);
    const over = await refund(lead, payment.id, { amountCents: TAB_CENTS - 1000 + 1 });
    expect(over.status).toBe(400);
    expect(over.body.error).toMatchObject({ code: 'ABOVE_REFUNDABLE', message: 'Only $4.40 of this payment is left to refund.', issues: [{ path: 'amountCents', message: 'At most $4.40.' }] });
    const zero = await refund(lead, payment.id, { amountCents: 0 });
    expect(zero.status).toBe(400);
    expect(zero.body.error.issues).toEqual([{ path: 'amountCents', message: 'A refund is more than $0.00.' }]);
    expect((await payments.setup.provider.refunds.list({ payment_intent: intentOf(payment.id) })).data).toHaveLength(1);
    expect(await balanceOf(member)).toBe(1000);
  });

  test('refuses a cash payment with 409: cash is handed back in person', async ({ crew, lead, qm, member, payments, refundRows }) => {
    await payments.drawOnTab(qm, member, 120);
    const cash = await post(qm, '/api/stock/payments', { userId: crew.member.id, amountCents: 700, note: 'at the bench' });
    expect(cash.status).toBe(201);
    const res = await refund(lead, cash.body.id as number);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('CASH_PAYMENT');
    expect(res.body.error.message).toContain('hand the cash back in person');
    expect(refundRows()).toEqual([]);
    expect(await balanceOf(member)).toBe(TAB_CENTS - 700);
  });

  test('is the lead’s alone: the member and the quartermaster get 403 and nothing is refunded', async ({ qm, member, payments, paidOnline, refundRows, intentOf }) => {
    const payment = await paidOnline();
    expect((await refund(member, payment.id)).status).toBe(403);
    expect((await refund(qm, payment.id)).status).toBe(403);
    expect(refundRows()).toEqual([]);
    expect((await payments.setup.provider.refunds.list({ payment_intent: intentOf(payment.id) })).data).toEqual([]);
  });

  test('answers 404 for a payment that does not exist and 400 for an id that is not one', async ({ lead }) => {
    const missing = await refund(lead, 999);
    expect(missing.status).toBe(404);
    expect(missing.body.error.code).toBe('PAYMENT_NOT_FOUND');
    const bad = await refund(lead, 0);
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('id');
  });

  test('answers 502 when the provider cannot be reached, and records nothing', async ({ lead, member, payments, paidOnline, refundRows }) => {
    const payment = await paidOnline();
    await payments.fake.close();
    const res = await refund(lead, payment.id);
    expect(res.status).toBe(502);
    expect(res.body.error).toMatchObject({ code: 'PROVIDER_UNAVAILABLE', message: 'The payment provider could not be reached, so nothing was refunded. Try again in a minute.' });
    expect(refundRows()).toEqual([]);
    expect(await balanceOf(member)).toBe(0);
  });

  test('counts a refund in the month it was made: the payment’s month keeps it, this month takes the refund off paid', async ({ t, crew, lead, qm, member, paidOnline }) => {
    const payment = await paidOnline();
    t.db.update(memberPayments).set({ at: new Date('2026-10-20T12:00:00Z') }).where(eq(memberPayments.id, payment.id)).run();
    expect((await refund(lead, payment.id, { amountCents: 400 })).status).toBe(201);

    const tab = (await member.agent.get('/api/stock/tab')).body;
    expect(tab.paidCents).toBe(TAB_CENTS - 400);
    expect(tab.balanceCents).toBe(400);
    expect(tab.byMonth).toEqual([
      { month: '2026-12', chargedCents: TAB_CENTS, paidCents: -400 },
      { month: '2026-10', chargedCents: 0, paidCents: TAB_CENTS },
    ]);
    expect(tab.payments).toMatchObject([{ id: payment.id, method: 'online', refundedCents: 400 }]);
    const tabs = (await qm.agent.get('/api/stock/tabs')).body.data;
    expect(tabs).toMatchObject([{ member: { id: crew.member.id }, paidCents: TAB_CENTS - 400, balanceCents: 400 }]);
  });
});

describe('the fake provider’s refunds', () => {
  test('refuses an unknown payment or more than is left in the provider’s error shape', async ({ paidOnline, intentOf, refundAtFake }) => {
    const payment = await paidOnline();
    const unknown = await refundAtFake({ payment_intent: 'pi_nobody' });
    expect(unknown.status).toBe(400);
    expect(await unknown.json()).toEqual({ error: { type: 'invalid_request_error', code: 'resource_missing', message: "No such payment_intent: 'pi_nobody'" } });
    const over = await refundAtFake({ payment_intent: intentOf(payment.id), amount: String(TAB_CENTS + 1) });
    expect(over.status).toBe(400);
    expect(await over.json()).toEqual({
      error: { type: 'invalid_request_error', code: 'amount_too_large', message: `Refund amount (${TAB_CENTS + 1}) is greater than unrefunded amount on charge (${TAB_CENTS}).` },
    });
  });

  test('answers 409 with the provider’s reason when it refuses a refund Gripline thought possible', async ({ t, lead, payments, paidOnline, refundRows, intentOf }) => {
    const payment = await paidOnline();
    await payments.fake.refundInDashboard(intentOf(payment.id), 1000);
    // As if the provider's event about it had never arrived.
    t.db.delete(paymentRefunds).run();
    const res = await refund(lead, payment.id);
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: 'PROVIDER_REFUSED', message: `The payment provider refused: Refund amount (${TAB_CENTS}) is greater than unrefunded amount on charge (${TAB_CENTS - 1000}).` });
    expect(refundRows()).toEqual([]);
  });
});

describe('the provider’s charge.refunded webhook', () => {
  test('records a refund made in the provider’s dashboard once, however often it is delivered', async ({ lead, member, payments, listed, paidOnline, refundRows, refundMails, intentOf }) => {
    const payment = await paidOnline();
    const made = await payments.fake.refundInDashboard(intentOf(payment.id), 600);
    expect(refundRows()).toMatchObject([{ memberPaymentId: payment.id, amountCents: 600, providerRefundId: made.id, recordedById: null }]);
    expect(await balanceOf(member)).toBe(600);

    const event = chargeRefunded(intentOf(payment.id), 'evt_test_dashboard_again');
    expect((await payments.deliverSigned(event)).status).toBe(200);
    expect((await payments.deliverSigned(event)).status).toBe(200);
    expect(refundRows()).toHaveLength(1);
    expect(refundMails()).toHaveLength(1);

    // What is left to refund in Gripline accounts for the dashboard's refund.
    expect(await listed()).toMatchObject([{ refundedCents: 600, refundableCents: TAB_CENTS - 600 }]);
    const rest = await refund(lead, payment.id);
    expect(rest.body).toMatchObject({ amountCents: TAB_CENTS - 600, refundableCents: 0 });
    expect(await balanceOf(member)).toBe(TAB_CENTS);
  });

  test('never doubles a refund Gripline made and recorded when the provider’s event for it comes later', async ({ crew, lead, member, payments, paidOnline, refundRows, refundMails, intentOf }) => {
    const payment = await paidOnline();
    const made = await refund(lead, payment.id, { amountCents: 300 });
    expect(made.status).toBe(201);
    expect((await payments.deliverSigned(chargeRefunded(intentOf(payment.id), 'evt_test_late'))).status).toBe(200);
    expect(refundRows()).toMatchObject([{ amountCents: 300, providerRefundId: made.body.providerRefundId, recordedById: crew.lead.id }]);
    expect(refundMails()).toHaveLength(1);
    expect(await balanceOf(member)).toBe(300);
  });

  test('ignores a refund on a payment Gripline never recorded', async ({ payments, refundRows }) => {
    expect((await payments.deliverSigned(chargeRefunded('pi_not_ours', 'evt_test_stranger'))).status).toBe(200);
    expect(refundRows()).toEqual([]);
  });
});

describe('GET /api/payments', () => {
  test('lists cash and online payments together, newest first, for the quartermaster and the lead only', async ({ t, crew, qm, member, listed, paidOnline, cashPayment }) => {
    await cashPayment(200, '2026-11-10T18:00:00Z', 'at the bench');
    t.clock.now = new Date('2026-12-01T12:00:00Z');
    const online = await paidOnline(1000);

    const rows = await listed(qm);
    expect(rows).toEqual([
      { id: online.id, member: { id: crew.member.id, name: 'Mia Member' }, amountCents: 1000, method: 'online', refundedCents: 0, refundableCents: 1000, at: '2026-12-01T12:00:00.000Z', recordedBy: { id: crew.member.id, name: 'Mia Member' }, note: 'Paid online' },
      { id: expect.any(Number), member: { id: crew.member.id, name: 'Mia Member' }, amountCents: 200, method: 'cash', refundedCents: 0, refundableCents: 0, at: '2026-11-10T18:00:00.000Z', recordedBy: { id: crew.quartermaster.id, name: 'Quinn Quartermaster' }, note: 'at the bench' },
    ]);
    expect((await member.agent.get('/api/payments')).status).toBe(403);
    expect((await member.agent.get('/api/payments/export.csv')).status).toBe(403);
  });

  test('filters by method and by chapter days, both ends included', async ({ t, lead, qm, member, payments, listed, paidOnline, cashPayment }) => {
    writeChapterTimeZone(t.db, 'America/Chicago');
    await payments.drawOnTab(qm, member, 120);
    // 03:00 UTC on Nov 11 is still Nov 10 in Chicago.
    await cashPayment(100, '2026-11-11T03:00:00Z');
    await cashPayment(200, '2026-11-20T18:00:00Z');
    await cashPayment(300, '2026-11-21T07:00:00Z');
    t.clock.now = new Date('2026-12-01T12:00:00Z');
    await paidOnline(1000);

    expect((await listed(lead, '?method=cash')).map((r) => r.amountCents)).toEqual([300, 200, 100]);
    expect((await listed(lead, '?method=online')).map((r) => r.amountCents)).toEqual([1000]);
    expect((await listed(lead, '?from=2026-11-10&to=2026-11-10')).map((r) => r.amountCents)).toEqual([100]);
    expect((await listed(lead, '?from=2026-11-11&to=2026-11-20')).map((r) => r.amountCents)).toEqual([200]);
    expect((await listed(lead, '?from=2026-11-21')).map((r) => r.amountCents)).toEqual([1000, 300]);
    expect((await listed(lead, '?to=2026-11-20&method=cash')).map((r) => r.amountCents)).toEqual([200, 100]);
  });

  test('answers 400 saying what is wrong with a filter', async ({ lead }) => {
    const cases: [string, string, string][] = [
      ['?from=11/10/2026', 'from', 'Give the first day like 2026-11-30.'],
      ['?to=yesterday', 'to', 'Give the last day like 2026-11-30.'],
      ['?from=2026-11-20&to=2026-11-10', 'to', 'The last day is before the first day: swap them.'],
      ['?method=cheque', 'method', 'method is cash or online.'],
    ];
    for (const [query, path, message] of cases) {
      for (const route of ['/api/payments', '/api/payments/export.csv']) {
        const res = await lead.agent.get(`${route}${query}`);
        expect(res.status, `${route}${query}`).toBe(400);
        expect(res.body.error.issues).toEqual([{ path, message }]);
      }
    }
  });
});

describe('GET /api/payments/export.csv', () => {
  test('exports the payments with a header row, dollars with two places and chapter days, named for the days asked', async ({ t, crew, lead, qm, member, payments, paidOnline }) => {
    writeChapterTimeZone(t.db, 'America/Chicago');
    await payments.drawOnTab(qm, member, 120);
    t.clock.now = new Date('2026-11-11T03:00:00Z');
    expect((await post(qm, '/api/stock/payments', { userId: crew.member.id, amountCents: 1250, note: '=cash, with a comma' })).status).toBe(201);
    t.clock.now = new Date('2026-12-01T12:00:00Z');
    const online = await paidOnline(1000);
    expect((await refund(lead, online.id, { amountCents: 250 })).status).toBe(201);

    const res = await qm.agent.get('/api/payments/export.csv?from=2026-11-01&to=2026-12-31');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toBe('attachment; filename="gripline-payments-2026-11-01-to-2026-12-31.csv"');
    const parsed = Papa.parse<string[]>(res.text.replace(/^\uFEFF/, ''), { skipEmptyLines: true });
    expect(parsed.data).toEqual([
      ['payment_id', 'day', 'at_utc', 'member', 'method', 'amount', 'refunded', 'left_to_refund', 'recorded_by', 'note'],
      [String(online.id), '2026-12-01', '2026-12-01T12:00:00.000Z', 'Mia Member', 'Online', '10.00', '2.50', '7.50', 'Mia Member', 'Paid online'],
      [expect.any(String), '2026-11-10', '2026-11-11T03:00:00.000Z', 'Mia Member', 'Cash', '12.50', '0.00', '0.00', 'Quinn Quartermaster', "'=cash, with a comma"],
    ]);

    const onlineOnly = await lead.agent.get('/api/payments/export.csv?method=online');
    expect(onlineOnly.headers['content-disposition']).toBe('attachment; filename="gripline-payments-2026-12-01-to-2026-12-01-online.csv"');
    expect(Papa.parse(onlineOnly.text.replace(/^\uFEFF/, ''), { skipEmptyLines: true }).data).toHaveLength(2);
  });
});

describe('migration payment_refunds', () => {
  test('marks the payments that a paid checkout made as online, and the rest as cash', () => {
    withDatabaseBefore('_payment_refunds', (db) => {
      db.$client.prepare("insert into users (id, email, name, role, password_hash) values (1, 'm@example.org', 'M', 'member', 'x')").run();
      const pay = db.$client.prepare('insert into member_payments (id, user_id, amount_cents, at, note, recorded_by_id) values (?, 1, ?, 0, ?, 1)');
      pay.run(1, 500, 'cash at the bench');
      pay.run(2, 900, 'Paid online');
      db.$client
        .prepare("insert into online_payments (session_id, user_id, amount_cents, currency, state, member_payment_id, created_at, updated_at) values ('cs_1', 1, 900, 'usd', 'paid', 2, 0, 0)")
        .run();
      db.$client.prepare("insert into online_payments (session_id, user_id, amount_cents, currency, created_at, updated_at) values ('cs_2', 1, 300, 'usd', 0, 0)").run();
      migrateDatabase(db);
      expect(db.$client.prepare('select id, amount_cents, method from member_payments order by id').all()).toEqual([
        { id: 1, amount_cents: 500, method: 'cash' },
        { id: 2, amount_cents: 900, method: 'online' },
      ]);
      expect(db.$client.prepare('select count(*) as n from payment_refunds').get()).toEqual({ n: 0 });
    });
  });
});
