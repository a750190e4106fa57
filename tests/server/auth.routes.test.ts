import { describe, expect, it, onTestFinished } from 'vitest';
import { meResponseSchema } from '@shared/schemas/auth';
import { accountsTest } from '../helpers/crew-test';
import { buildTestApp, PASSWORD, type SignedInAgent } from '../helpers/test-app';

const test = accountsTest
  .extend('sessionsOf', ({ t }) => (email: string) =>
    (
      t.db.$client
        .prepare("select count(*) as n from sessions where json_extract(sess, '$.userId') = (select id from users where email = ?)")
        .get(email) as { n: number }
    ).n)
  .extend('deactivate', ({ t }) => (email: string) => t.db.$client.prepare('update users set deactivated_at = 1 where email = ?').run(email))
  .extend('remove', ({ t }) => (email: string) => t.db.$client.prepare('delete from users where email = ?').run(email));

describe('GET /api/health', () => {
  test('answers 200 { ok: true } without a session', async ({ t }) => {
    const res = await (await t.anonymous()).agent.get('/api/health');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body).toEqual({ ok: true });
  });
});

describe('POST /api/auth/login', () => {
  test('signs in with the right password and returns the user and a fresh CSRF token', async ({ t }) => {
    const { agent, csrf } = await t.anonymous();
    const res = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: 'Lead@Example.org', password: PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toEqual({ id: expect.any(Number), email: 'lead@example.org', name: 'Lee Lead', role: 'lead' });
    expect(res.body.csrfToken).toEqual(expect.any(String));
    expect(res.body.csrfToken).not.toBe(csrf);
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/gripline\.sid=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe('lead@example.org');
  });

  test('gives a new session id at sign-in', async ({ t }) => {
    const { agent, csrf } = await t.anonymous();
    const before = (await agent.get('/api/auth/csrf')).headers['set-cookie'];
    const res = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: 'lead@example.org', password: PASSWORD });
    const after = res.headers['set-cookie'];
    const sid = (c: unknown) => String(c).match(/gripline\.sid=([^;]+)/)?.[1];
    expect(sid(after)).toBeDefined();
    expect(sid(after)).not.toBe(sid(before) ?? 'none');
  });

  test('answers 401 with the same message for a wrong password and an unknown e-mail', async ({ t }) => {
    const { agent, csrf } = await t.anonymous();
    const wrong = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: 'lead@example.org', password: 'not the password' });
    const unknown = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: 'nobody@example.org', password: 'not the password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.error.code).toBe('BAD_CREDENTIALS');
    expect(unknown.body.error).toEqual(wrong.body.error);
  });

  test('refuses a request without the CSRF token with 403', async ({ t }) => {
    const { agent } = await t.anonymous();
    const res = await agent.post('/api/auth/login').send({ email: 'lead@example.org', password: PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('CSRF_TOKEN_INVALID');
  });

  test('refuses a wrong CSRF token with 403', async ({ t }) => {
    const { agent } = await t.anonymous();
    const res = await agent.post('/api/auth/login').set('X-CSRF-Token', 'made-up').send({ email: 'lead@example.org', password: PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('CSRF_TOKEN_INVALID');
  });

  test('rejects the token from before sign-in once signed in', async ({ t }) => {
    const { agent, csrf } = await t.anonymous();
    await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: 'lead@example.org', password: PASSWORD }).expect(200);
    const res = await agent.post('/api/auth/logout').set('X-CSRF-Token', csrf);
    expect(res.status).toBe(403);
  });

  test('answers 400 with the fields at fault for a malformed body', async ({ t }) => {
    const { agent, csrf } = await t.anonymous();
    const res = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: 'not-an-email' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.message).toMatch(/e-mail/);
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['email', 'password']);
  });

  test('answers 400 INVALID_JSON for a body that is not JSON', async ({ t }) => {
    const { agent, csrf } = await t.anonymous();
    const res = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).set('Content-Type', 'application/json').send('{"email":');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('INVALID_JSON');
  });

  test('refuses a deactivated person with 403 even with the right password', async ({ t }) => {
    const lead = await t.signIn('lead@example.org');
    const people = await lead.agent.get('/api/users');
    const member = people.body.data.find((p: { email: string }) => p.email === 'member@example.org');
    await lead.agent.patch(`/api/users/${member.id}`).set('X-CSRF-Token', lead.csrf).send({ active: false }).expect(200);
    const { agent, csrf } = await t.anonymous();
    const res = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: 'member@example.org', password: PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('ACCOUNT_DEACTIVATED');
  });
});

describe('GET /api/auth/me and POST /api/auth/logout', () => {
  test('answers 200 with no one for a signed-out visitor (not an error), while the other routes still answer 401', async ({ t }) => {
    const { agent } = await t.anonymous();
    const res = await agent.get('/api/auth/me');
    expect(res.status).toBe(200);
    expect(meResponseSchema.parse(res.body)).toEqual({ user: null, timeZone: expect.any(String) });
    const tools = await agent.get('/api/tools');
    expect(tools.status).toBe(401);
    expect(tools.body.error.code).toBe('NOT_SIGNED_IN');
  });

  test('signs out with 204 and the session no longer works', async ({ t }) => {
    const { agent, csrf } = await t.signIn('member@example.org');
    const res = await agent.post('/api/auth/logout').set('X-CSRF-Token', csrf);
    expect(res.status).toBe(204);
    expect((await agent.get('/api/auth/me')).body.user).toBeNull();
    expect((await agent.get('/api/tools')).status).toBe(401);
  });
});

describe('a session whose person was deactivated or removed outside the People screens', () => {
  type Send = (s: SignedInAgent) => Promise<{ status: number; body: { error?: { code: string } } }>;
  const requests: Array<[string, Send]> = [
    ['GET /api/auth/me', (s) => s.agent.get('/api/auth/me')],
    ['GET /api/auth/csrf', (s) => s.agent.get('/api/auth/csrf')],
    ['GET /api/tools', (s) => s.agent.get('/api/tools')],
    ['POST /api/auth/logout', (s) => s.agent.post('/api/auth/logout').set('X-CSRF-Token', s.csrf)],
    ['PATCH /api/me/preferences', (s) => s.agent.patch('/api/me/preferences').set('X-CSRF-Token', s.csrf).send({ preferredUnit: 'mm' })],
  ];

  test.for(requests)('%s answers 401 NOT_SIGNED_IN once the person is deactivated in the database, and ends their sessions', async ([_name, send], { t, sessionsOf, deactivate }) => {
    const phone = await t.signIn('member@example.org');
    await t.signIn('member@example.org');
    expect(sessionsOf('member@example.org')).toBe(2);
    deactivate('member@example.org');
    const res = await send(phone);
    expect(res.status).toBe(401);
    expect(res.body.error?.code).toBe('NOT_SIGNED_IN');
    expect(sessionsOf('member@example.org')).toBe(0);
    expect((await phone.agent.get('/api/auth/me')).body.user).toBeNull();
  });

  test.for(requests)('%s answers 401 NOT_SIGNED_IN once the person’s row is deleted', async ([_name, send], { t, remove }) => {
    const phone = await t.signIn('member@example.org');
    const id = (await phone.agent.get('/api/auth/me')).body.user.id as number;
    remove('member@example.org');
    const res = await send(phone);
    expect(res.status).toBe(401);
    expect(res.body.error?.code).toBe('NOT_SIGNED_IN');
    const left = t.db.$client.prepare("select count(*) as n from sessions where json_extract(sess, '$.userId') = ?").get(id) as { n: number };
    expect(left.n).toBe(0);
  });

  test('lets someone else sign in on the same phone afterwards', async ({ t, deactivate }) => {
    const phone = await t.signIn('member@example.org');
    deactivate('member@example.org');
    expect((await phone.agent.get('/api/tools')).status).toBe(401);
    const token = (await phone.agent.get('/api/auth/csrf')).body.token as string;
    const res = await phone.agent.post('/api/auth/login').set('X-CSRF-Token', token).send({ email: 'lead@example.org', password: PASSWORD });
    expect(res.status).toBe(200);
    expect((await phone.agent.get('/api/auth/me')).body.user.email).toBe('lead@example.org');
  });
});

describe('sign-in rate limiting', () => {
  it('answers 429 with Retry-After after too many failures for one account, and a success is not counted', async () => {
    const t = await buildTestApp({ rateLimit: { windowMs: 60_000, perIp: 100, perAccount: 3 } });
    onTestFinished(() => t.close());
    await t.addUser({ email: 'member@example.org' });
    const { agent, csrf } = await t.anonymous();
    const login = (password: string) =>
      agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: 'member@example.org', password });
    // Successful sign-ins are not throttled.
    for (let i = 0; i < 4; i++) {
      const ok = await t.signIn('member@example.org');
      expect(ok.csrf).toBeTruthy();
    }
    for (let i = 0; i < 3; i++) expect((await login('wrong password')).status).toBe(401);
    const blocked = await login('wrong password');
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('TOO_MANY_ATTEMPTS');
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
    // Another account from the same address is not blocked by this account's failures.
    const other = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: 'other@example.org', password: 'x' });
    expect(other.status).toBe(401);
  });

  it('after too many failures from one address, refuses it on the accounts it failed on, yet lets a member behind it sign in', async () => {
    const t = await buildTestApp({ rateLimit: { windowMs: 60_000, perIp: 3, perAccount: 100 } });
    onTestFinished(() => t.close());
    await t.addUser({ email: 'member@example.org' });
    const { agent, csrf } = await t.anonymous();
    for (let i = 0; i < 3; i++) {
      const res = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: `u${i}@example.org`, password: 'nope' });
      expect(res.status).toBe(401);
    }
    const again = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: 'u0@example.org', password: 'nope' });
    expect(again.status).toBe(429);
    expect(again.headers['retry-after']).toBeDefined();
    // The next guess at a new account from the same address is its last one there.
    expect((await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: 'u9@example.org', password: 'nope' })).status).toBe(401);
    expect((await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: 'u9@example.org', password: 'nope' })).status).toBe(429);
    // A member behind the same address (one hangar network) who has not been failing still gets in.
    expect((await t.signIn('member@example.org')).csrf).toBeTruthy();
  });

  it("does not lock the owner out when someone else keeps guessing the account's password from another address", async () => {
    const t = await buildTestApp({ rateLimit: { windowMs: 60_000, perIp: 100, perAccount: 3 }, trustProxyHops: 1 });
    onTestFinished(() => t.close());
    await t.addUser({ email: 'member@example.org' });
    const { agent, csrf } = await t.anonymous();
    const from = (address: string, password: string) =>
      agent.post('/api/auth/login').set('X-CSRF-Token', csrf).set('X-Forwarded-For', address).send({ email: 'member@example.org', password });
    for (let i = 0; i < 10; i++) await from('198.51.100.7', 'guess ' + i);
    expect((await from('198.51.100.7', 'guess again')).status).toBe(429);
    const owner = await from('203.0.113.20', PASSWORD);
    expect(owner.status).toBe(200);
  });
});
