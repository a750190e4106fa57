import { describe, expect } from 'vitest';
import { crewTest } from '../helpers/crew-test';
import { post } from '../helpers/crib';

const test = crewTest
  .extend('events', ({ member }) => async () => (await member.agent.get('/api/tools/T-0001/events')).body.data as { action: string; fromStatus: string | null; toStatus: string | null; detail: string; actor: { name: string } | null }[]);

test.beforeEach(async ({ qm }) => {
  const res = await post(qm, '/api/tools', { name: 'Rivet gun 2X', category: 'rivet_gun', location: 'Air tool shelf' });
  expect(res.status).toBe(201);
});

describe('PATCH /api/tools/:code', () => {
  test('changes details, records who changed what, and refuses a member', async ({ qm, member, events }) => {
    const res = await qm.agent.patch('/api/tools/T-0001').set('X-CSRF-Token', qm.csrf).send({ location: 'Cabinet B', loanDays: 3 });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ location: 'Cabinet B', loanDays: 3, loanDaysOverride: 3 });
    expect((await events())[0]).toMatchObject({ action: 'edited', detail: 'Changed location, loanDays', actor: { name: 'Quinn Quartermaster' } });
    const refused = await member.agent.patch('/api/tools/T-0001').set('X-CSRF-Token', member.csrf).send({ location: 'x' });
    expect(refused.status).toBe(403);
  });

  test('refuses an empty change, an unknown field and a change that breaks the kind rules', async ({ qm }) => {
    const patch = (body: object) => qm.agent.patch('/api/tools/T-0001').set('X-CSRF-Token', qm.csrf).send(body);
    expect((await patch({})).body.error.code).toBe('VALIDATION_FAILED');
    expect((await patch({ colour: 'red' })).status).toBe(400);
    const tray = await patch({ category: 'temporary_fastener_tray' });
    expect(tray.status).toBe(400);
    expect(tray.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['trayCapacity', 'traySize']);
  });
});

describe('quartermaster state changes', () => {
  test('takes a tool out of service with a reason, blocks checkout, and brings it back serviced', async ({ t, qm, member, events }) => {
    const out = await post(qm, '/api/tools/T-0001/out-of-service', { note: 'Throttle valve leaks' });
    expect(out.status).toBe(200);
    expect(out.body.status).toBe('out_of_service');
    expect((await post(member, '/api/tools/T-0001/checkout')).body.error.code).toBe('TOOL_OUT_OF_SERVICE');
    t.clock.now = new Date('2026-12-03T09:00:00Z');
    const back = await post(qm, '/api/tools/T-0001/back-in-service', { note: 'New valve fitted', serviced: true });
    expect(back.body.status).toBe('available');
    const tool = (await member.agent.get('/api/tools/T-0001')).body;
    expect(tool.lastServiceAt).toBe('2026-12-03T09:00:00.000Z');
    expect((await events()).slice(0, 3).map((e) => e.action)).toEqual(['serviced', 'back_in_service', 'out_of_service']);
  });

  test('refuses a change that does not fit the state, with the state in words', async ({ qm, member }) => {
    const res = await post(qm, '/api/tools/T-0001/back-in-service', { note: 'x' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('WRONG_STATE');
    expect(res.body.error.message).toMatch(/is available/);
    await post(member, '/api/tools/T-0001/checkout').expect(201);
    expect((await post(qm, '/api/tools/T-0001/retire', { note: 'worn' })).body.error.code).toBe('WRONG_STATE');
  });

  test('marks a tool on loan lost, closing the loan with the reason, then finds it again', async ({ qm, member }) => {
    await post(member, '/api/tools/T-0001/checkout').expect(201);
    const lost = await post(qm, '/api/tools/T-0001/lost', { note: 'Not seen since the fly-in' });
    expect(lost.body.status).toBe('lost');
    const mine = (await member.agent.get('/api/loans/mine')).body.data[0];
    expect(mine).toMatchObject({ returnCondition: 'needs_attention', returnNote: 'Marked lost: Not seen since the fly-in' });
    expect(mine.returnedAt).not.toBeNull();
    expect((await post(member, '/api/tools/T-0001/checkout')).body.error.code).toBe('TOOL_UNAVAILABLE');
    expect((await post(qm, '/api/tools/T-0001/found', { note: 'Behind the compressor' })).body.status).toBe('available');
    expect((await post(member, '/api/tools/T-0001/checkout')).status).toBe(201);
  });

  test('needs a reason, is refused to members, and retires for good', async ({ qm, member }) => {
    expect((await post(qm, '/api/tools/T-0001/retire', {})).body.error.code).toBe('VALIDATION_FAILED');
    expect((await post(member, '/api/tools/T-0001/retire', { note: 'x' })).status).toBe(403);
    expect((await post(qm, '/api/tools/T-0001/retire', { note: 'Cracked housing' })).body.status).toBe('retired');
    const res = await post(member, '/api/tools/T-0001/checkout');
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/retired/);
  });

  test('offers a tool coming back into service to the first person waiting', async ({ t, qm, member }) => {
    await post(qm, '/api/tools/T-0001/out-of-service', { note: 'Worn set' });
    expect((await post(member, '/api/tools/T-0001/holds')).status).toBe(201);
    const back = await post(qm, '/api/tools/T-0001/back-in-service', { note: 'New set' });
    expect(back.body.status).toBe('held');
    expect((await t.lastMailTo('member@example.org'))?.subject).toMatch(/held for you/);
  });
});

describe('GET /api/tools', () => {
  test('filters by status, category and text, and pages', async ({ t, qm, member }) => {
    await post(qm, '/api/tools', { name: 'Air drill', category: 'air_drill' }).expect(201);
    await post(qm, '/api/tools', { name: 'Deburring tool', category: 'deburring_tool' }).expect(201);
    await post(member, '/api/tools/T-0002/checkout').expect(201);
    const list = (q: string) => member.agent.get(`/api/tools${q}`);
    expect((await list('?status=on_loan')).body.data.map((x: { code: string }) => x.code)).toEqual(['T-0002']);
    expect((await list('?category=deburring_tool')).body.data.map((x: { code: string }) => x.code)).toEqual(['T-0003']);
    expect((await list('?q=drill')).body.data.map((x: { code: string }) => x.code)).toEqual(['T-0002']);
    const page = (await list('?pageSize=2&page=2')).body;
    expect(page.meta).toEqual({ total: 3, page: 2, pageSize: 2 });
    expect(page.data).toHaveLength(1);
    expect((await list('?status=borrowed')).status).toBe(400);
    expect((await (await t.anonymous()).agent.get('/api/tools')).status).toBe(401);
  });
});
