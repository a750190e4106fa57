import { describe, expect } from 'vitest';
import { addBinAs, blindRivetBin, patch, post } from '../helpers/crib';
import { crewTest } from '../helpers/crew-test';

describe('bins and their ledger', () => {
  crewTest('draws, receives and counts, with on hand always the ledger sum', async ({ qm, member }) => {
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

  crewTest('refuses to draw more than is on hand, and writes nothing', async ({ qm, member }) => {
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 30 }));
    const res = await post(member, `/api/bins/${bin.code}/draw`, { quantity: 31 });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('INSUFFICIENT_STOCK');
    expect(res.body.error.message).toContain('only 30 on hand');
    const ledger = await member.agent.get(`/api/bins/${bin.code}/ledger`);
    expect(ledger.body.data).toHaveLength(1);
  });

  crewTest('reverses an entry once, naming it, and moves stock between bins of one spec', async ({ qm, member }) => {
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

describe('parallel draws against one bin', () => {
  crewTest('never oversell: of 40 draws of 7 from 100, exactly 14 succeed and the ledger sums to 2', async ({ t, qm }) => {
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 100 }));
    const members = await Promise.all(
      [1, 2, 3, 4].map(async (i) => {
        await t.addUser({ email: `builder${i}@example.org`, name: `Builder ${i}` });
        return t.signIn(`builder${i}@example.org`);
      }),
    );
    const answers = await Promise.all(Array.from({ length: 40 }, (_, i) => post(members[i % 4]!, `/api/bins/${bin.code}/draw`, { quantity: 7 })));
    const statuses = answers.map((a) => a.status);
    expect(statuses.filter((s) => s === 201)).toHaveLength(14);
    expect(statuses.filter((s) => s === 409)).toHaveLength(26);
    expect(answers.filter((a) => a.status === 409).every((a) => a.body.error.code === 'INSUFFICIENT_STOCK')).toBe(true);
    const after = await qm.agent.get(`/api/bins/${bin.code}`);
    expect(after.body.onHand).toBe(2);
    const ledger = await qm.agent.get(`/api/bins/${bin.code}/ledger`);
    expect(ledger.body.data.reduce((s: number, m: { quantity: number }) => s + m.quantity, 0)).toBe(2);
    expect(ledger.body.data.every((m: { balanceAfter: number }) => m.balanceAfter >= 0)).toBe(true);
  });
});

describe('refusals', () => {
  crewTest('keeps receive, count, move, write-off and reverse to the quartermaster', async ({ qm, member }) => {
    const bin = await addBinAs(qm, blindRivetBin());
    for (const [path, body] of [
      ['receive', { quantity: 10 }],
      ['count', { counted: 10 }],
      ['move', { to: 'B-0009', quantity: 1 }],
      ['write-off', { quantity: 1, note: 'bent' }],
    ] as const) {
      const res = await post(member, `/api/bins/${bin.code}/${path}`, body);
      expect(res.status, path).toBe(403);
    }
    expect((await post(member, '/api/bins', blindRivetBin())).status).toBe(403);
    expect((await patch(member, `/api/bins/${bin.code}`, { location: 'Floor' })).status).toBe(403);
  });

  crewTest('answers bad input with 400 and words, unknown bins with 404', async ({ qm, member }) => {
    const bin = await addBinAs(qm, blindRivetBin());
    const zero = await post(member, `/api/bins/${bin.code}/draw`, { quantity: 0 });
    expect(zero.status).toBe(400);
    expect(zero.body.error.issues[0]).toMatchObject({ path: 'quantity' });
    const half = await post(member, `/api/bins/${bin.code}/draw`, { quantity: 2.5 });
    expect(half.status).toBe(400);
    const badCode = await member.agent.get('/api/bins/X-12');
    expect(badCode.status).toBe(400);
    const unknown = await post(member, '/api/bins/B-9999/draw', { quantity: 1 });
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.code).toBe('BIN_NOT_FOUND');
    const cost = await post(qm, `/api/bins/${bin.code}/receive`, { quantity: 5, unitCost: 0.123456 });
    expect(cost.status).toBe(400);
    const noReason = await post(qm, `/api/bins/${bin.code}/write-off`, { quantity: 5 });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.issues[0].path).toBe('note');
    expect((await member.agent.get(`/api/bins/${bin.code}/ledger`)).body.data).toHaveLength(1);
  });

  crewTest('refuses a write-off below zero, a return beyond what was drawn, and a move to a different spec', async ({ qm, member }) => {
    const a = await addBinAs(qm, blindRivetBin({ initialQuantity: 20 }));
    const other = await addBinAs(qm, blindRivetBin({ grip16: 3 }));
    const off = await post(qm, `/api/bins/${a.code}/write-off`, { quantity: 21, note: 'dropped' });
    expect(off.status).toBe(409);
    expect(off.body.error).toMatchObject({ code: 'INSUFFICIENT_STOCK', message: expect.stringContaining('only 20 on hand') });

    await post(member, `/api/bins/${a.code}/draw`, { quantity: 5 });
    const tooMany = await post(member, `/api/bins/${a.code}/return`, { quantity: 6 });
    expect(tooMany.status).toBe(409);
    expect(tooMany.body.error.code).toBe('RETURN_EXCEEDS_DRAWN');
    const back = await post(member, `/api/bins/${a.code}/return`, { quantity: 5 });
    expect(back.status).toBe(201);
    expect(back.body).toMatchObject({ kind: 'return_unused', quantity: 5, balanceAfter: 20 });

    const move = await post(qm, `/api/bins/${a.code}/move`, { to: other.code, quantity: 1 });
    expect(move.status).toBe(409);
    expect(move.body.error.code).toBe('NOT_SAME_SPEC');
  });

  crewTest('does not reverse a receipt whose stock has already gone', async ({ qm, member }) => {
    const a = await addBinAs(qm, blindRivetBin({ initialQuantity: 0 }));
    const got = await post(qm, `/api/bins/${a.code}/receive`, { quantity: 100 });
    await post(member, `/api/bins/${a.code}/draw`, { quantity: 60 });
    const undo = await post(qm, `/api/bins/${a.code}/ledger/${got.body.id}/reverse`, { note: 'wrong delivery' });
    expect(undo.status).toBe(409);
    expect(undo.body.error).toMatchObject({ code: 'INSUFFICIENT_STOCK', message: expect.stringContaining('only 40 on hand') });
  });

  crewTest('lets a draw name only the drawing member’s own assembly: 400 ASSEMBLY_NOT_YOURS otherwise, and nothing written', async ({ qm, member }) => {
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 100 }));
    const build = await post(member, '/api/builds', { name: 'Tool chest' });
    const lid = await post(member, `/api/builds/${build.body.id}/assemblies`, { name: 'Lid', unit: 'in' });
    expect(lid.status).toBe(201);

    const own = await post(member, `/api/bins/${bin.code}/draw`, { quantity: 10, assemblyId: lid.body.id });
    expect(own.status).toBe(201);
    expect(own.body).toMatchObject({ kind: 'draw', quantity: -10, assemblyId: lid.body.id });

    for (const [who, assemblyId] of [[qm, lid.body.id], [member, 9999]] as const) {
      const res = await post(who, `/api/bins/${bin.code}/draw`, { quantity: 5, assemblyId });
      expect(res.status).toBe(400);
      expect(res.headers['content-type']).toMatch(/json/);
      expect(res.body.error.code).toBe('ASSEMBLY_NOT_YOURS');
      expect(res.body.error.message).toBe(`Assembly ${assemblyId} is not one of your assemblies. Choose one of your own, or leave the assembly out.`);
    }
    const ledger = await member.agent.get(`/api/bins/${bin.code}/ledger`);
    expect(ledger.body.data.map((m: { quantity: number }) => m.quantity)).toEqual([-10, 100]);
    // The ledger names the assembly and its build; an entry for no assembly names none.
    expect(ledger.body.data.map((m: { assembly: unknown }) => m.assembly)).toEqual([{ name: 'Lid', buildName: 'Tool chest' }, null]);
  });
});

describe('what a scan offers', () => {
  crewTest('offers a member Draw, and a quartermaster Receive, Count, Move and Write off', async ({ qm, member }) => {
    const bin = await addBinAs(qm, blindRivetBin());
    await addBinAs(qm, blindRivetBin({ initialQuantity: 0, location: 'Overflow shelf' }));
    const forMember = await member.agent.get(`/api/bins/${bin.code}`);
    expect(forMember.body.forYou.actions).toEqual(['draw']);
    await post(member, `/api/bins/${bin.code}/draw`, { quantity: 3 });
    expect((await member.agent.get(`/api/bins/${bin.code}`)).body.forYou).toMatchObject({ actions: ['draw', 'return_unused'], yourNetDrawn: 3 });
    const forQm = await qm.agent.get(`/api/bins/${bin.code}`);
    expect(forQm.body.forYou.actions).toEqual(['draw', 'receive', 'count', 'move', 'write_off']);
    expect(forQm.body.forYou.sameSpecBins).toEqual([{ code: 'B-0002', location: 'Overflow shelf', onHand: 0 }]);
  });

  crewTest('lists low bins on the Restock list with whole packs to order', async ({ qm, member }) => {
    await addBinAs(qm, blindRivetBin({ initialQuantity: 150, reorderPoint: 200, reorderQty: 450, packSize: 100 }));
    await addBinAs(qm, blindRivetBin({ initialQuantity: 900 }));
    // Nothing draws from it, so its own point (200) and quantity (450) rule: order up to 650, less 150 on hand = 500.
    const list = await qm.agent.get('/api/bins/restock');
    expect(list.body.data).toHaveLength(1);
    expect(list.body.data[0]).toMatchObject({ code: 'B-0001', onHand: 150, toOrder: 500, packsToOrder: 5, orderCostCents: 6000 });
    const low = await member.agent.get('/api/bins?low=true');
    expect(low.body.data.map((b: { code: string }) => b.code)).toEqual(['B-0001']);
    expect(low.body.meta.total).toBe(1);
  });

  crewTest('keeps an edited bin valid for its kind and never edits on hand', async ({ qm }) => {
    const bin = await addBinAs(qm, blindRivetBin());
    const dropGrip = await patch(qm, `/api/bins/${bin.code}`, { grip16: null });
    expect(dropGrip.status).toBe(400);
    expect(dropGrip.body.error.issues[0].path).toBe('grip16');
    const onHand = await patch(qm, `/api/bins/${bin.code}`, { onHand: 5 });
    expect(onHand.status).toBe(400);
    const moved = await patch(qm, `/api/bins/${bin.code}`, { location: 'Rivet cabinet, drawer 3', reorderPoint: 250 });
    expect(moved.status).toBe(200);
    expect(moved.body).toMatchObject({ location: 'Rivet cabinet, drawer 3', reorderPoint: 250, onHand: 500 });
  });
});

// The solid rivet heads the references name are MS20470 (universal) and MS20426 (100° countersunk)
// (AC 43.13-1B para 4-57a; NAVEDTRA 14315 Table 3-1); a large flange is a blind-rivet head.
describe('a solid rivet bin’s head', () => {
  const FLANGE_WORDS = 'A solid rivet’s head is universal or 100° countersunk; large flange is a blind-rivet head.';
  const solidBin = (head: string) => blindRivetBin({ kind: 'solid_rivet', head, material: '2117-T4', stemMaterial: null, grip16: null, length16: 6 });

  crewTest('refuses a solid rivet bin with a large flange head: 400 naming head, in words', async ({ qm, member }) => {
    const res = await post(qm, '/api/bins', solidBin('flange'));
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'VALIDATION_FAILED', issues: [{ path: 'head', message: FLANGE_WORDS }] });
    expect((await member.agent.get('/api/bins')).body.data).toEqual([]);
  });

  crewTest('takes a universal or 100° countersunk solid rivet, and a large flange blind rivet', async ({ qm }) => {
    expect((await post(qm, '/api/bins', solidBin('dome'))).status).toBe(201);
    expect((await post(qm, '/api/bins', solidBin('countersunk'))).status).toBe(201);
    expect((await post(qm, '/api/bins', blindRivetBin({ kind: 'blind_general', head: 'flange', material: 'aluminium', stemMaterial: 'aluminium' }))).status).toBe(201);
  });

  crewTest('refuses an edit that gives a solid rivet bin a large flange head, or makes a large flange bin solid', async ({ qm }) => {
    const solid = await addBinAs(qm, solidBin('dome'));
    const toFlange = await patch(qm, `/api/bins/${solid.code}`, { head: 'flange' });
    expect(toFlange.status).toBe(400);
    expect(toFlange.body.error.issues).toEqual([{ path: 'head', message: FLANGE_WORDS }]);
    const blind = await addBinAs(qm, blindRivetBin({ head: 'flange' }));
    const toSolid = await patch(qm, `/api/bins/${blind.code}`, { kind: 'solid_rivet', stemMaterial: null, grip16: null, length16: 6 });
    expect(toSolid.status).toBe(400);
    expect(toSolid.body.error.issues).toEqual([{ path: 'head', message: FLANGE_WORDS }]);
  });
});

describe('reversing what has moved on', () => {
  crewTest('refuses to reverse a draw that has a return against it (409 RETURN_AGAINST_DRAW) until the return is reversed', async ({ qm, member }) => {
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 100 }));
    const drawn = await post(member, `/api/bins/${bin.code}/draw`, { quantity: 25 });
    const back = await post(member, `/api/bins/${bin.code}/return`, { quantity: 5 });
    const refused = await post(qm, `/api/bins/${bin.code}/ledger/${drawn.body.id}/reverse`, { note: 'wrong bin' });
    expect(refused.status).toBe(409);
    expect(refused.body.error).toMatchObject({ code: 'RETURN_AGAINST_DRAW', message: '5 of this draw were returned; reverse that return first.' });
    expect((await qm.agent.get(`/api/bins/${bin.code}`)).body.onHand).toBe(80);
    expect((await member.agent.get('/api/stock/tab')).body.chargedCents).toBeGreaterThan(0);

    expect((await post(qm, `/api/bins/${bin.code}/ledger/${back.body.id}/reverse`, { note: 'not returned' })).status).toBe(201);
    const undo = await post(qm, `/api/bins/${bin.code}/ledger/${drawn.body.id}/reverse`, { note: 'wrong bin' });
    expect(undo.status).toBe(201);
    expect((await qm.agent.get(`/api/bins/${bin.code}`)).body.onHand).toBe(100);
    expect((await member.agent.get('/api/stock/tab')).body.chargedCents).toBe(0);
  });

  crewTest('lets a draw be reversed when the member’s other draws cover the return', async ({ qm, member }) => {
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 100 }));
    const first = await post(member, `/api/bins/${bin.code}/draw`, { quantity: 10 });
    await post(member, `/api/bins/${bin.code}/draw`, { quantity: 20 });
    await post(member, `/api/bins/${bin.code}/return`, { quantity: 15 });
    const undo = await post(qm, `/api/bins/${bin.code}/ledger/${first.body.id}/reverse`, { note: 'double scan' });
    expect(undo.status).toBe(201);
    expect((await member.agent.get(`/api/bins/${bin.code}`)).body.forYou.yourNetDrawn).toBe(5);
  });

  crewTest('refuses with 409 to reverse a move whose stock has left the other bin, and writes nothing', async ({ qm, member }) => {
    const a = await addBinAs(qm, blindRivetBin({ initialQuantity: 100 }));
    const b = await addBinAs(qm, blindRivetBin({ initialQuantity: 0, location: 'Shelf B1' }));
    const moved = await post(qm, `/api/bins/${a.code}/move`, { to: b.code, quantity: 40 });
    await post(member, `/api/bins/${b.code}/draw`, { quantity: 30 });
    const undo = await post(qm, `/api/bins/${a.code}/ledger/${moved.body.id}/reverse`, { note: 'wrong shelf' });
    expect(undo.status).toBe(409);
    expect(undo.body.error).toMatchObject({ code: 'INSUFFICIENT_STOCK', message: expect.stringContaining('only 10 on hand') });
    expect((await qm.agent.get(`/api/bins/${a.code}`)).body.onHand).toBe(60);
    expect((await qm.agent.get(`/api/bins/${b.code}`)).body.onHand).toBe(10);
  });

  crewTest('refuses with 409 to reverse a count that found stock when that stock has since been drawn', async ({ qm, member }) => {
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 10 }));
    const counted = await post(qm, `/api/bins/${bin.code}/count`, { counted: 50 });
    await post(member, `/api/bins/${bin.code}/draw`, { quantity: 45 });
    const undo = await post(qm, `/api/bins/${bin.code}/ledger/${counted.body.id}/reverse`, { note: 'miscounted' });
    expect(undo.status).toBe(409);
    expect(undo.body.error).toMatchObject({ code: 'INSUFFICIENT_STOCK', message: expect.stringContaining('only 5 on hand') });
    expect((await qm.agent.get(`/api/bins/${bin.code}`)).body.onHand).toBe(5);
  });
});
