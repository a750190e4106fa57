import { describe, expect } from 'vitest';
import { crewTest } from '../helpers/crew-test';
import { PASSWORD, type SignedInAgent } from '../helpers/test-app';

const test = crewTest
  .extend('patch', ({ lead }) => (id: number | string, body: unknown, as: SignedInAgent = lead) => {
    return as.agent.patch(`/api/users/${id}`).set('X-CSRF-Token', as.csrf).send(body as object);
  })
  .extend('sessionCount', ({ t }) => () => (t.db.$client.prepare('select count(*) as n from sessions').get() as { n: number }).n);

describe('GET /api/users', () => {
  test('lists everyone by name with role and active flag for a lead', async ({ crew, lead }) => {
    const res = await lead.agent.get('/api/users');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body.data.map((p: { name: string }) => p.name)).toEqual(['Lee Lead', 'Mia Member', 'Quinn Quartermaster']);
    expect(res.body.data[1]).toEqual({
      id: crew.member.id,
      email: 'member@example.org',
      name: 'Mia Member',
      role: 'member',
      active: true,
      createdAt: expect.any(String),
      deactivatedAt: null,
      hasBadge: false,
      hasPin: false,
    });
    // No password hash leaves the server.
    expect(JSON.stringify(res.body)).not.toMatch(/argon2|passwordHash/);
  });

  test('answers 403 FORBIDDEN for a member and a quartermaster', async ({ t, crew }) => {
    for (const email of [crew.member.email, crew.quartermaster.email]) {
      const res = await (await t.signIn(email)).agent.get('/api/users');
      expect(res.status).toBe(403);
      expect(res.headers['content-type']).toMatch(/json/);
      expect(res.body.error.code).toBe('FORBIDDEN');
    }
  });

  test('answers 401 NOT_SIGNED_IN when signed out', async ({ t }) => {
    const res = await (await t.anonymous()).agent.get('/api/users');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('NOT_SIGNED_IN');
  });
});

describe('PATCH /api/users/:id', () => {
  test('changes a role, and the change applies on the person’s next request', async ({ t, crew, patch }) => {
    const qm = await t.signIn('qm@example.org');
    expect((await qm.agent.get('/api/users')).status).toBe(403);
    const res = await patch(crew.quartermaster.id, { role: 'lead' });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body).toMatchObject({ id: crew.quartermaster.id, role: 'lead', active: true });
    expect((await qm.agent.get('/api/auth/me')).body.user.role).toBe('lead');
    expect((await qm.agent.get('/api/users')).status).toBe(200);
  });

  test('deactivates a person: they are signed out at once and cannot sign in again', async ({ t, crew, lead, patch, sessionCount }) => {
    const member = await t.signIn('member@example.org');
    expect((await member.agent.get('/api/auth/me')).status).toBe(200);
    const before = sessionCount();
    const res = await patch(crew.member.id, { active: false });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: crew.member.id, active: false, deactivatedAt: t.clock.now.toISOString() });
    expect(sessionCount()).toBe(before - 1);
    expect((await member.agent.get('/api/auth/me')).body.user).toBeNull();
    const tools = await member.agent.get('/api/tools');
    expect(tools.status).toBe(401);
    expect(tools.body.error.code).toBe('NOT_SIGNED_IN');
    const { agent, csrf } = await t.anonymous();
    const login = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: 'member@example.org', password: PASSWORD });
    expect(login.status).toBe(403);
    expect(login.body.error.code).toBe('ACCOUNT_DEACTIVATED');
    // The lead's own session is untouched.
    expect((await lead.agent.get('/api/auth/me')).status).toBe(200);
  });

  test('keeps the first deactivation time when asked to deactivate again', async ({ t, crew, patch }) => {
    const first = t.clock.now.toISOString();
    await patch(crew.member.id, { active: false }).expect(200);
    t.clock.now = new Date(t.clock.now.getTime() + 60_000);
    const res = await patch(crew.member.id, { active: false });
    expect(res.status).toBe(200);
    expect(res.body.deactivatedAt).toBe(first);
  });

  test('reactivates a person, who can then sign in again', async ({ t, crew, patch }) => {
    await patch(crew.member.id, { active: false }).expect(200);
    const res = await patch(crew.member.id, { active: true });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: crew.member.id, active: true, deactivatedAt: null });
    const member = await t.signIn('member@example.org');
    expect((await member.agent.get('/api/auth/me')).body.user.email).toBe('member@example.org');
  });

  test('changes role and active flag together', async ({ crew, patch }) => {
    const res = await patch(crew.member.id, { role: 'quartermaster', active: false });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ role: 'quartermaster', active: false });
  });

  test('answers 409 CANNOT_DEACTIVATE_SELF when a lead deactivates themself, even with a second lead', async ({ crew, lead, patch }) => {
    await patch(crew.quartermaster.id, { role: 'lead' }).expect(200);
    const res = await patch(crew.lead.id, { active: false });
    expect(res.status).toBe(409);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body.error.code).toBe('CANNOT_DEACTIVATE_SELF');
    expect((await lead.agent.get('/api/auth/me')).status).toBe(200);
  });

  test('answers 409 and keeps the chapter’s only lead active when that lead deactivates themself', async ({ crew, lead, patch }) => {
    const res = await patch(crew.lead.id, { active: false });
    expect(res.status).toBe(409);
    // A lead can only be deactivated by another active lead, so for the only lead the self rule is the one that answers.
    expect(res.body.error.code).toBe('CANNOT_DEACTIVATE_SELF');
    const me = (await lead.agent.get('/api/users')).body.data.find((p: { id: number }) => p.id === crew.lead.id);
    expect(me).toMatchObject({ role: 'lead', active: true });
  });

  test('answers 409 LAST_LEAD when the only active lead would be demoted', async ({ crew, lead, patch }) => {
    const res = await patch(crew.lead.id, { role: 'quartermaster' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('LAST_LEAD');
    expect((await lead.agent.get('/api/auth/me')).body.user.role).toBe('lead');
  });

  test('answers 409 LAST_LEAD when the only other lead is deactivated: a deactivated lead does not count', async ({ crew, patch }) => {
    await patch(crew.member.id, { role: 'lead' }).expect(200);
    await patch(crew.member.id, { active: false }).expect(200);
    const res = await patch(crew.lead.id, { role: 'member' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('LAST_LEAD');
    // Reactivated, the other lead counts again.
    await patch(crew.member.id, { active: true }).expect(200);
    expect((await patch(crew.lead.id, { role: 'member' })).status).toBe(200);
  });

  test('lets a lead be demoted or deactivated when there is a second active lead', async ({ t, crew, lead, patch }) => {
    await patch(crew.quartermaster.id, { role: 'lead' }).expect(200);
    const demoted = await patch(crew.lead.id, { role: 'member' });
    expect(demoted.status).toBe(200);
    expect(demoted.body.role).toBe('member');
    // Lee is now a member and loses the People page on the next request.
    expect((await lead.agent.get('/api/users')).status).toBe(403);
    const second = await t.signIn('qm@example.org');
    await patch(crew.lead.id, { role: 'lead' }, second).expect(200);
    const deactivated = await patch(crew.lead.id, { active: false }, second);
    expect(deactivated.status).toBe(200);
    expect(deactivated.body.active).toBe(false);
    expect((await lead.agent.get('/api/auth/me')).body.user).toBeNull();
    // Quinn is the last active lead now.
    const last = await patch(crew.quartermaster.id, { role: 'member' }, second);
    expect(last.status).toBe(409);
    expect(last.body.error.code).toBe('LAST_LEAD');
  });

  test('answers 404 PERSON_NOT_FOUND for an id nobody has', async ({ patch }) => {
    const res = await patch(9999, { role: 'member' });
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('PERSON_NOT_FOUND');
  });

  test.for(['abc', '-1', '0', '2.5'])('answers 400 VALIDATION_FAILED for the id %s', async (id, { patch }) => {
    const res = await patch(id, { role: 'member' });
    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.issues).toEqual([{ path: 'id', message: expect.any(String) }]);
  });

  test.for([
    ['an empty body', {}, ''],
    ['an unknown field', { role: 'member', nickname: 'Bucky' }, 'nickname'],
    ['an unknown role', { role: 'admiral' }, 'role'],
    ['an active flag that is not a boolean', { active: 'no' }, 'active'],
  ])('answers 400 VALIDATION_FAILED with issues for %s', async ([_what, body, path], { crew, lead, patch }) => {
    const res = await patch(crew.member.id, body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.message).toEqual(expect.any(String));
    expect(res.body.error.issues.length).toBeGreaterThan(0);
    expect(res.body.error.issues[0]).toEqual({ path, message: expect.any(String) });
    // Nothing changed.
    const me = (await lead.agent.get('/api/users')).body.data.find((p: { id: number }) => p.id === crew.member.id);
    expect(me).toMatchObject({ role: 'member', active: true });
  });

  test('names the unknown field in the message', async ({ crew, patch }) => {
    const res = await patch(crew.member.id, { nickname: 'Bucky' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/nickname/);
  });

  test('answers 403 FORBIDDEN for a member and a quartermaster and 401 when signed out, changing nothing', async ({ t, crew, lead, patch }) => {
    for (const email of ['member@example.org', 'qm@example.org']) {
      const res = await patch(crew.member.id, { role: 'lead' }, await t.signIn(email));
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('FORBIDDEN');
    }
    const res = await patch(crew.member.id, { role: 'lead' }, await t.anonymous());
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('NOT_SIGNED_IN');
    const member = (await lead.agent.get('/api/users')).body.data.find((p: { id: number }) => p.id === crew.member.id);
    expect(member.role).toBe('member');
  });
});
