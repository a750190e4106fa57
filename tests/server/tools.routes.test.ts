import { describe, expect } from 'vitest';
import { memberSignoffs, signoffs } from '../../server/db/schema/signoffs';
import { crewTest } from '../helpers/crew-test';
import { writeChapterTimeZone } from '../../server/settings/chapter-time-zone';
import { addToolAs, patch, post } from '../helpers/crib';

const test = crewTest
  .extend('addTool', ({ qm }) => (body: Record<string, unknown>) => addToolAs(qm, body));

describe('POST /api/tools', () => {
  test('adds a tool with the next free code and the category default loan period', async ({ member, addTool }) => {
    const tool = await addTool({ name: 'Hand rivet puller, long handle', category: 'hand_rivet_puller', accessories: ['Nosepiece 3/32', 'Nosepiece 1/8'] });
    expect(tool.code).toBe('T-0001');
    const res = await member.agent.get('/api/tools/T-0001');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ code: 'T-0001', status: 'available', loanDays: 14, accessories: ['Nosepiece 3/32', 'Nosepiece 1/8'] });
    expect(res.body.forYou.actions).toEqual(['check_out']);
  });

  test('answers 403 to a member', async ({ member }) => {
    const res = await post(member, '/api/tools', { name: 'x', category: 'other' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('FORBIDDEN');
  });

  test('needs a drill size for a drill bit and a size and capacity for a tray', async ({ qm }) => {
    const bit = await post(qm, '/api/tools', { name: 'Bit', category: 'drill_bit' });
    expect(bit.status).toBe(400);
    expect(bit.body.error.issues.map((i: { path: string }) => i.path)).toEqual(['drillSize']);
    const tray = await post(qm, '/api/tools', { name: 'Tray', category: 'temporary_fastener_tray' });
    expect(tray.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['trayCapacity', 'traySize']);
    const badSize = await post(qm, '/api/tools', { name: 'Bit', category: 'drill_bit', drillSize: '#81' });
    expect(badSize.status).toBe(400);
  });

  test('stores a drill bit with its size from the drill table', async ({ member, addTool }) => {
    await addTool({ name: 'Drill bit, 12 in long', category: 'drill_bit', drillSize: '40' });
    const res = await member.agent.get('/api/tools/T-0001');
    // ASME B94.11M: #40 = 0.0980 in.
    expect(res.body.drillSize).toEqual({ name: '#40', inch: 0.098, mm: 2.489 });
  });
});

describe('countersink cutters and dimple dies: the rivet size they are for', () => {
  const paths = (res: { body: { error: { issues: { path: string }[] } } }) => res.body.error.issues.map((i) => i.path).sort();

  test('needs the rivet size for both, and the pilot drill for a cutter, naming each missing field', async ({ qm }) => {
    const cutter = await post(qm, '/api/tools', { name: 'Countersink cutter', category: 'countersink_cutter' });
    expect(cutter.status).toBe(400);
    expect(cutter.headers['content-type']).toMatch(/json/);
    expect(cutter.body.error.code).toBe('VALIDATION_FAILED');
    expect(paths(cutter)).toEqual(['drillSize', 'rivetDiameter32']);
    const dies = await post(qm, '/api/tools', { name: 'Dimple dies', category: 'dimple_dies' });
    expect(dies.status).toBe(400);
    expect(paths(dies)).toEqual(['rivetDiameter32']);
    expect(dies.body.error.issues[0].message).toMatch(/rivet size/i);
  });

  test('refuses a rivet size that is not one of 3/32 to 1/4 in, and a rivet size on any other kind of tool', async ({ qm }) => {
    const odd = await post(qm, '/api/tools', { name: 'Dimple dies', category: 'dimple_dies', rivetDiameter32: 7 });
    expect(odd.status).toBe(400);
    expect(paths(odd)).toEqual(['rivetDiameter32']);
    const onABit = await post(qm, '/api/tools', { name: 'Drill bit #30', category: 'drill_bit', drillSize: '#30', rivetDiameter32: 4 });
    expect(onABit.status).toBe(400);
    expect(paths(onABit)).toEqual(['rivetDiameter32']);
    expect(onABit.body.error.issues[0].message).toMatch(/only countersink cutters and dimple dies/i);
  });

  test('stores a cutter with its rivet size and pilot, and dies with their rivet size, and shows them on the tool', async ({ member, addTool }) => {
    const cutter = await addTool({ name: '100° countersink cutter, 1/8 in', category: 'countersink_cutter', rivetDiameter32: 4, drillSize: '30' });
    const dies = await addTool({ name: '100° dimple dies, 3/32 in', category: 'dimple_dies', rivetDiameter32: 3 });
    const c = await member.agent.get(`/api/tools/${cutter.code}`);
    expect(c.status).toBe(200);
    // ASME B94.11M: #30 = 0.1285 in.
    expect(c.body).toMatchObject({ category: 'countersink_cutter', rivetDiameter32: 4, drillSize: { name: '#30', inch: 0.1285 } });
    const d = await member.agent.get(`/api/tools/${dies.code}`);
    expect(d.body).toMatchObject({ category: 'dimple_dies', rivetDiameter32: 3, drillSize: null });
    const other = await addTool({ name: 'Rivet spacing fan', category: 'spacing_fan' });
    expect((await member.agent.get(`/api/tools/${other.code}`)).body.rivetDiameter32).toBeNull();
  });

  test('checks an edit against the whole tool: clearing the size or moving it to another kind with its size answers 400', async ({ qm, addTool }) => {
    const dies = await addTool({ name: '100° dimple dies, 1/8 in', category: 'dimple_dies', rivetDiameter32: 4 });
    const cleared = await patch(qm, `/api/tools/${dies.code}`, { rivetDiameter32: null });
    expect(cleared.status).toBe(400);
    expect(paths(cleared)).toEqual(['rivetDiameter32']);
    const moved = await patch(qm, `/api/tools/${dies.code}`, { category: 'other' });
    expect(moved.status).toBe(400);
    expect(paths(moved)).toEqual(['rivetDiameter32']);
    const both = await patch(qm, `/api/tools/${dies.code}`, { category: 'other', rivetDiameter32: null });
    expect(both.status).toBe(200);
    expect(both.body).toMatchObject({ category: 'other', rivetDiameter32: null });
    const resized = await patch(qm, `/api/tools/${(await addTool({ name: 'Dies', category: 'dimple_dies', rivetDiameter32: 3 })).code}`, { rivetDiameter32: 5 });
    expect(resized.status).toBe(200);
    expect(resized.body.rivetDiameter32).toBe(5);
  });
});

describe('POST /api/tools/:code/checkout and /return', () => {
  test('checks out with a due date from the loan period, then refuses a second checkout with the holder and date', async ({ qm, member, addTool }) => {
    await addTool({ name: 'Pneumatic rivet puller', category: 'pneumatic_rivet_puller' });
    const out = await post(member, '/api/tools/T-0001/checkout');
    expect(out.status).toBe(201);
    // Tuesday 12:00 in a chapter on UTC: due by the end of the next Tuesday.
    expect(out.body.dueAt).toBe('2026-12-08T23:59:59.999Z');
    const again = await post(qm, '/api/tools/T-0001/checkout');
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('TOOL_ON_LOAN');
    expect(again.body.error.message).toBe('T-0001 is on loan. Mia Member has it until Tuesday, December 8.');
  });

  test('makes a loan taken at 23:30 chapter time, on a server running in UTC, due at the end of the chapter day 7 days on', async ({ t, qm, member, addTool }) => {
    writeChapterTimeZone(t.db, 'America/Chicago');
    await addTool({ name: 'Pneumatic rivet puller', category: 'pneumatic_rivet_puller' });
    t.clock.now = new Date('2026-12-02T05:30:00Z'); // Tuesday, December 1, 23:30 in Chicago; already Wednesday in UTC
    const before = await member.agent.get('/api/tools/T-0001');
    expect(before.body.forYou.defaultDueAt).toBe('2026-12-09T05:59:59.999Z');
    const out = await post(member, '/api/tools/T-0001/checkout');
    expect(out.status).toBe(201);
    expect(out.body.dueAt).toBe('2026-12-09T05:59:59.999Z'); // Tuesday, December 8, 23:59:59.999 in Chicago
    const again = await post(qm, '/api/tools/T-0001/checkout');
    expect(again.body.error.message).toMatch(/Tuesday, December 8/);
    const history = await qm.agent.get('/api/tools/T-0001/events');
    expect(JSON.stringify(history.body)).toContain('Due Tuesday, December 8');
  });

  test('keeps the due date a week on in chapter days across the change of clocks', async ({ t, member, addTool }) => {
    writeChapterTimeZone(t.db, 'Europe/Berlin');
    await addTool({ name: 'Air drill', category: 'air_drill', loanDays: 7 });
    t.clock.now = new Date('2027-03-25T09:00:00Z'); // Thursday 10:00 CET; the clocks go forward on Sunday the 28th
    const out = await post(member, '/api/tools/T-0001/checkout');
    expect(out.body.dueAt).toBe('2027-04-01T21:59:59.999Z'); // Thursday, April 1, 23:59:59.999 CEST
  });

  test('lets exactly one of many simultaneous checkouts win', async ({ t, addTool }) => {
    await addTool({ name: 'Air drill', category: 'air_drill' });
    const agents = await Promise.all(['a', 'b', 'c', 'd', 'e', 'f', 'g', 'h'].map(async (n) => {
      await t.addUser({ email: `${n}@example.org` });
      return t.signIn(`${n}@example.org`);
    }));
    const results = await Promise.all(agents.flatMap((a) => [post(a, '/api/tools/T-0001/checkout'), post(a, '/api/tools/T-0001/checkout')]));
    expect(results.filter((r) => r.status === 201)).toHaveLength(1);
    expect(results.filter((r) => r.status === 409)).toHaveLength(15);
    const open = t.db.$client.prepare('select count(*) as n from loans where returned_at is null').get() as { n: number };
    expect(open.n).toBe(1);
  });

  test('falls back on the database: an open loan written by another process makes the checkout answer 409', async ({ t, member, addTool }) => {
    const tool = await addTool({ name: 'Air drill', category: 'air_drill' });
    const qmId = (t.db.$client.prepare("select id from users where email = 'qm@example.org'").get() as { id: number }).id;
    // Another process wrote a loan but the tool row still says available.
    t.db.$client.prepare('insert into loans (tool_id, user_id, checked_out_at, due_at) values (?, ?, ?, ?)').run(tool.id, qmId, 1, 2);
    const res = await post(member, '/api/tools/T-0001/checkout');
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('TOOL_ON_LOAN');
    expect(res.body.error.message).toMatch(/just checked out by someone else/);
  });

  test('returns a tool: ok makes it available, needs attention takes it out of service with the note', async ({ member, addTool }) => {
    await addTool({ name: 'Rivet gun 3X', category: 'rivet_gun' });
    await post(member, '/api/tools/T-0001/checkout').expect(201);
    const back = await post(member, '/api/tools/T-0001/return', { condition: 'ok' });
    expect(back.status).toBe(200);
    expect(back.body.status).toBe('available');
    await post(member, '/api/tools/T-0001/checkout').expect(201);
    const noNote = await post(member, '/api/tools/T-0001/return', { condition: 'needs_attention' });
    expect(noNote.status).toBe(400);
    const hurt = await post(member, '/api/tools/T-0001/return', { condition: 'needs_attention', note: 'Trigger sticks' });
    expect(hurt.body.status).toBe('out_of_service');
    const refused = await post(member, '/api/tools/T-0001/checkout');
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('TOOL_OUT_OF_SERVICE');
    expect(refused.body.error.message).toMatch(/Trigger sticks/);
  });

  test('records the shortfall when a temporary fastener tray comes back short', async ({ member, addTool }) => {
    await addTool({ name: 'Temporary fasteners 1/8, tray', category: 'temporary_fastener_tray', traySize: '1/8', trayCapacity: 50 });
    await post(member, '/api/tools/T-0001/checkout').expect(201);
    const noCount = await post(member, '/api/tools/T-0001/return', { condition: 'ok' });
    expect(noCount.status).toBe(400);
    expect(noCount.body.error.code).toBe('COUNT_REQUIRED');
    const back = await post(member, '/api/tools/T-0001/return', { condition: 'ok', returnedCount: 46 });
    expect(back.body.shortfall).toBe(4);
    const mine = await member.agent.get('/api/loans/mine');
    expect(mine.body.data[0]).toMatchObject({ returnedCount: 46, shortfall: 4 });
  });

  test('refuses a member returning someone else’s tool, but lets the quartermaster do it', async ({ t, qm, member, addTool }) => {
    await addTool({ name: 'Bucking bar', category: 'bucking_bar' });
    await post(member, '/api/tools/T-0001/checkout').expect(201);
    await t.addUser({ email: 'other@example.org' });
    const other = await t.signIn('other@example.org');
    expect((await post(other, '/api/tools/T-0001/return', { condition: 'ok' })).body.error.code).toBe('NOT_YOUR_LOAN');
    expect((await post(qm, '/api/tools/T-0001/return', { condition: 'ok' })).status).toBe(200);
  });

  test('refuses a tool that needs a sign-off the member lacks, and allows it once signed off', async ({ t, lead, member, addTool }) => {
    const signoff = t.db.insert(signoffs).values({ name: 'Air tools' }).returning().get();
    await addTool({ name: 'Air drill', category: 'air_drill', requiredSignoffId: signoff.id });
    const refused = await post(member, '/api/tools/T-0001/checkout');
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('SIGNOFF_REQUIRED');
    expect(refused.body.error.message).toMatch(/"Air tools"/);
    const view = await member.agent.get('/api/tools/T-0001');
    expect(view.body.forYou.actions).toEqual([]);
    expect(view.body.forYou.reason).toMatch(/Air tools/);
    const memberId = (await lead.agent.get('/api/users')).body.data.find((p: { email: string }) => p.email === 'member@example.org').id;
    t.db.insert(memberSignoffs).values({ signoffId: signoff.id, userId: memberId, grantedAt: t.clock.now, grantedById: memberId }).run();
    expect((await post(member, '/api/tools/T-0001/checkout')).status).toBe(201);
  });

  test('answers 404 for an unknown code and 400 for a malformed one', async ({ member }) => {
    expect((await post(member, '/api/tools/T-9999/checkout')).body.error.code).toBe('TOOL_NOT_FOUND');
    const bad = await post(member, '/api/tools/hammer/checkout');
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('VALIDATION_FAILED');
  });

  test('refuses a due date in the past', async ({ member, addTool }) => {
    await addTool({ name: 'Deburring tool', category: 'deburring_tool' });
    const res = await post(member, '/api/tools/T-0001/checkout', { dueAt: '2026-11-01T00:00:00Z' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('DUE_DATE_PAST');
  });
});

describe('holds', () => {
  test('queues people and holds the returned tool for the first, who is e-mailed; others are refused until the hold ends', async ({ t, qm, member, addTool }) => {
    await addTool({ name: 'Torque wrench', category: 'torque_wrench', location: 'Cabinet B, shelf 2' });
    await post(member, '/api/tools/T-0001/checkout').expect(201);
    const hold = await post(qm, '/api/tools/T-0001/holds');
    expect(hold.status).toBe(201);
    expect(hold.body.position).toBe(1);
    const back = await post(member, '/api/tools/T-0001/return', { condition: 'ok' });
    expect(back.body).toMatchObject({ status: 'held', offeredTo: { name: 'Quinn Quartermaster' } });
    const mail = await t.lastMailTo('qm@example.org');
    expect(mail?.subject).toMatch(/T-0001 Torque wrench is back and held for you/);
    expect(mail?.links[0]).toBe('http://gripline.test/tools/T-0001');
    expect(mail?.text.replace(/\s+/g, ' ')).toContain('held for you until Dec 3, 2026, 12:00 PM. After that'); // 48 hours, on the chapter's clock
    const refused = await post(member, '/api/tools/T-0001/checkout');
    expect(refused.body.error.code).toBe('TOOL_HELD');
    expect((await post(qm, '/api/tools/T-0001/checkout')).status).toBe(201);
  });

  test('sets an available tool aside for the person at once, for the chapter’s hold time', async ({ t, qm, member, addTool }) => {
    await addTool({ name: 'Spacing fan', category: 'spacing_fan' });
    const held = await post(member, '/api/tools/T-0001/holds');
    expect(held.status).toBe(201);
    expect(held.body).toMatchObject({ code: 'T-0001', status: 'offered', position: 1 });
    const tool = await member.agent.get('/api/tools/T-0001');
    expect(tool.body.status).toBe('held');
    expect(tool.body.forYou.actions).toContain('check_out');
    expect(tool.body.forYou.yourHold).toMatchObject({ status: 'offered', offerExpiresAt: new Date(t.clock.now.getTime() + 48 * 3600_000).toISOString() });
    expect((await post(qm, '/api/tools/T-0001/checkout')).body.error.code).toBe('TOOL_HELD');
    expect((await post(member, '/api/tools/T-0001/checkout')).status).toBe(201);
  });
});

describe('GET /api/reference/drills', () => {
  test('lists numbered and letter drills with inch and mm', async ({ t }) => {
    const res = await (await t.anonymous()).agent.get('/api/reference/drills');
    expect(res.status).toBe(200);
    expect(res.body).toHaveLength(106);
    // ASME B94.11M: #40 = 0.0980 in; letter F = 0.2570 in.
    expect(res.body).toContainEqual({ name: '#40', inch: 0.098, mm: 2.489 });
    expect(res.body).toContainEqual({ name: 'F', inch: 0.257, mm: 6.528 });
  });
});
