import { describe, expect } from 'vitest';
import { sweepIdempotencyKeys } from '../../server/features/idempotency/idempotency.service';
import { addBinAs, addToolAs, blindRivetBin } from '../helpers/crib';
import { crewTest } from '../helpers/crew-test';
import type { SignedInAgent } from '../helpers/test-app';

const HOUR = 60 * 60 * 1000;
const DAY = 24 * HOUR;

/** A POST as a queued action would send it: CSRF token plus the queue's headers. */
const send = (who: SignedInAgent, path: string, body: object, headers: Record<string, string> = {}) => {
  const req = who.agent.post(path).set('X-CSRF-Token', who.csrf);
  for (const [name, value] of Object.entries(headers)) req.set(name, value);
  return req.send(body);
};
const iso = (ms: number) => new Date(ms).toISOString();
const test = crewTest
  .extend('now', ({ clock }) => () => clock.now.getTime())
  .extend('onHand', ({ member }) => async (code: string) => (await member.agent.get(`/api/bins/${code}`)).body.onHand as number)
  .extend('openLoans', ({ qm }) => async () => (await qm.agent.get('/api/loans/open')).body.data as { tool: { code: string }; holder: { name: string } }[]);

describe('Idempotency-Key on check out, return, draw and return unused', () => {
  test('checks a tool out once for two sends of one key, and answers the same both times, the second marked replayed', async ({ t, qm, member, now, openLoans }) => {
    const tool = await addToolAs(qm, { name: 'Air drill, straight', category: 'other', loanDays: 3 });
    const first = await send(member, `/api/tools/${tool.code}/checkout`, {}, { 'Idempotency-Key': 'checkout-key-0001' });
    expect(first.status).toBe(201);
    expect(first.headers['idempotent-replayed']).toBeUndefined();
    t.clock.now = new Date(now() + 5 * 60_000);
    const second = await send(member, `/api/tools/${tool.code}/checkout`, {}, { 'Idempotency-Key': 'checkout-key-0001' });
    expect(second.status).toBe(201);
    expect(second.headers['idempotent-replayed']).toBe('true');
    expect(second.headers['content-type']).toMatch(/application\/json/);
    expect(second.body).toEqual(first.body);
    expect(await openLoans()).toHaveLength(1);
    const events = (await member.agent.get(`/api/tools/${tool.code}/events`)).body.data as { action: string }[];
    expect(events.filter((e) => e.action === 'checked_out')).toHaveLength(1);
  });

  test('draws once for two sends of one key: stock drops once and both answers match', async ({ qm, member, onHand }) => {
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 500 }));
    const first = await send(member, `/api/bins/${bin.code}/draw`, { quantity: 40, note: 'left flap' }, { 'Idempotency-Key': 'draw-key-0001' });
    expect(first.status).toBe(201);
    // The same body with its keys in another order is the same body.
    const second = await send(member, `/api/bins/${bin.code}/draw`, { note: 'left flap', quantity: 40 }, { 'Idempotency-Key': 'draw-key-0001' });
    expect(second.status).toBe(201);
    expect(second.headers['idempotent-replayed']).toBe('true');
    expect(second.body).toEqual(first.body);
    expect(await onHand(bin.code)).toBe(460);
    const ledger = (await member.agent.get(`/api/bins/${bin.code}/ledger`)).body.data as { kind: string }[];
    expect(ledger.filter((m) => m.kind === 'draw')).toHaveLength(1);
  });

  test('returns unused and returns a tool once per key', async ({ qm, member, onHand }) => {
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 100 }));
    await send(member, `/api/bins/${bin.code}/draw`, { quantity: 30 });
    const back = [0, 1].map(() => send(member, `/api/bins/${bin.code}/return`, { quantity: 10 }, { 'Idempotency-Key': 'return-unused-01' }));
    const [a, b] = await Promise.all(back);
    expect([a!.status, b!.status]).toEqual([201, 201]);
    expect(b!.body).toEqual(a!.body);
    expect(await onHand(bin.code)).toBe(80);

    const tool = await addToolAs(qm, { name: 'Rivet puller, hand', category: 'other' });
    await send(member, `/api/tools/${tool.code}/checkout`, {});
    const r1 = await send(member, `/api/tools/${tool.code}/return`, { condition: 'ok' }, { 'Idempotency-Key': 'tool-return-01' });
    const r2 = await send(member, `/api/tools/${tool.code}/return`, { condition: 'ok' }, { 'Idempotency-Key': 'tool-return-01' });
    expect(r1.status).toBe(200);
    expect(r2.status).toBe(200);
    expect(r2.headers['idempotent-replayed']).toBe('true');
    expect(r2.body).toEqual(r1.body);
  });

  test('answers 422 IDEMPOTENCY_KEY_REUSED for the same key with another body or path, and changes nothing', async ({ qm, member, onHand }) => {
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 500 }));
    const other = await addBinAs(qm, blindRivetBin({ initialQuantity: 500, location: 'Shelf B1' }));
    await send(member, `/api/bins/${bin.code}/draw`, { quantity: 40 }, { 'Idempotency-Key': 'draw-key-0002' });
    const changed = await send(member, `/api/bins/${bin.code}/draw`, { quantity: 41 }, { 'Idempotency-Key': 'draw-key-0002' });
    expect(changed.status).toBe(422);
    expect(changed.headers['content-type']).toMatch(/application\/json/);
    expect(changed.body.error.code).toBe('IDEMPOTENCY_KEY_REUSED');
    expect(changed.body.error.message).toMatch(/different body/);
    const elsewhere = await send(member, `/api/bins/${other.code}/draw`, { quantity: 40 }, { 'Idempotency-Key': 'draw-key-0002' });
    expect(elsewhere.status).toBe(422);
    expect(elsewhere.body.error.code).toBe('IDEMPOTENCY_KEY_REUSED');
    expect(elsewhere.body.error.message).toContain(`POST /api/bins/${bin.code}/draw`);
    expect(await onHand(bin.code)).toBe(460);
    expect(await onHand(other.code)).toBe(500);
  });

  test('keeps keys per member: another member’s same key is a new action', async ({ qm, member, otherMember, onHand }) => {
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 500 }));
    const mine = await send(member, `/api/bins/${bin.code}/draw`, { quantity: 40 }, { 'Idempotency-Key': 'shared-key-0001' });
    const theirs = await send(otherMember, `/api/bins/${bin.code}/draw`, { quantity: 40 }, { 'Idempotency-Key': 'shared-key-0001' });
    expect(theirs.status).toBe(201);
    expect(theirs.headers['idempotent-replayed']).toBeUndefined();
    expect(theirs.body.member.name).toBe('Ines Other');
    expect(theirs.body.id).not.toBe(mine.body.id);
    expect(await onHand(bin.code)).toBe(420);
  });

  test('replays a refusal as the same refusal, even once the action would succeed', async ({ qm, member, otherMember, onHand, openLoans }) => {
    const tool = await addToolAs(qm, { name: 'Rivet gun, 2X', category: 'other' });
    await send(member, `/api/tools/${tool.code}/checkout`, {});
    const refused = await send(otherMember, `/api/tools/${tool.code}/checkout`, {}, { 'Idempotency-Key': 'queued-checkout-1' });
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('TOOL_ON_LOAN');
    await send(member, `/api/tools/${tool.code}/return`, { condition: 'ok' });
    const again = await send(otherMember, `/api/tools/${tool.code}/checkout`, {}, { 'Idempotency-Key': 'queued-checkout-1' });
    expect(again.status).toBe(409);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.body).toEqual(refused.body);
    expect(await openLoans()).toHaveLength(0);

    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 10 }));
    const short = await send(member, `/api/bins/${bin.code}/draw`, { quantity: 11 }, { 'Idempotency-Key': 'queued-draw-0001' });
    expect(short.status).toBe(409);
    expect(short.body.error.code).toBe('INSUFFICIENT_STOCK');
    await send(qm, `/api/bins/${bin.code}/receive`, { quantity: 100 });
    const shortAgain = await send(member, `/api/bins/${bin.code}/draw`, { quantity: 11 }, { 'Idempotency-Key': 'queued-draw-0001' });
    expect(shortAgain.status).toBe(409);
    expect(shortAgain.body).toEqual(short.body);
    expect(await onHand(bin.code)).toBe(110);
  });

  test('stores nothing for an unexpected failure, so the same key runs the action when sent again', async ({ t, qm, member, openLoans }) => {
    const tool = await addToolAs(qm, { name: 'Rivet puller, long reach', category: 'other' });
    // The audit trail refusing a row stands in for a fault the service does not expect.
    t.db.$client.exec("create trigger fail_event before insert on tool_events begin select raise(abort, 'disk trouble'); end");
    const failed = await send(member, `/api/tools/${tool.code}/checkout`, {}, { 'Idempotency-Key': 'after-a-fault-01' });
    expect(failed.status).toBe(500);
    expect(failed.body.error.code).toBe('INTERNAL_ERROR');
    expect(await openLoans()).toHaveLength(0);
    t.db.$client.exec('drop trigger fail_event');
    const retried = await send(member, `/api/tools/${tool.code}/checkout`, {}, { 'Idempotency-Key': 'after-a-fault-01' });
    expect(retried.status).toBe(201);
    expect(retried.headers['idempotent-replayed']).toBeUndefined();
    expect(await openLoans()).toHaveLength(1);
  });

  test('answers 400 INVALID_HEADER naming a malformed key or time, and does nothing', async ({ qm, member, now, onHand }) => {
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 500 }));
    const shortKey = await send(member, `/api/bins/${bin.code}/draw`, { quantity: 1 }, { 'Idempotency-Key': 'short' });
    expect(shortKey.status).toBe(400);
    expect(shortKey.body.error.code).toBe('INVALID_HEADER');
    expect(shortKey.body.error.issues[0].path).toBe('Idempotency-Key');
    expect(shortKey.body.error.message).toMatch(/Idempotency-Key/);
    const badTime = await send(member, `/api/bins/${bin.code}/draw`, { quantity: 1 }, { 'X-Performed-At': 'yesterday at noon' });
    expect(badTime.status).toBe(400);
    expect(badTime.body.error.issues[0].path).toBe('X-Performed-At');
    const badCopy = await send(member, `/api/bins/${bin.code}/draw`, { quantity: 1 }, { 'X-Performed-At': iso(now()), 'X-Catalogue-At': '2026-13-40' });
    expect(badCopy.status).toBe(400);
    expect(badCopy.body.error.message).toMatch(/X-Catalogue-At/);
    expect(await onHand(bin.code)).toBe(500);
  });
});

describe('X-Performed-At and X-Catalogue-At', () => {
  test('records a check out at the member’s time, with the due date counted from it and the arrival beside it', async ({ qm, member, now }) => {
    const tool = await addToolAs(qm, { name: 'Air drill, angle', category: 'other', loanDays: 3 });
    const performed = now() - 13 * HOUR; // Monday 23:00, the chapter day before it reached the server
    const res = await send(member, `/api/tools/${tool.code}/checkout`, {}, { 'X-Performed-At': iso(performed), 'X-Catalogue-At': iso(now() - 14 * HOUR) });
    expect(res.status).toBe(201);
    expect(res.body.checkedOutAt).toBe(iso(performed));
    const due = '2026-12-03T23:59:59.999Z'; // the end of the chapter day 3 days after Monday, not after Tuesday
    expect(res.body.dueAt).toBe(due);
    expect(res.body.recordedAt).toBe(iso(now()));
    const mine = (await member.agent.get('/api/loans/mine')).body.data as { checkedOutAt: string; checkoutRecordedAt: string }[];
    expect(mine[0]).toMatchObject({ checkedOutAt: iso(performed), dueAt: due, checkoutRecordedAt: iso(now()) });
  });

  test('records a time in the future as the arrival time', async ({ qm, member, now }) => {
    const tool = await addToolAs(qm, { name: 'Spacing fan', category: 'other' });
    const res = await send(member, `/api/tools/${tool.code}/checkout`, {}, { 'X-Performed-At': iso(now() + 3 * HOUR) });
    expect(res.body.checkedOutAt).toBe(iso(now()));
  });

  test('records a time before the catalogue copy as the copy’s time, and keeps the arrival on the ledger entry', async ({ qm, member, now }) => {
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 500 }));
    const copy = now() - HOUR;
    const res = await send(member, `/api/bins/${bin.code}/draw`, { quantity: 5 }, { 'X-Performed-At': iso(now() - 5 * HOUR), 'X-Catalogue-At': iso(copy) });
    expect(res.status).toBe(201);
    expect(res.body.at).toBe(iso(copy));
    expect(res.body.arrivedAt).toBe(iso(now()));
  });

  test('records a time more than 7 days old as 7 days before arrival', async ({ qm, member, now }) => {
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 500 }));
    const res = await send(member, `/api/bins/${bin.code}/draw`, { quantity: 5 }, { 'X-Performed-At': iso(now() - 30 * DAY) });
    expect(res.body.at).toBe(iso(now() - 7 * DAY));
  });

  test('never records a return before its check out', async ({ t, qm, member, now }) => {
    const tool = await addToolAs(qm, { name: 'Deburring tool', category: 'other' });
    const out = await send(member, `/api/tools/${tool.code}/checkout`, {});
    t.clock.now = new Date(now() + HOUR);
    const back = await send(member, `/api/tools/${tool.code}/return`, { condition: 'ok' }, { 'X-Performed-At': iso(now() - 3 * HOUR) });
    expect(back.status).toBe(200);
    expect(back.body.returnedAt).toBe(out.body.checkedOutAt);
    expect(back.body.recordedAt).toBe(iso(now()));
    const mine = (await member.agent.get('/api/loans/mine')).body.data as unknown[];
    expect(mine[0]).toMatchObject({ returnedAt: out.body.checkedOutAt, returnRecordedAt: iso(now()) });
    const events = (await member.agent.get(`/api/tools/${tool.code}/events`)).body.data as { action: string; at: string }[];
    expect(events.find((e) => e.action === 'returned')?.at).toBe(out.body.checkedOutAt);
  });
});

describe('sweeping old keys', () => {
  test('deletes keys older than 7 days and keeps newer ones', async ({ t, qm, member, now, onHand }) => {
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 500 }));
    await send(member, `/api/bins/${bin.code}/draw`, { quantity: 1 }, { 'Idempotency-Key': 'old-key-00001' });
    t.clock.now = new Date(now() + 6 * DAY);
    await send(member, `/api/bins/${bin.code}/draw`, { quantity: 1 }, { 'Idempotency-Key': 'new-key-00001' });
    t.clock.now = new Date(now() + 1 * DAY + 60_000);

    const ctx = { db: t.db, now: () => t.clock.now } as Parameters<typeof sweepIdempotencyKeys>[0];
    expect(sweepIdempotencyKeys(ctx)).toEqual({ deleted: 1 });

    const kept = await send(member, `/api/bins/${bin.code}/draw`, { quantity: 1 }, { 'Idempotency-Key': 'new-key-00001' });
    expect(kept.headers['idempotent-replayed']).toBe('true');
    // The swept key no longer answers: the same request is a new draw.
    const swept = await send(member, `/api/bins/${bin.code}/draw`, { quantity: 1 }, { 'Idempotency-Key': 'old-key-00001' });
    expect(swept.headers['idempotent-replayed']).toBeUndefined();
    expect(await onHand(bin.code)).toBe(497);
  });
});
