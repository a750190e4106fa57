import { describe, expect } from 'vitest';
import type { Role } from '@shared/roles';
import { serverTimeZone } from '@shared/time/chapter-time';
import { crewTest } from '../helpers/crew-test';
import { tokenFromLink, type SignedInAgent } from '../helpers/test-app';

const NEW_PASSWORD = 'a rivet in every hole';
const DAY_MS = 24 * 60 * 60 * 1000;
const UNKNOWN_TOKEN = 'Q'.repeat(42) + 'A';

const test = crewTest
  .extend('invite', ({ lead }) => (email: string, role: Role = 'member', as: SignedInAgent = lead) =>
    as.agent.post('/api/invitations').set('X-CSRF-Token', as.csrf).send({ email, role }))
  /** Invites the address and returns the token from the link in the e-mail it received. */
  .extend('inviteAndReadToken', ({ t, invite }) => async (email: string, role: Role = 'member'): Promise<string> => {
    const res = await invite(email, role);
    expect(res.status).toBe(201);
    const mail = await t.lastMailTo(email);
    expect(mail).toBeDefined();
    const link = mail!.links.find((l) => l.startsWith('http://gripline.test/invite/'));
    expect(link).toBeDefined();
    return tokenFromLink(link!);
  })
  .extend('accept', ({ t }) => async (token: string, name = 'Nia Newcomer', password = NEW_PASSWORD) => {
    const { agent, csrf } = await t.anonymous();
    const res = await agent.post('/api/invitations/accept').set('X-CSRF-Token', csrf).send({ token, name, password });
    return { agent, res };
  });

describe('POST /api/invitations', () => {
  test('answers 201 with the pending invitation and e-mails a link to the address', async ({ t, invite }) => {
    const res = await invite('Newcomer@Example.org', 'quartermaster');
    expect(res.status).toBe(201);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body).toEqual({
      id: expect.any(Number),
      email: 'newcomer@example.org',
      role: 'quartermaster',
      invitedBy: 'Lee Lead',
      createdAt: expect.any(String),
      expiresAt: new Date(t.clock.now.getTime() + 7 * DAY_MS).toISOString(),
    });
    const mail = await t.lastMailTo('newcomer@example.org');
    expect(mail?.subject).toMatch(/Lee Lead/);
    expect(mail?.links).toHaveLength(1);
    expect(mail?.links[0]).toMatch(/^http:\/\/gripline\.test\/invite\/[A-Za-z0-9_-]{43}$/);
  });

  test('answers 409 ALREADY_HAS_ACCOUNT for an address that has an account, whatever its case, and sends no mail', async ({ t, invite }) => {
    const res = await invite('MEMBER@example.org');
    expect(res.status).toBe(409);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body.error.code).toBe('ALREADY_HAS_ACCOUNT');
    expect(await t.lastMailTo('member@example.org')).toBeUndefined();
  });

  test('answers 400 VALIDATION_FAILED for a bad address or an unknown role', async ({ lead }) => {
    const res = await lead.agent.post('/api/invitations').set('X-CSRF-Token', lead.csrf).send({ email: 'no-at-sign', role: 'admiral' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['email', 'role']);
  });

  test('answers 403 FORBIDDEN for a member and a quartermaster', async ({ t, invite }) => {
    for (const email of ['member@example.org', 'qm@example.org']) {
      const res = await invite('someone@example.org', 'member', await t.signIn(email));
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('FORBIDDEN');
    }
    expect(await t.lastMailTo('someone@example.org')).toBeUndefined();
  });

  test('answers 401 NOT_SIGNED_IN when signed out', async ({ t, invite }) => {
    const res = await invite('someone@example.org', 'member', await t.anonymous());
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('NOT_SIGNED_IN');
  });

  test('answers 201 and keeps the invitation when the mail server is down; the mail goes out on a later run', async ({ t, lead, invite, accept }) => {
    const res = await invite('newcomer@example.org');
    expect(res.status).toBe(201);
    const down = await t.deliverMail({ send: () => Promise.reject(new Error('connection refused')), close: () => undefined });
    expect(down).toEqual({ sent: 0, retrying: 1, failed: 0 });
    expect((await lead.agent.get('/api/invitations')).body.data).toEqual([expect.objectContaining({ email: 'newcomer@example.org' })]);
    t.clock.now = new Date(t.clock.now.getTime() + 60_000);
    const token = tokenFromLink((await t.lastMailTo('newcomer@example.org'))!.links[0]!);
    expect((await accept(token)).res.status).toBe(201);
  });
});

describe('GET /api/invitations/by-token/:token', () => {
  test('previews the e-mail, role, inviter and expiry without a session', async ({ t, inviteAndReadToken }) => {
    const token = await inviteAndReadToken('newcomer@example.org', 'quartermaster');
    const res = await (await t.anonymous()).agent.get(`/api/invitations/by-token/${token}`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body).toEqual({
      email: 'newcomer@example.org',
      role: 'quartermaster',
      invitedBy: 'Lee Lead',
      expiresAt: new Date(t.clock.now.getTime() + 7 * DAY_MS).toISOString(),
    });
  });

  test('answers 400 VALIDATION_FAILED for a token of the wrong shape', async ({ t }) => {
    const { agent } = await t.anonymous();
    for (const bad of ['short', `${UNKNOWN_TOKEN}x`, `${'Q'.repeat(42)}!`]) {
      const res = await agent.get(`/api/invitations/by-token/${encodeURIComponent(bad)}`);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('VALIDATION_FAILED');
      expect(res.body.error.issues[0].path).toBe('token');
    }
  });

  test('answers 404 LINK_NOT_FOUND for a well-formed token nobody was sent', async ({ t, inviteAndReadToken }) => {
    await inviteAndReadToken('newcomer@example.org');
    const res = await (await t.anonymous()).agent.get(`/api/invitations/by-token/${UNKNOWN_TOKEN}`);
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body.error.code).toBe('LINK_NOT_FOUND');
  });
});

describe('POST /api/invitations/accept', () => {
  test('creates the account with the invited role, answers 201 { user, timeZone, csrfToken } and signs the person in', async ({ inviteAndReadToken, accept }) => {
    const token = await inviteAndReadToken('newcomer@example.org', 'quartermaster');
    const { agent, res } = await accept(token, '  Nia Newcomer  ');
    expect(res.status).toBe(201);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body).toEqual({
      user: { id: expect.any(Number), email: 'newcomer@example.org', name: 'Nia Newcomer', role: 'quartermaster' },
      timeZone: serverTimeZone(),
      csrfToken: expect.any(String),
    });
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user).toEqual(res.body.user);
    // The returned token is the one the new session accepts.
    expect((await agent.post('/api/auth/logout').set('X-CSRF-Token', res.body.csrfToken)).status).toBe(204);
  });

  test('lets the new person sign in later with the chosen password', async ({ t, inviteAndReadToken, accept }) => {
    const token = await inviteAndReadToken('newcomer@example.org');
    expect((await accept(token)).res.status).toBe(201);
    const { agent } = await t.signIn('newcomer@example.org', NEW_PASSWORD);
    expect((await agent.get('/api/auth/me')).body.user.email).toBe('newcomer@example.org');
  });

  test('works once: a second accept answers 410 LINK_USED and so does the preview', async ({ t, lead, inviteAndReadToken, accept }) => {
    const token = await inviteAndReadToken('newcomer@example.org');
    expect((await accept(token)).res.status).toBe(201);
    const again = (await accept(token, 'Someone Else', 'another long password')).res;
    expect(again.status).toBe(410);
    expect(again.headers['content-type']).toMatch(/json/);
    expect(again.body.error.code).toBe('LINK_USED');
    const preview = await (await t.anonymous()).agent.get(`/api/invitations/by-token/${token}`);
    expect(preview.status).toBe(410);
    expect(preview.body.error.code).toBe('LINK_USED');
    // The first acceptance stands.
    const people = await lead.agent.get('/api/users');
    expect(people.body.data.filter((p: { email: string }) => p.email === 'newcomer@example.org')).toHaveLength(1);
  });

  test('still works just before 7 days have passed', async ({ t, inviteAndReadToken, accept }) => {
    const token = await inviteAndReadToken('newcomer@example.org');
    t.clock.now = new Date(t.clock.now.getTime() + 7 * DAY_MS - 60_000);
    expect((await accept(token)).res.status).toBe(201);
  });

  test('answers 410 LINK_EXPIRED once 7 days have passed', async ({ t, lead, inviteAndReadToken, accept }) => {
    const token = await inviteAndReadToken('newcomer@example.org');
    t.clock.now = new Date(t.clock.now.getTime() + 7 * DAY_MS + 60_000);
    const preview = await (await t.anonymous()).agent.get(`/api/invitations/by-token/${token}`);
    expect(preview.status).toBe(410);
    expect(preview.body.error.code).toBe('LINK_EXPIRED');
    const { res } = await accept(token);
    expect(res.status).toBe(410);
    expect(res.body.error.code).toBe('LINK_EXPIRED');
    expect((await lead.agent.get('/api/invitations')).body.data).toEqual([]);
  });

  test('answers 410 LINK_REVOKED for the old link after the same address is invited again; the new link works', async ({ lead, inviteAndReadToken, accept }) => {
    const first = await inviteAndReadToken('newcomer@example.org', 'member');
    const second = await inviteAndReadToken('newcomer@example.org', 'quartermaster');
    expect(second).not.toBe(first);
    const old = (await accept(first)).res;
    expect(old.status).toBe(410);
    expect(old.body.error.code).toBe('LINK_REVOKED');
    const pending = (await lead.agent.get('/api/invitations')).body.data;
    expect(pending.map((p: { email: string; role: string }) => [p.email, p.role])).toEqual([['newcomer@example.org', 'quartermaster']]);
    const ok = (await accept(second)).res;
    expect(ok.status).toBe(201);
    expect(ok.body.user.role).toBe('quartermaster');
  });

  test('answers 409 ALREADY_HAS_ACCOUNT when the address got an account after the invitation was sent', async ({ t, inviteAndReadToken, accept }) => {
    const token = await inviteAndReadToken('newcomer@example.org');
    await t.addUser({ email: 'newcomer@example.org', name: 'Nia Newcomer' });
    const { res } = await accept(token);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('ALREADY_HAS_ACCOUNT');
  });

  test('answers 404 LINK_NOT_FOUND for a well-formed unknown token', async ({ accept }) => {
    const { res } = await accept(UNKNOWN_TOKEN);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('LINK_NOT_FOUND');
  });

  test('answers 400 VALIDATION_FAILED naming each bad field and creates nobody', async ({ t, inviteAndReadToken, accept }) => {
    const token = await inviteAndReadToken('newcomer@example.org');
    const { agent, csrf } = await t.anonymous();
    const res = await agent.post('/api/invitations/accept').set('X-CSRF-Token', csrf).send({ token: 'short', name: '   ', password: 'short' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['name', 'password', 'token']);
    // The real token is untouched by the failed attempt.
    expect((await accept(token)).res.status).toBe(201);
  });
});

describe('GET /api/invitations', () => {
  test('lists the pending invitations with who sent them, leaving out the used ones', async ({ t, lead, inviteAndReadToken, accept }) => {
    const used = await inviteAndReadToken('first@example.org', 'member');
    t.clock.now = new Date(t.clock.now.getTime() + 60_000);
    await inviteAndReadToken('second@example.org', 'lead');
    await inviteAndReadToken('third@example.org', 'quartermaster');
    expect((await accept(used)).res.status).toBe(201);
    const res = await lead.agent.get('/api/invitations');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/json/);
    const emails = res.body.data.map((p: { email: string }) => p.email).sort();
    expect(emails).toEqual(['second@example.org', 'third@example.org']);
    for (const p of res.body.data) {
      expect(p).toEqual({
        id: expect.any(Number),
        email: expect.any(String),
        role: p.email === 'second@example.org' ? 'lead' : 'quartermaster',
        invitedBy: 'Lee Lead',
        createdAt: expect.any(String),
        expiresAt: new Date(t.clock.now.getTime() + 7 * DAY_MS).toISOString(),
      });
    }
  });

  test('answers 403 FORBIDDEN for a member and a quartermaster and 401 NOT_SIGNED_IN when signed out', async ({ t, crew }) => {
    for (const email of [crew.member.email, crew.quartermaster.email]) {
      const res = await (await t.signIn(email)).agent.get('/api/invitations');
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('FORBIDDEN');
    }
    const res = await (await t.anonymous()).agent.get('/api/invitations');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('NOT_SIGNED_IN');
  });
});

describe('DELETE /api/invitations/:id', () => {
  test('withdraws the invitation with 204: it leaves the list and its link answers 410 LINK_REVOKED', async ({ lead, inviteAndReadToken, accept }) => {
    const token = await inviteAndReadToken('newcomer@example.org');
    const [pending] = (await lead.agent.get('/api/invitations')).body.data;
    const res = await lead.agent.delete(`/api/invitations/${pending.id}`).set('X-CSRF-Token', lead.csrf);
    expect(res.status).toBe(204);
    expect((await lead.agent.get('/api/invitations')).body.data).toEqual([]);
    const { res: accepted } = await accept(token);
    expect(accepted.status).toBe(410);
    expect(accepted.body.error.code).toBe('LINK_REVOKED');
  });

  test('answers 404 INVITATION_NOT_FOUND for one already withdrawn, one already used and an unknown id', async ({ lead, invite, inviteAndReadToken, accept }) => {
    const withdrawn = (await invite('gone@example.org')).body.id as number;
    await lead.agent.delete(`/api/invitations/${withdrawn}`).set('X-CSRF-Token', lead.csrf).expect(204);
    const usedToken = await inviteAndReadToken('used@example.org');
    const used = (await lead.agent.get('/api/invitations')).body.data[0].id as number;
    expect((await accept(usedToken)).res.status).toBe(201);
    for (const id of [withdrawn, used, 9999]) {
      const res = await lead.agent.delete(`/api/invitations/${id}`).set('X-CSRF-Token', lead.csrf);
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe('INVITATION_NOT_FOUND');
    }
  });

  test('answers 400 VALIDATION_FAILED for an id that is not a positive whole number', async ({ lead }) => {
    for (const id of ['abc', '-1', '1.5', '0']) {
      const res = await lead.agent.delete(`/api/invitations/${id}`).set('X-CSRF-Token', lead.csrf);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('VALIDATION_FAILED');
      expect(res.body.error.issues[0].path).toBe('id');
    }
  });

  test('answers 403 FORBIDDEN for a member and a quartermaster and 401 when signed out, leaving it pending', async ({ t, lead, invite }) => {
    const id = (await invite('newcomer@example.org')).body.id as number;
    for (const email of ['member@example.org', 'qm@example.org']) {
      const { agent, csrf } = await t.signIn(email);
      const res = await agent.delete(`/api/invitations/${id}`).set('X-CSRF-Token', csrf);
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('FORBIDDEN');
    }
    const { agent, csrf } = await t.anonymous();
    const res = await agent.delete(`/api/invitations/${id}`).set('X-CSRF-Token', csrf);
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('NOT_SIGNED_IN');
    expect((await lead.agent.get('/api/invitations')).body.data.map((p: { id: number }) => p.id)).toEqual([id]);
  });
});
