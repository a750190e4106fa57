import { describe, expect, onTestFinished } from 'vitest';
import { memberTodaySchema, type MemberToday } from '@shared/schemas/today-member';
import { DEMO_PASSWORD, seedDemoChapter } from '../../server/seed/demo-chapter';
import { writeChapterTimeZone } from '../../server/settings/chapter-time-zone';
import { addBinAs, addToolAs, blindRivetBin, lend, post } from '../helpers/crib';
import { addAssembly, setAssemblyStatus } from '../helpers/planning-fixture';
import { crewTest } from '../helpers/crew-test';
import { buildTestApp, type SignedInAgent } from '../helpers/test-app';

const DAY_MS = 24 * 60 * 60 * 1000;

crewTest.override('otherMemberPerson', { email: 'other@example.org', name: 'Otto Other' });

const test = crewTest
  .extend('today', ({ member }) => async (who: SignedInAgent = member): Promise<MemberToday> => {
    const res = await who.agent.get('/api/today/member');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/json/);
    return memberTodaySchema.parse(res.body);
  })
  .extend('tool', ({ qm }) => (name: string, over: Record<string, unknown> = {}) => addToolAs(qm, { name, category: 'other', ...over }));

test.beforeEach(({ t }) => {
  // Tuesday, December 1, 2026, 05:00 in Denver.
  writeChapterTimeZone(t.db, 'America/Denver');
});

describe('GET /api/today/member', () => {
  test('answers an empty day with empty lists and a zero tab', async ({ today }) => {
    expect(await today()).toEqual({
      asOf: '2026-12-01T12:00:00.000Z',
      loans: { total: 0, items: [] },
      setAside: { total: 0, items: [] },
      queue: { total: 0, items: [] },
      assemblies: { total: 0, items: [] },
      tab: { balanceCents: 0 },
      attention: { total: 0, items: [] },
    });
  });

  test('lists my loans overdue first, with the due day and due words of My loans, five of them and the total', async ({ t, member, otherMember, today, tool }) => {
    t.clock.now = new Date('2026-11-20T18:00:00Z');
    const late = await tool('Temporary fastener pliers');
    await lend(t, member, late.code, 3 * DAY_MS);
    t.clock.now = new Date('2026-12-01T12:00:00Z');
    const week = await tool('Edge deburrer');
    await lend(t, member, week.code, 7 * DAY_MS);
    const tomorrow = await tool('Hand rivet puller');
    await lend(t, member, tomorrow.code, 1 * DAY_MS);
    for (const name of ['Dimple die', 'Countersink cage', 'Tin snips']) await lend(t, member, (await tool(name)).code, 10 * DAY_MS);
    await lend(t, otherMember, (await tool('Not mine')).code, 1 * DAY_MS);

    const { loans } = await today();
    expect(loans.total).toBe(6);
    expect(loans.items).toHaveLength(5);
    expect(loans.items.slice(0, 3)).toEqual([
      expect.objectContaining({ tool: { code: late.code, name: 'Temporary fastener pliers' }, dueDay: 'Monday, November 23', dueWords: '8 days late', overdue: true }),
      expect.objectContaining({ tool: { code: tomorrow.code, name: 'Hand rivet puller' }, dueDay: 'Wednesday, December 2', dueWords: 'due tomorrow', overdue: false, soon: true }),
      expect.objectContaining({ tool: { code: week.code, name: 'Edge deburrer' }, dueDay: 'Tuesday, December 8', dueWords: 'due in 7 days', overdue: false, soon: false }),
    ]);
    expect(loans.items.map((l) => l.tool.name)).not.toContain('Not mine');
  });

  test('says which tools are set aside for me and until when, and my place in each queue', async ({ t, qm, member, otherMember, today, tool }) => {
    const shelf = await tool('Rivet cutter');
    const busy = await tool('Squeezer');
    const later = await tool('Rivet gun, 2X');
    await lend(t, qm, busy.code, 7 * DAY_MS);
    await lend(t, qm, later.code, 7 * DAY_MS);
    expect((await post(otherMember, `/api/tools/${busy.code}/holds`)).status).toBe(201);
    expect((await post(member, `/api/tools/${busy.code}/holds`)).status).toBe(201);
    expect((await post(member, `/api/tools/${later.code}/holds`)).status).toBe(201);
    expect((await post(member, `/api/tools/${shelf.code}/holds`)).status).toBe(201);

    const answer = await today();
    // The chapter's hold time is 48 hours: 12:00 UTC on Thursday is 5:00 AM in Denver.
    expect(answer.setAside).toEqual({
      total: 1,
      items: [{ tool: { code: shelf.code, name: 'Rivet cutter' }, status: 'offered', position: 1, until: '2026-12-03T12:00:00.000Z', words: 'Set aside for you until Dec 3, 2026, 5:00 AM' }],
    });
    expect(answer.queue.items).toEqual([
      { tool: { code: busy.code, name: 'Squeezer' }, status: 'waiting', position: 2, until: null, words: '2nd in line' },
      { tool: { code: later.code, name: 'Rivet gun, 2X' }, status: 'waiting', position: 1, until: null, words: '1st in line' },
    ]);
    // Someone else's queue place is not mine.
    expect((await today(otherMember)).queue.items.map((h) => h.words)).toEqual(['1st in line']);
  });

  test('names what each assembly in progress still lacks: crib tools not free for me and bins short for its bill', async ({ t, qm, member, otherMember, today }) => {
    const puller = await addToolAs(qm, { name: 'Hand rivet puller, long', category: 'hand_rivet_puller', accessories: ['Nosepiece 5/32'] });
    const bit40 = await addToolAs(qm, { name: 'Drill bit #40', category: 'drill_bit', drillSize: '#40' });
    const bit30 = await addToolAs(qm, { name: 'Drill bit #30', category: 'drill_bit', drillSize: '#30' });
    const deburr = await addToolAs(qm, { name: 'Deburring tool', category: 'deburring_tool' });
    await lend(t, otherMember, bit30.code, 7 * DAY_MS);
    await lend(t, member, deburr.code, 7 * DAY_MS);
    const rivets = await addBinAs(qm, blindRivetBin({ diameter32: 5, grip16: 2, initialQuantity: 20 }));
    // 5/32 blind rivets: 60 in, 0.5 in from each end, 1 in pitch → 60 holes; 5 % waste → 63 still to draw, 20 on hand.
    const line = { length: 60, pitch: 1, edgeDistance: 0.5, stack: [0.04, 0.04], structural: true, rivet: { kind: 'blind-structural', head: 'dome', diameter32: 5, material: '5056' } };
    const working = await addAssembly(member, { name: 'Skin lap', lines: [line] });
    await setAssemblyStatus(member, working, 'in_progress');
    await addAssembly(member, { name: 'Not started', lines: [line] });

    const { assemblies } = await today();
    expect(assemblies.total).toBe(1);
    const [lap] = assemblies.items;
    expect(lap).toMatchObject({ id: working, name: 'Skin lap', buildName: 'Two-seat kit' });
    // The puller and #40 bit are free, the deburring tool is out with me: none of them is lacking.
    const lackingCodes = lap!.tools.map((k) => k.tool?.code ?? null);
    expect(lackingCodes).not.toContain(puller.code);
    expect(lackingCodes).not.toContain(bit40.code);
    expect(lackingCodes).not.toContain(deburr.code);
    expect(lap!.tools).toContainEqual({ need: 'Drill bit #30', tool: { code: bit30.code, name: 'Drill bit #30' }, words: 'all on loan' });
    expect(lap!.tools).toContainEqual({ need: 'Drill bit #20', tool: null, words: 'none in the crib' });
    expect(lap!.bins).toEqual([{ description: expect.stringContaining('5/32 in'), binCode: rivets.code, words: 'short by 43: 20 on hand, 63 still to draw' }]);
  });

  test('shows my tab balance from the tab’s own sum', async ({ qm, member, otherMember, today }) => {
    const rivets = await addBinAs(qm, blindRivetBin());
    expect((await post(member, `/api/bins/${rivets.code}/draw`, { quantity: 25 })).status).toBe(201);
    expect((await post(otherMember, `/api/bins/${rivets.code}/draw`, { quantity: 100 })).status).toBe(201);
    const tab = await member.agent.get('/api/stock/tab');
    // 25 × $0.12 = $3.00.
    expect((await today()).tab).toEqual({ balanceCents: 300 });
    expect(tab.body.balanceCents).toBe(300);
  });

  test('lists returns I flagged "needs attention" while the tool is still out of service', async ({ t, qm, member, otherMember, today, tool }) => {
    const gun = await tool('Rivet gun, 3X');
    const drill = await tool('Angle drill');
    const theirs = await tool('Squeezer yoke');
    for (const [who, code] of [[member, gun.code], [member, drill.code], [otherMember, theirs.code]] as const) {
      await lend(t, who, code, 7 * DAY_MS);
      expect((await post(who, `/api/tools/${code}/return`, { condition: 'needs_attention', note: 'Throttle leaks air' })).status).toBe(200);
    }
    expect((await post(qm, `/api/tools/${drill.code}/back-in-service`, { note: 'New chuck key' })).status).toBe(200);

    expect((await today()).attention).toEqual({
      total: 1,
      items: [{ loanId: expect.any(Number), tool: { code: gun.code, name: 'Rivet gun, 3X' }, returnedAt: '2026-12-01T12:00:00.000Z', note: 'Throttle leaks air' }],
    });
  });

  test('answers every role (leads and quartermasters borrow too), and 401 when signed out', async ({ t, qm }) => {
    const lead = await t.signIn('lead@example.org');
    expect((await lead.agent.get('/api/today/member')).status).toBe(200);
    expect((await qm.agent.get('/api/today/member')).status).toBe(200);
    const signedOut = await t.anonymous();
    const res = await signedOut.agent.get('/api/today/member');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('NOT_SIGNED_IN');
  });
});

describe('GET /api/today/member on the demo chapter', () => {
  test('shows each demo member their own real work: loans, a tool set aside, a queue place, assemblies short of kit, tabs, a return for attention', async ({ today }) => {
    // The demo seeds an empty chapter, at today's date.
    const demo = await buildTestApp();
    onTestFinished(() => demo.close());
    demo.clock.now = new Date();
    expect(await seedDemoChapter(demo.db)).toBe(true);
    const as = async (email: string) => today(await demo.signIn(email, DEMO_PASSWORD));

    const marco = await as('member@example.org');
    expect(marco.loans.items.map((l) => [l.tool.name, l.overdue])).toEqual([
      ['Drill bit #30, jobber', false],
      ['Temporary fasteners 3/32, tray', false],
    ]);
    expect(marco.loans.items[0]!.dueWords).toMatch(/^due in \d+ days$/);
    expect(marco.setAside.items).toEqual([expect.objectContaining({ tool: expect.objectContaining({ name: 'Hand rivet squeezer' }), words: expect.stringMatching(/^Set aside for you until /) })]);
    expect(marco.assemblies.items.map((a) => a.name)).toEqual(['Right flap']);
    // His own 3/32 tray is out with him, and temporary fasteners go from line to line: his flap lacks nothing.
    expect(marco.assemblies.items[0]).toMatchObject({ tools: [], bins: [] });
    const marcoTab = await (await demo.signIn('member@example.org', DEMO_PASSWORD)).agent.get('/api/stock/tab');
    expect(marco.tab.balanceCents).toBe(marcoTab.body.balanceCents);
    expect(marco.tab.balanceCents).toBeGreaterThan(0);
    expect(marco.attention.total).toBe(0);

    // Ines's side skins need a 3/32 tray, and the crib's one is out with Marco.
    const ines = await as('ines.parra@example.org');
    expect(ines.assemblies.items.map((a) => [a.name, a.tools.map((k) => [k.tool?.name, k.words])])).toEqual([['Side skins', [['Temporary fasteners 3/32, tray', 'all on loan']]]]);

    const tomasz = await as('tomasz.wren@example.org');
    expect(tomasz.queue.items).toEqual([expect.objectContaining({ tool: expect.objectContaining({ name: 'Pneumatic rivet puller' }), words: '1st in line' })]);
    expect(tomasz.attention.items).toEqual([expect.objectContaining({ tool: expect.objectContaining({ name: 'Rivet gun, 3X' }), note: 'Throttle valve leaks air' })]);
    expect(tomasz.assemblies.items.map((a) => a.name)).toEqual(['Rudder']);

    // The pneumatic puller Ines has is one of the demo's two overdue loans: it comes first.
    expect(ines.loans.items[0]).toMatchObject({ tool: { name: 'Pneumatic rivet puller' }, overdue: true, dueWords: expect.stringMatching(/days? late$/) });
    expect(ines.loans.items[1]).toMatchObject({ overdue: false });
  }, 30_000);
});
