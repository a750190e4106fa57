import { describe, expect } from 'vitest';
import { paymentSchema, spendSchema, tabListSchema, tabSchema } from '@shared/schemas/stock-money';
import { writeChapterTimeZone } from '../../server/settings/chapter-time-zone';
import { addBinAs, blindRivetBin, post } from '../helpers/crib';
import { giveAssemblies } from '../helpers/planning';
import { crewTest } from '../helpers/crew-test';

// Expected money is worked out here as quantity × unit cost in whole cents (arithmetic, no outside source).
const A_1 = 12; // blindRivetBin's unit cost, $0.12
const A_2 = 13; // the same bin after a receipt at $0.13
const SCREW = 35; // $0.35 a screw

const screwBin = (over: Record<string, unknown> = {}) => ({ kind: 'screw', name: 'Screw #8-32 × 1/2 pan head', unitCost: 0.35, packSize: 100, initialQuantity: 200, ...over });

async function created<T = { id: number }>(res: Promise<{ status: number; body: unknown }>): Promise<T> {
  const r = await res;
  if (r.status !== 201) throw new Error(`expected 201, got ${r.status} ${JSON.stringify(r.body)}`);
  return r.body as T;
}

const test = crewTest
  .extend('at', ({ t }) => (iso: string) => {
    t.clock.now = new Date(iso);
  });

test.beforeEach(({ t, crew }) => {
  giveAssemblies(t.db, crew.member.id, [7, 8], { build: 'Two-seat kit', assemblies: { 7: 'Left aileron', 8: 'Right flap' } });
});

describe('GET /api/stock/tab', () => {
  test('values each draw at the unit cost of its day, by assembly and by month, net of returns and reversals', async ({ crew, qm, member, at }) => {
    at('2026-09-10T15:00:00Z');
    const rivets = await addBinAs(qm, blindRivetBin());
    const screws = await addBinAs(qm, screwBin());
    const first = await created<{ id: number }>(post(member, `/api/bins/${rivets.code}/draw`, { quantity: 120, assemblyId: 7, note: 'left aileron' }));
    await created(post(member, `/api/bins/${screws.code}/draw`, { quantity: 10 }));

    at('2026-10-05T09:00:00Z');
    await created(post(qm, `/api/bins/${rivets.code}/receive`, { quantity: 200, unitCost: 0.13 }));
    await created(post(member, `/api/bins/${rivets.code}/draw`, { quantity: 50, assemblyId: 7 }));
    await created(post(member, `/api/bins/${rivets.code}/return`, { quantity: 5, assemblyId: 7 }));
    at('2026-10-28T18:00:00Z');
    const mistake = await created<{ id: number }>(post(member, `/api/bins/${rivets.code}/draw`, { quantity: 30, assemblyId: 8 }));

    // Corrected in the next month: the mistaken draw leaves October as if it had never happened.
    at('2026-11-03T10:00:00Z');
    await created(post(qm, `/api/bins/${rivets.code}/ledger/${mistake.id}/reverse`, { note: 'drawn on the wrong member' }));

    const res = await member.agent.get('/api/stock/tab');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/json/);
    tabSchema.parse(res.body);
    const september = 120 * A_1 + 10 * SCREW;
    const october = 50 * A_2 - 5 * A_2;
    expect(res.body).toMatchObject({
      member: { id: crew.member.id, name: 'Mia Member' },
      chargedCents: september + october,
      paidCents: 0,
      balanceCents: september + october,
      byMonth: [
        { month: '2026-10', chargedCents: october, paidCents: 0 },
        { month: '2026-09', chargedCents: september, paidCents: 0 },
      ],
      byAssembly: [
        { assemblyId: 7, assembly: { name: 'Left aileron', buildName: 'Two-seat kit' }, quantity: 120 + 50 - 5, chargedCents: 120 * A_1 + 50 * A_2 - 5 * A_2 },
        { assemblyId: null, assembly: null, quantity: 10, chargedCents: 10 * SCREW },
      ],
    });
    expect(september + october).toBe(2375); // $14.40 + $3.50 + $6.50 − $0.65 = $23.75

    // The receipt at a new cost changed later draws only; the first draw keeps its $0.12.
    const recent = res.body.recent as { id: number; kind: string; unitCost: number; chargeCents: number }[];
    expect(recent.map((e) => e.kind)).toEqual(['reversal', 'draw', 'return_unused', 'draw', 'draw', 'draw']);
    expect(recent.find((e) => e.id === first.id)).toMatchObject({ unitCost: 0.12, chargeCents: 120 * A_1 });
    expect(recent[0]).toMatchObject({ kind: 'reversal', chargeCents: -30 * A_2 });
    expect(recent[1]).toMatchObject({ id: mistake.id, chargeCents: 30 * A_2, assemblyId: 8, assembly: { name: 'Right flap', buildName: 'Two-seat kit' } });
    const screwDraw = (res.body.recent as { binCode: string; assembly: unknown }[]).find((e) => e.binCode === screws.code);
    expect(screwDraw).toMatchObject({ assembly: null });
  });

  test('keeps other people’s draws off the tab', async ({ t, qm, member }) => {
    const other = await t.addUser({ email: 'other@example.org', name: 'Otto Other' });
    const otherAgent = await t.signIn('other@example.org');
    const rivets = await addBinAs(qm, blindRivetBin());
    await created(post(otherAgent, `/api/bins/${rivets.code}/draw`, { quantity: 40 }));
    await created(post(member, `/api/bins/${rivets.code}/draw`, { quantity: 3 }));
    expect((await member.agent.get('/api/stock/tab')).body.chargedCents).toBe(3 * A_1);
    expect((await otherAgent.agent.get('/api/stock/tab')).body).toMatchObject({ member: { id: other.id }, chargedCents: 40 * A_1 });
  });

  test('answers 401 when signed out', async ({ t }) => {
    const anon = await t.anonymous();
    const res = await anon.agent.get('/api/stock/tab');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('NOT_SIGNED_IN');
  });
});

describe('payments and other people’s tabs', () => {
  test('records a payment, which lowers the balance and shows in the month it was paid', async ({ crew, lead, qm, member, at }) => {
    at('2026-11-20T12:00:00Z');
    const rivets = await addBinAs(qm, blindRivetBin());
    await created(post(member, `/api/bins/${rivets.code}/draw`, { quantity: 120 }));
    at('2026-12-02T12:00:00Z');
    const paid = await post(lead, '/api/stock/payments', { userId: crew.member.id, amountCents: 1000, note: 'cash at the bench' });
    expect(paid.status).toBe(201);
    paymentSchema.parse(paid.body);
    expect(paid.body).toMatchObject({ userId: crew.member.id, amountCents: 1000, note: 'cash at the bench', at: '2026-12-02T12:00:00.000Z', recordedBy: { id: crew.lead.id, name: 'Lee Lead' } });
    await created(post(qm, '/api/stock/payments', { userId: crew.member.id, amountCents: 250 }));

    const tab = await member.agent.get('/api/stock/tab');
    expect(tab.body).toMatchObject({ chargedCents: 120 * A_1, paidCents: 1000 + 250, balanceCents: 120 * A_1 - 1250 });
    expect(tab.body.byMonth).toEqual([
      { month: '2026-12', chargedCents: 0, paidCents: 1250 },
      { month: '2026-11', chargedCents: 120 * A_1, paidCents: 0 },
    ]);
    expect(tab.body.payments.map((p: { amountCents: number }) => p.amountCents)).toEqual([250, 1000]);

    const list = await qm.agent.get('/api/stock/tabs');
    expect(list.status).toBe(200);
    tabListSchema.parse(list.body);
    // Only people with something charged or paid; the lead and quartermaster drew nothing.
    expect(list.body.data).toEqual([{ member: { id: crew.member.id, name: 'Mia Member' }, chargedCents: 1440, paidCents: 1250, balanceCents: 190 }]);
  });

  test('lets the quartermaster and the lead read a member’s tab, and refuses a member reading another’s', async ({ crew, lead, qm, member }) => {
    const rivets = await addBinAs(qm, blindRivetBin());
    await created(post(member, `/api/bins/${rivets.code}/draw`, { quantity: 2 }));
    for (const who of [qm, lead]) {
      const res = await who.agent.get(`/api/stock/tabs/${crew.member.id}`);
      expect(res.status).toBe(200);
      expect(res.body).toMatchObject({ member: { id: crew.member.id }, chargedCents: 2 * A_1 });
    }
    expect((await member.agent.get(`/api/stock/tabs/${crew.member.id}`)).status).toBe(200);
    const refused = await member.agent.get(`/api/stock/tabs/${crew.quartermaster.id}`);
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('FORBIDDEN');
    expect((await member.agent.get('/api/stock/tabs')).status).toBe(403);
    const unknown = await lead.agent.get('/api/stock/tabs/9999');
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.code).toBe('USER_NOT_FOUND');
    expect((await lead.agent.get('/api/stock/tabs/abc')).status).toBe(400);
  });

  test('refuses a payment of 0, one over $10,000, one for nobody, and one recorded by a member', async ({ crew, lead, member }) => {
    const zero = await post(lead, '/api/stock/payments', { userId: crew.member.id, amountCents: 0 });
    expect(zero.status).toBe(400);
    expect(zero.body.error).toMatchObject({ code: 'VALIDATION_FAILED', issues: [{ path: 'amountCents', message: 'A payment is more than $0.00.' }] });
    const huge = await post(lead, '/api/stock/payments', { userId: crew.member.id, amountCents: 1_000_001 });
    expect(huge.status).toBe(400);
    expect(huge.body.error.issues[0].path).toBe('amountCents');
    expect((await post(lead, '/api/stock/payments', { userId: crew.member.id, amountCents: 1_000_000 })).status).toBe(201);
    const nobody = await post(lead, '/api/stock/payments', { userId: 9999, amountCents: 500 });
    expect(nobody.status).toBe(400);
    expect(nobody.body.error).toMatchObject({ code: 'USER_NOT_FOUND', issues: [{ path: 'userId' }] });
    const byMember = await post(member, '/api/stock/payments', { userId: crew.member.id, amountCents: 500 });
    expect(byMember.status).toBe(403);
    expect((await member.agent.get('/api/stock/tab')).body.paidCents).toBe(1_000_000);
  });
});

describe('GET /api/stock/spend', () => {
  test('reports use by month and bin kind, purchases and count adjustments apart, with empty months present', async ({ lead, qm, member, at }) => {
    at('2026-08-20T12:00:00Z');
    await addBinAs(qm, screwBin({ name: 'Nut #8-32 nylon insert', kind: 'nut', unitCost: 0.1 })); // before the window

    at('2026-09-10T12:00:00Z');
    const rivets = await addBinAs(qm, blindRivetBin());
    const screws = await addBinAs(qm, screwBin());
    const spare = await addBinAs(qm, blindRivetBin({ initialQuantity: 0, location: 'Shelf B1' }));
    await created(post(member, `/api/bins/${rivets.code}/draw`, { quantity: 120, assemblyId: 7 }));
    await created(post(member, `/api/bins/${screws.code}/draw`, { quantity: 10 }));

    at('2026-11-12T12:00:00Z');
    await created(post(qm, `/api/bins/${rivets.code}/receive`, { quantity: 100, unitCost: 0.13 }));
    await created(post(qm, `/api/bins/${screws.code}/write-off`, { quantity: 20, note: 'stripped threads' }));
    await created(post(member, `/api/bins/${rivets.code}/draw`, { quantity: 40 }));
    await created(post(member, `/api/bins/${rivets.code}/return`, { quantity: 10 }));
    const wrongReceipt = await created<{ id: number }>(post(qm, `/api/bins/${screws.code}/receive`, { quantity: 50 }));
    await created(post(qm, `/api/bins/${screws.code}/ledger/${wrongReceipt.id}/reverse`, { note: 'booked on the wrong bin' }));
    await created(post(qm, `/api/bins/${rivets.code}/move`, { to: spare.code, quantity: 100 }));
    // 500 − 120 + 100 − 40 + 10 − 100 = 350 on the shelf; the count finds 5 missing.
    await created(post(qm, `/api/bins/${rivets.code}/count`, { counted: 345, note: 'quarterly count' }));

    at('2026-12-01T08:00:00Z');
    await created(post(member, `/api/bins/${screws.code}/draw`, { quantity: 5 }));

    at('2026-12-05T12:00:00Z');
    const res = await lead.agent.get('/api/stock/spend?months=4');
    expect(res.status).toBe(200);
    spendSchema.parse(res.body);
    const months = res.body.months as { month: string; consumedCents: number; byKind: Record<string, number>; purchasedCents: number; countAdjustmentCents: number }[];
    expect(months.map((m) => m.month)).toEqual(['2026-09', '2026-10', '2026-11', '2026-12']);
    const [sep, oct, nov, dec] = months;

    expect(sep).toMatchObject({ consumedCents: 120 * A_1 + 10 * SCREW, purchasedCents: 500 * A_1 + 200 * SCREW, countAdjustmentCents: 0 });
    expect(sep!.byKind).toMatchObject({ blind_structural: 120 * A_1, screw: 10 * SCREW, nut: 0 });
    expect(oct).toMatchObject({ consumedCents: 0, purchasedCents: 0, countAdjustmentCents: 0 });
    expect(Object.values(oct!.byKind).every((v) => v === 0)).toBe(true);
    expect(nov).toMatchObject({ consumedCents: 40 * A_2 - 10 * A_2 + 20 * SCREW, purchasedCents: 100 * A_2, countAdjustmentCents: -5 * A_2 });
    expect(nov!.byKind).toMatchObject({ blind_structural: 30 * A_2, screw: 20 * SCREW });
    expect(dec).toMatchObject({ consumedCents: 5 * SCREW, purchasedCents: 0 });
    for (const m of months) expect(Object.values(m.byKind).reduce((s, v) => s + v, 0)).toBe(m.consumedCents);

    const defaultWindow = await lead.agent.get('/api/stock/spend');
    expect(defaultWindow.body.months).toHaveLength(12);
    expect(defaultWindow.body.months[0].month).toBe('2026-01');
    expect(defaultWindow.body.months[7]).toMatchObject({ month: '2026-08', purchasedCents: 200 * 10 });
  });

  test('counts months on the chapter’s calendar: a draw on the evening of November 30 in Chicago is November’s', async ({ t, lead, qm, member, at }) => {
    writeChapterTimeZone(t.db, 'America/Chicago');
    at('2026-11-10T12:00:00Z');
    const screws = await addBinAs(qm, screwBin());
    at('2026-12-01T02:00:00Z'); // Monday, November 30, 20:00 in Chicago; December in UTC
    await created(post(member, `/api/bins/${screws.code}/draw`, { quantity: 5 }));
    at('2026-12-01T05:30:00Z'); // still November 30 there (23:30)
    const spend = await lead.agent.get('/api/stock/spend?months=2');
    expect(spend.body.months.map((m: { month: string }) => m.month)).toEqual(['2026-10', '2026-11']);
    expect(spend.body.months[1]).toMatchObject({ month: '2026-11', consumedCents: 5 * SCREW });
    const tab = await member.agent.get('/api/stock/tab');
    expect(tab.body.byMonth).toEqual([expect.objectContaining({ month: '2026-11', chargedCents: 5 * SCREW })]);
  });

  test('is for the chapter lead only, and checks the window', async ({ lead, qm, member }) => {
    for (const who of [qm, member]) {
      const res = await who.agent.get('/api/stock/spend');
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('FORBIDDEN');
    }
    for (const months of ['0', '61', 'x']) {
      const res = await lead.agent.get(`/api/stock/spend?months=${months}`);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('VALIDATION_FAILED');
    }
  });
});
