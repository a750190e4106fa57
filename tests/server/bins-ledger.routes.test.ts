import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { addBinAs, blindRivetBin, post } from '../helpers/crib';
import { buildTestApp, type SignedInAgent, type TestApp } from '../helpers/test-app';

let t: TestApp;
let qm: SignedInAgent;
let member: SignedInAgent;

beforeEach(async () => {
  t = await buildTestApp();
  await t.addCrew();
  qm = await t.signIn('qm@example.org');
  member = await t.signIn('member@example.org');
});
afterEach(() => t.close());

describe('bins and their ledger', () => {
  it('draws, receives and counts, with on hand always the ledger sum', async () => {
    const bin = await addBinAs(qm, blindRivetBin());
    expect(bin.code).toBe('B-0001');
    expect(bin.onHand).toBe(500);

    const drawn = await post(member, `/api/bins/${bin.code}/draw`, { quantity: 120, note: 'left aileron' });
    expect(drawn.status).toBe(201);
    expect(drawn.body).toMatchObject({ kind: 'draw', quantity: -120, balanceAfter: 380, valueCents: -1440, member: { name: expect.any(String) } });

    const received = await post(qm, `/api/bins/${bin.code}/receive`, { quantity: 200, unitCost: 0.13 });
    expect(received.status).toBe(201);
    expect(received.body).toMatchObject({ kind: 'receive', quantity: 200, balanceAfter: 580, unitCost: 0.13 });

    const counted = await post(qm, `/api/bins/${bin.code}/count`, { counted: 575, note: 'quarterly count' });
    expect(counted.status).toBe(201);
    expect(counted.body).toMatchObject({ kind: 'count', quantity: -5, counted: 575, onHandBefore: 580, variance: -5, varianceValueCents: -65 });

    const got = await member.agent.get(`/api/bins/${bin.code}`);
    expect(got.body).toMatchObject({ code: bin.code, onHand: 575, designation: 'Blind, structural, dome, 5056, steel stem · 1/8 in · grip −2 (0.063–0.125 in)' });

    const ledger = await member.agent.get(`/api/bins/${bin.code}/ledger`);
    expect(ledger.body.data.map((m: { kind: string }) => m.kind)).toEqual(['count', 'receive', 'draw', 'receive']);
    expect(ledger.body.data.reduce((s: number, m: { quantity: number }) => s + m.quantity, 0)).toBe(575);
  });

  it('refuses to draw more than is on hand, and writes nothing', async () => {
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 30 }));
    const res = await post(member, `/api/bins/${bin.code}/draw`, { quantity: 31 });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('INSUFFICIENT_STOCK');
    expect(res.body.error.message).toContain('only 30 on hand');
    const ledger = await member.agent.get(`/api/bins/${bin.code}/ledger`);
    expect(ledger.body.data).toHaveLength(1);
  });

  it('reverses an entry once, naming it, and moves stock between bins of one spec', async () => {
    const a = await addBinAs(qm, blindRivetBin());
    const b = await addBinAs(qm, blindRivetBin({ initialQuantity: 0, location: 'Shelf B1' }));
    const drawn = await post(member, `/api/bins/${a.code}/draw`, { quantity: 50 });
    const rev = await post(qm, `/api/bins/${a.code}/ledger/${drawn.body.id}/reverse`, { note: 'scanned the wrong bin' });
    expect(rev.status).toBe(201);
    expect(rev.body).toMatchObject({ kind: 'reversal', quantity: 50, reversesId: drawn.body.id, balanceAfter: 500 });
    const again = await post(qm, `/api/bins/${a.code}/ledger/${drawn.body.id}/reverse`, { note: 'again' });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('ALREADY_REVERSED');

    const moved = await post(qm, `/api/bins/${a.code}/move`, { to: b.code, quantity: 100 });
    expect(moved.status).toBe(201);
    expect(moved.body).toMatchObject({ kind: 'transfer_out', quantity: -100, otherBinCode: b.code });
    const bLedger = await qm.agent.get(`/api/bins/${b.code}/ledger`);
    expect(bLedger.body.data[0]).toMatchObject({ kind: 'transfer_in', quantity: 100, otherBinCode: a.code });
    const undo = await post(qm, `/api/bins/${b.code}/ledger/${bLedger.body.data[0].id}/reverse`, { note: 'wrong shelf' });
    expect(undo.status).toBe(201);
    expect((await qm.agent.get(`/api/bins/${a.code}`)).body.onHand).toBe(500);
    expect((await qm.agent.get(`/api/bins/${b.code}`)).body.onHand).toBe(0);
  });
});
