import { describe, expect } from 'vitest';
import { kitHoldsResultSchema } from '@shared/schemas/builds';
import { memberSignoffs, signoffs } from '../../server/db/schema/signoffs';
import { expireHoldOffers } from '../../server/features/tools/holds.service';
import { writeChapterTimeZone } from '../../server/settings/chapter-time-zone';
import { addToolAs, lend, patch, post, del } from '../helpers/crib';
import { crewTest } from '../helpers/crew-test';

const HOUR = 3600_000;
const DAY = 24 * HOUR;

interface Event {
  action: string;
  fromStatus: string | null;
  toStatus: string | null;
  detail: string;
}

crewTest.override('otherMemberPerson', { email: 'other@example.org', name: 'Otto Other' });

const test = crewTest
  /** The audit trail, oldest first. */
  .extend('trail', ({ qm }) => async (code: string) => ((await qm.agent.get(`/api/tools/${code}/events`)).body.data as Event[]).slice().reverse())
  .extend('statusOf', ({ qm }) => async (code: string) => (await qm.agent.get(`/api/tools/${code}`)).body.status as string)
  .extend('holdRows', ({ t }) => () => t.db.$client.prepare('select user_id as userId, status from holds order by id').all() as { userId: number; status: string }[])
  .extend('idOf', ({ lead }) => async (email: string) => ((await lead.agent.get('/api/users')).body.data as { id: number; email: string }[]).find((p) => p.email === email)!.id)
  .extend('serviceCtx', ({ t }) => () => ({ db: t.db, mailer: { send: async () => {} }, publicUrl: 'http://gripline.test', now: () => t.clock.now }) as never)
  .extend('gatedTool', ({ t, qm }) => async () => {
    const signoff = t.db.insert(signoffs).values({ name: 'Rivet gun' }).returning().get();
    return { signoff, tool: await addToolAs(qm, { name: 'Rivet gun 3X', category: 'rivet_gun', requiredSignoffId: signoff.id }) };
  })
  .extend('kitAssembly', ({ qm, member }) => async (plannedStart?: string) => {
    const tool = await addToolAs(qm, { name: 'Bucking bar', category: 'bucking_bar' });
    const build = await post(member, '/api/builds', { name: 'Tail kit' });
    const solid = { length: 12, pitch: 1, stack: [0.032, 0.032], rivet: { kind: 'solid', head: 'dome', diameter32: 4, material: '2117-T4' } };
    const assembly = await post(member, `/api/builds/${build.body.id}/assemblies`, { name: 'Rudder', unit: 'in', lines: [solid], ...(plannedStart && { plannedStart }) });
    expect(assembly.status).toBe(201);
    return { tool, id: assembly.body.id as number };
  });

test.beforeEach(({ t }) => {
  // Days and times are the chapter's, whatever zone the machine running the tests is in.
  writeChapterTimeZone(t.db, 'America/Denver');
});

describe('a hold ending never changes a tool that is no longer held', () => {
  for (const [command, path, to] of [
    ['marked lost', 'lost', 'lost'],
    ['taken out of service', 'out-of-service', 'out_of_service'],
    ['retired', 'retire', 'retired'],
  ] as const) {
    test(`keeps a held tool ${command} when its hold is then cancelled`, async ({ qm, member, otherMember, trail, statusOf }) => {
      const tool = await addToolAs(qm, { name: 'Rivet gun 2X', category: 'rivet_gun' });
      await post(member, `/api/tools/${tool.code}/holds`).expect(201);
      expect((await post(qm, `/api/tools/${tool.code}/${path}`, { note: 'Not in the drawer' })).body.status).toBe(to);
      const cancel = await del(member, `/api/tools/${tool.code}/holds/mine`);
      expect([204, 404]).toContain(cancel.status);
      expect(await statusOf(tool.code)).toBe(to);
      expect((await post(otherMember, `/api/tools/${tool.code}/checkout`)).status).not.toBe(201);
      const events = await trail(tool.code);
      expect(events.some((e) => e.fromStatus === 'held' && e.toStatus === 'available')).toBe(false);
      expect(events.filter((e) => e.toStatus !== null).map((e) => `${e.fromStatus}→${e.toStatus}`)).toEqual(['null→available', 'available→held', `held→${to}`]);
    });
  }

  test('keeps a lost tool lost when the offer it had runs out', async ({ t, qm, member, trail, statusOf, serviceCtx }) => {
    const tool = await addToolAs(qm, { name: 'Air drill', category: 'air_drill' });
    await post(member, `/api/tools/${tool.code}/holds`).expect(201);
    await post(qm, `/api/tools/${tool.code}/lost`, { note: 'Gone' }).expect(200);
    t.clock.now = new Date(t.clock.now.getTime() + 49 * HOUR);
    expireHoldOffers(serviceCtx());
    expect(await statusOf(tool.code)).toBe('lost');
    expect((await trail(tool.code)).at(-1)).toMatchObject({ action: 'lost' });
  });

  test('ends the offer and the queue of a held tool marked lost, and tells everyone waiting', async ({ t, lead, qm, member, otherMember, holdRows }) => {
    const tool = await addToolAs(qm, { name: 'Torque wrench', category: 'torque_wrench' });
    await lend(t, lead, tool.code, 3 * DAY);
    await post(member, `/api/tools/${tool.code}/holds`).expect(201);
    await post(otherMember, `/api/tools/${tool.code}/holds`).expect(201);
    await post(lead, `/api/tools/${tool.code}/return`, { condition: 'ok' }).expect(200);
    await post(qm, `/api/tools/${tool.code}/lost`, { note: 'Left at the fly-in' }).expect(200);
    expect(holdRows().map((h) => h.status)).toEqual(['cancelled', 'cancelled']);
    expect((await t.lastMailTo('member@example.org'))?.subject).toBe(`Your hold on ${tool.code} Torque wrench has ended`);
    expect((await t.lastMailTo('other@example.org'))?.text).toMatch(/has been marked lost/);
  });

  test('puts the person a tool was held for back at the head of the queue when it goes out of service, and offers it again when it is back', async ({ t, qm, member, trail, holdRows }) => {
    const tool = await addToolAs(qm, { name: 'Rivet puller', category: 'hand_rivet_puller' });
    await post(member, `/api/tools/${tool.code}/holds`).expect(201);
    await post(qm, `/api/tools/${tool.code}/out-of-service`, { note: 'Jaws slip' }).expect(200);
    expect(holdRows()).toMatchObject([{ status: 'waiting' }]);
    expect((await t.lastMailTo('member@example.org'))?.text).toMatch(/taken out of service[\s\S]*keep your place/);
    const back = await post(qm, `/api/tools/${tool.code}/back-in-service`, { note: 'New jaws' });
    expect(back.body.status).toBe('held');
    expect((await t.lastMailTo('member@example.org'))?.subject).toMatch(/is back and held for you/);
    const moves = (await trail(tool.code)).filter((e) => e.toStatus !== null).map((e) => `${e.action}:${e.fromStatus}→${e.toStatus}`);
    expect(moves).toEqual(['added:null→available', 'held:available→held', 'out_of_service:held→out_of_service', 'back_in_service:out_of_service→available', 'held:available→held']);
  });

  test('records a return and the offer that follows in the order they happened', async ({ t, qm, member, otherMember, trail }) => {
    const tool = await addToolAs(qm, { name: 'Spacing fan', category: 'spacing_fan' });
    await lend(t, member, tool.code, DAY);
    await post(otherMember, `/api/tools/${tool.code}/holds`).expect(201);
    await post(member, `/api/tools/${tool.code}/return`, { condition: 'ok' }).expect(200);
    const moves = (await trail(tool.code)).filter((e) => e.toStatus !== null).map((e) => `${e.action}:${e.fromStatus}→${e.toStatus}`);
    expect(moves).toEqual(['added:null→available', 'checked_out:available→on_loan', 'returned:on_loan→available', 'held:available→held']);
  });
});

describe('refusals read as English', () => {
  test('names each status command in words when the state does not allow it', async ({ t, qm, member }) => {
    const tool = await addToolAs(qm, { name: 'Bucking bar', category: 'bucking_bar' });
    await lend(t, member, tool.code, DAY);
    const refusal = async (path: string) => (await post(qm, `/api/tools/${tool.code}/${path}`, { note: 'x' })).body.error.message as string;
    expect(await refusal('retire')).toBe(`${tool.code} is on loan, so it cannot be retired now.`);
    expect(await refusal('out-of-service')).toBe(`${tool.code} is on loan, so it cannot be taken out of service now.`);
    expect(await refusal('back-in-service')).toBe(`${tool.code} is on loan, so it cannot be put back in service now.`);
    expect(await refusal('found')).toBe(`${tool.code} is on loan, so it cannot be marked found now.`);
    await post(qm, `/api/tools/${tool.code}/retire`, { note: 'x' });
    await post(qm, `/api/tools/${tool.code}/lost`, { note: 'x' }).expect(200);
    await post(qm, `/api/tools/${tool.code}/retire`, { note: 'Written off' }).expect(200);
    expect(await refusal('lost')).toBe(`${tool.code} is retired, so it cannot be marked lost now.`);
  });

  test('says who has a late tool and since when, in words, without the word "held"', async ({ t, qm, member, otherMember }) => {
    const tool = await addToolAs(qm, { name: 'Air drill', category: 'air_drill' });
    t.clock.now = new Date('2026-11-20T15:00:00Z');
    await lend(t, member, tool.code, 9 * DAY); // due Sunday, November 29
    t.clock.now = new Date('2026-12-02T15:00:00Z');
    const res = await post(otherMember, `/api/tools/${tool.code}/checkout`);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toBe(`${tool.code} is on loan. Mia Member has it; it was due Sunday, November 29 (3 days late).`);
    const yours = await post(member, `/api/tools/${tool.code}/checkout`);
    expect(yours.body.error.message).toBe(`${tool.code} is on loan. You have it; it was due Sunday, November 29 (3 days late).`);
  });

  test('says a held tool is set aside for someone until a day and time in words', async ({ qm, member, otherMember }) => {
    const tool = await addToolAs(qm, { name: 'Air drill', category: 'air_drill' });
    await post(member, `/api/tools/${tool.code}/holds`).expect(201);
    const res = await post(otherMember, `/api/tools/${tool.code}/checkout`);
    expect(res.body.error.code).toBe('TOOL_HELD');
    expect(res.body.error.message).toMatch(new RegExp(`^${tool.code} is not free\\. It is set aside for Mia Member until Dec 3, 2026, \\d{1,2}:00 [AP]M\\.$`));
    expect(res.body.error.message).not.toMatch(/\d{4}-\d{2}-\d{2}/);
    expect((await otherMember.agent.get(`/api/tools/${tool.code}`)).body.forYou.reason).toMatch(/^It is set aside for Mia Member until Dec 3, 2026/);
  });
});

describe('holds need the sign-off the tool needs', () => {
  test('refuses a hold with 403 SIGNOFF_REQUIRED, on the shelf and on loan, and allows it once signed off', async ({ t, qm, member, statusOf, idOf, gatedTool }) => {
    const { signoff, tool } = await gatedTool();
    const refused = await post(member, `/api/tools/${tool.code}/holds`);
    expect(refused.status).toBe(403);
    expect(refused.body.error).toMatchObject({ code: 'SIGNOFF_REQUIRED', message: `${tool.code} needs the "Rivet gun" sign-off, which you do not have yet. Ask Lee Lead (chapter lead) to sign you off.` });
    expect(await statusOf(tool.code)).toBe('available');
    const qmId = await idOf('qm@example.org');
    t.db.insert(memberSignoffs).values({ signoffId: signoff.id, userId: qmId, grantedAt: t.clock.now, grantedById: qmId }).run();
    await lend(t, qm, tool.code, DAY);
    expect((await post(member, `/api/tools/${tool.code}/holds`)).body.error.code).toBe('SIGNOFF_REQUIRED');
    expect((await member.agent.get(`/api/tools/${tool.code}`)).body.forYou.actions).toEqual([]);
    const memberId = await idOf('member@example.org');
    t.db.insert(memberSignoffs).values({ signoffId: signoff.id, userId: memberId, grantedAt: t.clock.now, grantedById: qmId }).run();
    expect((await post(member, `/api/tools/${tool.code}/holds`)).status).toBe(201);
  });

  test('skips the tool in "Hold the kit" with the reason', async ({ member, statusOf, gatedTool }) => {
    const { tool } = await gatedTool();
    const build = await post(member, '/api/builds', { name: 'Tail kit' });
    const solid = { length: 12, pitch: 1, stack: [0.032, 0.032], rivet: { kind: 'solid', head: 'dome', diameter32: 4, material: '2117-T4' } };
    const assembly = await post(member, `/api/builds/${build.body.id}/assemblies`, { name: 'Rudder', unit: 'in', lines: [solid] });
    const res = await post(member, `/api/assemblies/${assembly.body.id}/kit/holds`);
    expect(res.status).toBe(201);
    const result = kitHoldsResultSchema.strict().parse(res.body);
    expect(result.placed).toEqual([]);
    expect(result.skipped).toEqual([{ code: tool.code, reason: expect.stringMatching(/needs the "Rivet gun" sign-off/) }]);
    expect(await statusOf(tool.code)).toBe('available');
  });
});

describe('deactivated people leave the queues', () => {
  test('cancels their holds and queue places when they are deactivated; a tool set aside for them goes to the next person', async ({ t, lead, qm, member, otherMember, idOf }) => {
    const shelf = await addToolAs(qm, { name: 'Rivet puller', category: 'hand_rivet_puller' });
    const lent = await addToolAs(qm, { name: 'Air drill', category: 'air_drill' });
    await post(member, `/api/tools/${shelf.code}/holds`).expect(201);
    await post(otherMember, `/api/tools/${shelf.code}/holds`).expect(201);
    await lend(t, qm, lent.code, DAY);
    await post(member, `/api/tools/${lent.code}/holds`).expect(201);
    const res = await patch(lead, `/api/users/${await idOf('member@example.org')}`, { active: false });
    expect(res.status).toBe(200);
    expect((await qm.agent.get(`/api/tools/${shelf.code}`)).body.holds).toMatchObject({ offeredTo: { name: 'Otto Other' }, waiting: 0 });
    expect((await qm.agent.get(`/api/tools/${lent.code}`)).body.holds).toMatchObject({ offeredTo: null, waiting: 0 });
    expect((await t.lastMailTo('other@example.org'))?.subject).toMatch(/is back and held for you/);
    const back = await post(qm, `/api/tools/${lent.code}/return`, { condition: 'ok' });
    expect(back.body).toMatchObject({ status: 'available', offeredTo: null });
  });

  test('never offers a tool to an inactive person still in a queue', async ({ t, qm, member, otherMember }) => {
    const tool = await addToolAs(qm, { name: 'Air drill', category: 'air_drill' });
    await lend(t, qm, tool.code, DAY);
    await post(member, `/api/tools/${tool.code}/holds`).expect(201);
    await post(otherMember, `/api/tools/${tool.code}/holds`).expect(201);
    t.db.$client.prepare("update users set deactivated_at = 1 where email = 'member@example.org'").run();
    const back = await post(qm, `/api/tools/${tool.code}/return`, { condition: 'ok' });
    expect(back.body).toMatchObject({ status: 'held', offeredTo: { name: 'Otto Other' } });
    expect(await t.lastMailTo('member@example.org')).toBeUndefined();
  });
});

describe('"Hold the kit" holds from the planned start', () => {
  test('queues for a tool on the shelf without setting it aside when the assembly starts in five weeks, and sets it aside on the day', async ({ t, qm, member, otherMember, statusOf, serviceCtx, kitAssembly }) => {
    const { tool, id } = await kitAssembly('2027-01-05');
    const res = await post(member, `/api/assemblies/${id}/kit/holds`);
    expect(res.status).toBe(201);
    expect(kitHoldsResultSchema.strict().parse(res.body)).toEqual({ placed: [{ code: tool.code, name: 'Bucking bar' }], skipped: [], holdsFrom: '2027-01-05' });
    expect(await statusOf(tool.code)).toBe('available');
    expect((await member.agent.get(`/api/tools/${tool.code}`)).body.forYou.yourHold).toMatchObject({ status: 'waiting', startsAt: '2027-01-05T07:00:00.000Z' });
    expect((await post(otherMember, `/api/tools/${tool.code}/checkout`)).status).toBe(201);
    await post(otherMember, `/api/tools/${tool.code}/return`, { condition: 'ok' }).expect(200);
    expect(await statusOf(tool.code)).toBe('available');
    t.clock.now = new Date('2027-01-04T12:00:00Z');
    expireHoldOffers(serviceCtx());
    expect(await statusOf(tool.code)).toBe('available');
    t.clock.now = new Date('2027-01-05T12:00:00Z');
    expireHoldOffers(serviceCtx());
    expect((await qm.agent.get(`/api/tools/${tool.code}`)).body).toMatchObject({ status: 'held', holds: { offeredTo: { name: 'Mia Member' } } });
  });

  test('sets the kit aside at once when the assembly has started or has no date', async ({ member, statusOf, kitAssembly }) => {
    const { tool, id } = await kitAssembly('2026-11-30');
    const res = await post(member, `/api/assemblies/${id}/kit/holds`);
    expect(res.body.holdsFrom).toBeNull();
    expect(await statusOf(tool.code)).toBe('held');
  });
});
