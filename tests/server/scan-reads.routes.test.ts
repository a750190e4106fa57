import sharp from 'sharp';
import { describe, expect } from 'vitest';
import { binForYouSchema, binListSchema, type BinForYou } from '@shared/schemas/bins';
import { toolForYouSchema, toolListSchema, type ToolForYou } from '@shared/schemas/tools';
import { loanDueAt } from '@shared/time/chapter-time';
import { crewTest } from '../helpers/crew-test';
import type { SignedInAgent } from '../helpers/test-app';
import { addBinAs, addToolAs, blindRivetBin, lend, post } from '../helpers/crib';
import { screwBin } from '../helpers/planning-fixture';

const HOUR = 3600_000;
const DAY = 24 * HOUR;

async function openTool(who: SignedInAgent, code: string): Promise<ToolForYou> {
  const res = await who.agent.get(`/api/tools/${code}`);
  expect(res.status).toBe(200);
  expect(res.type).toBe('application/json');
  const parsed = toolForYouSchema.parse(res.body);
  expect(parsed).toEqual(res.body);
  return parsed;
}

async function openBin(who: SignedInAgent, code: string): Promise<BinForYou> {
  const res = await who.agent.get(`/api/bins/${code}`);
  expect(res.status).toBe(200);
  expect(res.type).toBe('application/json');
  const parsed = binForYouSchema.parse(res.body);
  expect(parsed).toEqual(res.body);
  return parsed;
}

const iso = (ms: number) => new Date(ms).toISOString();

/**
 * What a scan opens, GET /api/tools/:code and GET /api/bins/:code, in each state: the whole answer
 * parses with the shared schema and loses nothing in the parse (no field the client does not know),
 * says what the person may do, and shows the tool or bin exactly as the list does.
 */
crewTest.override('otherMemberPerson', { email: 'other@example.org', name: 'Otto Other' });

const test = crewTest
  /** The one item opened by a scan is the same as that item in the list. */
  .extend('expectSameAsInList', ({ qm }) => async (kind: 'tools' | 'bins', opened: ToolForYou | BinForYou) => {
    const res = await qm.agent.get(`/api/${kind}?pageSize=500`);
    const list = kind === 'tools' ? toolListSchema.parse(res.body) : binListSchema.parse(res.body);
    const { forYou: _forYou, ...item } = opened;
    // A bin's scan answer leaves the reorder computation out; GET /api/bins/:code/reorder gives the list's figures.
    const reorder = kind === 'bins' ? (await qm.agent.get(`/api/bins/${opened.code}/reorder`)).body : {};
    expect(list.data.find((x) => x.code === opened.code)).toEqual({ ...item, ...reorder });
  });

describe('GET /api/tools/:code in each state', () => {
  test('answers the tool and what the person may do, on the shelf, behind a sign-off, on loan, queued, held, out of service, lost and retired', async ({ t, qm, member, otherMember, expectSameAsInList }) => {
    const now = t.clock.now.getTime();
    const lead = await t.signIn('lead@example.org');
    const signoff = await post(lead, '/api/signoffs', { name: 'Air tools', description: 'Air drills and rivet guns' });
    expect(signoff.status).toBe(201);
    await addToolAs(qm, { name: 'Bucking bar, 1 lb', category: 'other', accessories: ['leather pad'] });
    await addToolAs(qm, { name: 'Air drill', category: 'air_drill', requiredSignoffId: signoff.body.id });
    await addToolAs(qm, { name: 'Rivet squeezer', category: 'other', loanDays: 5 });
    await addToolAs(qm, { name: 'Rivet gun 3X', category: 'other' });
    await addToolAs(qm, { name: 'Edge deburrer', category: 'other' });
    await addToolAs(qm, { name: 'Spacing fan', category: 'other' });

    const jpeg = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#5a7d9a' } }).jpeg().toBuffer();
    const photo = await qm.agent.post('/api/tools/T-0001/photos').set('X-CSRF-Token', qm.csrf).attach('photo', jpeg, { filename: 'bar.jpg', contentType: 'image/jpeg' });
    expect(photo.status).toBe(201);

    const shelf = await openTool(member, 'T-0001');
    expect(shelf).toMatchObject({ status: 'available', accessories: ['leather pad'], photoIds: [photo.body.id], loan: null, holds: { waiting: 0, offeredTo: null, offerExpiresAt: null } });
    expect(shelf.forYou).toEqual({ actions: ['check_out'], reason: null, defaultDueAt: loanDueAt(new Date(now), shelf.loanDays, 'UTC').toISOString(), yourHold: null });
    await expectSameAsInList('tools', shelf);

    const gated = await openTool(member, 'T-0002');
    expect(gated.requiredSignoff).toEqual({ id: signoff.body.id, name: 'Air tools' });
    expect(gated.forYou).toMatchObject({
      actions: [],
      reason: 'Needs the "Air tools" sign-off, which you do not have yet. Ask Lee Lead (chapter lead) to sign you off.',
    });
    await expectSameAsInList('tools', gated);

    await lend(t, otherMember, 'T-0003', 3 * DAY);
    const lent = await openTool(member, 'T-0003');
    expect(lent.loan).toMatchObject({ holder: { name: 'Otto Other' }, dueAt: iso(now + 3 * DAY) });
    expect(lent.forYou).toEqual({ actions: ['place_hold'], reason: 'Otto Other has it until Friday, December 4.', defaultDueAt: '2026-12-06T23:59:59.999Z', yourHold: null });
    expect((await openTool(otherMember, 'T-0003')).forYou).toMatchObject({ actions: ['return'], reason: null });
    expect((await openTool(qm, 'T-0003')).forYou.actions).toEqual(['return', 'place_hold']);
    await expectSameAsInList('tools', lent);

    expect((await post(member, '/api/tools/T-0003/holds')).status).toBe(201);
    expect((await post(qm, '/api/tools/T-0003/holds')).status).toBe(201);
    const queued = await openTool(member, 'T-0003');
    expect(queued.holds).toEqual({ waiting: 2, offeredTo: null, offerExpiresAt: null });
    expect(queued.forYou).toMatchObject({ actions: ['cancel_hold'], yourHold: { status: 'waiting', position: 1, offerExpiresAt: null } });
    expect((await openTool(qm, 'T-0003')).forYou).toMatchObject({ actions: ['return', 'cancel_hold'], yourHold: { status: 'waiting', position: 2 } });

    expect((await post(otherMember, '/api/tools/T-0003/return', { condition: 'ok' })).status).toBe(200);
    const offerEnds = iso(now + 48 * HOUR);
    const heldForMe = await openTool(member, 'T-0003');
    expect(heldForMe).toMatchObject({ status: 'held', loan: null, holds: { waiting: 1, offeredTo: { name: 'Mia Member' }, offerExpiresAt: offerEnds } });
    expect(heldForMe.forYou).toMatchObject({ actions: ['check_out', 'cancel_hold'], reason: null, yourHold: { status: 'offered', position: 1, offerExpiresAt: offerEnds } });
    const heldForSomeoneElse = await openTool(qm, 'T-0003');
    expect(heldForSomeoneElse.forYou).toMatchObject({
      actions: ['cancel_hold'],
      reason: 'It is set aside for Mia Member until Dec 3, 2026, 12:00 PM.',
      yourHold: { status: 'waiting', position: 2 },
    });
    expect((await openTool(otherMember, 'T-0003')).forYou.actions).toEqual(['place_hold']);
    await expectSameAsInList('tools', heldForMe);

    expect((await post(qm, '/api/tools/T-0004/out-of-service', { note: 'Worn retaining spring' })).status).toBe(200);
    expect((await post(qm, '/api/tools/T-0005/lost', { note: 'Not on the shelf at the count' })).status).toBe(200);
    expect((await post(qm, '/api/tools/T-0006/retire', { note: 'Bent beyond use' })).status).toBe(200);
    const states = [
      ['T-0004', 'out_of_service', 'Out of service: Worn retaining spring.', ['place_hold']],
      ['T-0005', 'lost', 'Marked lost. Tell the quartermaster if you find it.', []],
      ['T-0006', 'retired', 'Retired from the crib.', []],
    ] as const;
    for (const [code, status, reason, actions] of states) {
      const tool = await openTool(member, code);
      expect(tool.status).toBe(status);
      expect(tool.forYou).toMatchObject({ actions, reason, yourHold: null });
      await expectSameAsInList('tools', tool);
    }
  });

  test('answers 404 TOOL_NOT_FOUND for a code on no tool', async ({ member }) => {
    const res = await member.agent.get('/api/tools/T-0404');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('TOOL_NOT_FOUND');
  });
});

describe('GET /api/bins/:code in each state', () => {
  test('answers the bin, what the person may do and where its stock may move', async ({ t, qm, member, otherMember, expectSameAsInList }) => {
    const a = await addBinAs(qm, blindRivetBin({ location: 'Shelf A2' }));
    const b = await addBinAs(qm, blindRivetBin({ location: 'Shelf B1', initialQuantity: 0 }));
    await addBinAs(qm, blindRivetBin({ location: 'Shelf B2', grip16: 3 }));
    const s1 = await addBinAs(qm, screwBin());
    const s2 = await addBinAs(qm, screwBin({ name: 'SCREW #8-32 × 1/2 PAN HEAD, STAINLESS', location: 'Drawer C5', initialQuantity: 40 }));
    await addBinAs(qm, screwBin({ name: 'Screw #8-32 × 3/4 pan head, stainless', location: 'Drawer C6' }));

    const fresh = await openBin(member, a.code);
    expect(fresh).toMatchObject({ onHand: 500, lastCountedAt: null });
    expect(fresh.forYou).toEqual({ actions: ['draw'], yourNetDrawn: 0, sameSpecBins: [] });
    await expectSameAsInList('bins', fresh);

    expect((await post(member, `/api/bins/${a.code}/draw`, { quantity: 30 })).status).toBe(201);
    expect((await post(member, `/api/bins/${a.code}/return`, { quantity: 5 })).status).toBe(201);
    expect((await openBin(member, a.code)).forYou).toEqual({ actions: ['draw', 'return_unused'], yourNetDrawn: 25, sameSpecBins: [] });
    expect((await openBin(otherMember, a.code)).forYou).toEqual({ actions: ['draw'], yourNetDrawn: 0, sameSpecBins: [] });

    expect((await post(qm, `/api/bins/${a.code}/count`, { counted: 470 })).status).toBe(201);
    const counted = await openBin(qm, a.code);
    expect(counted).toMatchObject({ onHand: 470, lastCountedAt: t.clock.now.toISOString() });
    expect(counted.forYou).toEqual({
      actions: ['draw', 'receive', 'count', 'move', 'write_off'],
      yourNetDrawn: 0,
      sameSpecBins: [{ code: b.code, location: 'Shelf B1', onHand: 0 }],
    });
    await expectSameAsInList('bins', counted);

    const empty = await openBin(qm, b.code);
    expect(empty.forYou).toEqual({ actions: ['receive', 'count'], yourNetDrawn: 0, sameSpecBins: [{ code: a.code, location: 'Shelf A2', onHand: 470 }] });
    expect((await openBin(member, b.code)).forYou).toEqual({ actions: [], yourNetDrawn: 0, sameSpecBins: [] });
    await expectSameAsInList('bins', empty);

    const screws = await openBin(qm, s1.code);
    expect(screws.forYou.sameSpecBins).toEqual([{ code: s2.code, location: 'Drawer C5', onHand: 40 }]);
    await expectSameAsInList('bins', screws);
  });

  test('answers 404 BIN_NOT_FOUND for a code on no bin', async ({ member }) => {
    const res = await member.agent.get('/api/bins/B-0404');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('BIN_NOT_FOUND');
  });
});
