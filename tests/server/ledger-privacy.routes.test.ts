import { describe, expect } from 'vitest';
import { ledgerSchema, type LedgerEntry } from '@shared/schemas/bins';
import { addBinAs, blindRivetBin, post } from '../helpers/crib';
import { addAssembly } from '../helpers/planning-fixture';
import { crewTest } from '../helpers/crew-test';
import type { SignedInAgent } from '../helpers/test-app';

/** A bin with an opening receipt, a draw and a return by Mia (for her assembly), and a draw by Ines. */
const test = crewTest.extend('sharedBin', ({ qm, member, otherMember }) => async () => {
  const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 500, unitCost: 0.12 }));
  const wing = await addAssembly(member, { name: 'Left wing skin' });
  expect((await post(member, `/api/bins/${bin.code}/draw`, { quantity: 40, assemblyId: wing, note: 'for the wing' })).status).toBe(201);
  expect((await post(member, `/api/bins/${bin.code}/return`, { quantity: 5, assemblyId: wing })).status).toBe(201);
  expect((await post(otherMember, `/api/bins/${bin.code}/draw`, { quantity: 25, note: 'Ines, tail fairing' })).status).toBe(201);
  return bin;
});

async function ledgerAs(who: SignedInAgent, code: string): Promise<LedgerEntry[]> {
  const res = await who.agent.get(`/api/bins/${code}/ledger`);
  expect(res.status).toBe(200);
  return ledgerSchema.parse(res.body).data;
}

describe('GET /api/bins/:code/ledger for a member', () => {
  test('shows their own entries in full and others’ without the person, the value or the note: kinds and quantities stay', async ({ crew, member, sharedBin }) => {
    const bin = await sharedBin();
    const entries = await ledgerAs(member, bin.code);
    expect(entries.map((e) => [e.kind, e.quantity, e.balanceAfter])).toEqual([
      ['draw', -25, 440],
      ['return_unused', 5, 465],
      ['draw', -40, 460],
      ['receive', 500, 500],
    ]);
    const [inesDraw, ownReturn, ownDraw, receipt] = entries;
    expect(ownDraw).toMatchObject({ masked: false, actor: { id: crew.member.id, name: 'Mia Member' }, member: { name: 'Mia Member' }, valueCents: -480, unitCost: 0.12, note: 'for the wing', assembly: { name: 'Left wing skin' } });
    expect(ownReturn).toMatchObject({ masked: false, valueCents: 60 });
    for (const other of [inesDraw!, receipt!]) {
      expect(other).toMatchObject({ masked: true, actor: null, member: null, unitCost: null, valueCents: null, assemblyId: null, assembly: null, note: '' });
    }
    // Nothing in the answer names Ines or lets her tab be rebuilt.
    expect(JSON.stringify(entries)).not.toMatch(/Ines/);
  });

  test('shows another member only their own draw of the same bin', async ({ otherMember, sharedBin }) => {
    const bin = await sharedBin();
    const entries = await ledgerAs(otherMember, bin.code);
    expect(entries.filter((e) => !e.masked).map((e) => [e.kind, e.quantity, e.valueCents])).toEqual([['draw', -25, -300]]);
    expect(JSON.stringify(entries)).not.toMatch(/Mia|wing/);
  });
});

describe('quartermasters and leads', () => {
  test('see every entry in full', async ({ lead, qm, sharedBin }) => {
    const bin = await sharedBin();
    for (const who of [qm, lead]) {
      const entries = await ledgerAs(who, bin.code);
      expect(entries.every((e) => !e.masked && e.actor !== null && e.valueCents !== null)).toBe(true);
      expect(entries[0]).toMatchObject({ member: { name: 'Ines Other' }, valueCents: -300, note: 'Ines, tail fairing' });
    }
  });
});

describe('siblings a member could read another’s tab from', () => {
  test('refuses the ledger CSV and another member’s tab with 403, and gives their own tab', async ({ crew, member, sharedBin }) => {
    await sharedBin();
    const csv = await member.agent.get('/api/bins/ledger.csv?from=2026-11-01&to=2026-12-31');
    expect(csv.status).toBe(403);
    const tabs = await member.agent.get('/api/stock/tabs');
    expect(tabs.status).toBe(403);
    const inesTab = await member.agent.get(`/api/stock/tabs/${crew.lead.id}`);
    expect(inesTab.status).toBe(403);
    expect(inesTab.body.error.code).toBe('FORBIDDEN');
    expect((await member.agent.get(`/api/stock/tabs/${crew.member.id}`)).status).toBe(200);
  });
});
