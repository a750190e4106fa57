import { describe, expect } from 'vitest';
import { outboxMail } from '../../server/db/schema/mail';
import { RESETS_PER_HOUR } from '../../server/features/password-reset/password-reset.service';
import { accountsTest } from '../helpers/crew-test';
import { PASSWORD, tokenFromLink } from '../helpers/test-app';

const NEW_PASSWORD = 'fresh bucking bar 42';
const HOUR_MS = 60 * 60 * 1000;

const test = accountsTest
  .extend('requestReset', ({ t }) => async (email: string) => {
    const { agent, csrf } = await t.anonymous();
    return agent.post('/api/auth/password-reset').set('X-CSRF-Token', csrf).send({ email });
  })
  /** Asks for a reset and returns the token from the link in the e-mail. */
  .extend('resetToken', ({ t, requestReset }) => async (email: string): Promise<string> => {
    expect((await requestReset(email)).status).toBe(202);
    const link = (await t.lastMailTo(email))?.links.find((l) => l.startsWith('http://gripline.test/reset-password/'));
    expect(link).toBeDefined();
    return tokenFromLink(link!);
  })
  .extend('confirm', ({ t }) => async (token: string, password = NEW_PASSWORD) => {
    const { agent, csrf } = await t.anonymous();
    return agent.post('/api/auth/password-reset/confirm').set('X-CSRF-Token', csrf).send({ token, password });
  })
  .extend('login', ({ t }) => async (email: string, password: string) => {
    const { agent, csrf } = await t.anonymous();
    return agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email, password });
  })
  /** Messages written, sent or not. */
  .extend('mailCount', ({ t }) => () => t.db.select().from(outboxMail).all().length);

describe('POST /api/auth/password-reset', () => {
  test('answers 202 with the same body for a known and an unknown address', async ({ requestReset }) => {
    const known = await requestReset('member@example.org');
    const unknown = await requestReset('nobody@example.org');
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(known.headers['content-type']).toMatch(/json/);
    expect(known.body).toEqual({ ok: true, message: expect.stringMatching(/1 hour/) });
    expect(unknown.body).toEqual(known.body);
  });

  test('e-mails a one-hour link only to the known address', async ({ t, requestReset, mailCount }) => {
    await requestReset('Member@Example.org');
    await requestReset('nobody@example.org');
    expect(mailCount()).toBe(1);
    expect(await t.lastMailTo('nobody@example.org')).toBeUndefined();
    const mail = await t.lastMailTo('member@example.org');
    expect(mail?.subject).toMatch(/reset/i);
    expect(mail?.text).toMatch(/Mia Member/);
    expect(mail?.links).toEqual([expect.stringMatching(/^http:\/\/gripline\.test\/reset-password\/[A-Za-z0-9_-]{43}$/)]);
  });

  test('sends no mail to a deactivated account, with the same 202', async ({ t, requestReset, mailCount }) => {
    const lead = await t.signIn('lead@example.org');
    const people = (await lead.agent.get('/api/users')).body.data as { id: number; email: string }[];
    const member = people.find((p) => p.email === 'member@example.org')!;
    await lead.agent.patch(`/api/users/${member.id}`).set('X-CSRF-Token', lead.csrf).send({ active: false }).expect(200);
    const res = await requestReset('member@example.org');
    expect(res.status).toBe(202);
    expect(res.body).toEqual((await requestReset('nobody@example.org')).body);
    expect(mailCount()).toBe(0);
  });

  test('writes at most 3 reset mails per address an hour: 30 requests answer alike and queue 3', async ({ t, requestReset, confirm, mailCount }) => {
    const answers = [];
    for (let i = 0; i < 30; i++) answers.push(await requestReset('member@example.org'));
    expect(new Set(answers.map((r) => `${r.status} ${JSON.stringify(r.body)}`)).size).toBe(1);
    expect(answers[0]!.status).toBe(202);
    expect(RESETS_PER_HOUR).toBe(3);
    expect(mailCount()).toBe(3);
    // The newest link sent is the one that works; later requests did not replace it.
    const link = (await t.lastMailTo('member@example.org'))!.links[0]!;
    expect((await confirm(tokenFromLink(link))).status).toBe(200);

    t.clock.now = new Date(t.clock.now.getTime() + HOUR_MS + 1000);
    expect((await requestReset('member@example.org')).status).toBe(202);
    expect(mailCount()).toBe(4);
  });

  test('counts each address on its own', async ({ requestReset, mailCount }) => {
    for (let i = 0; i < 5; i++) await requestReset('member@example.org');
    await requestReset('qm@example.org');
    expect(mailCount()).toBe(4);
  });

  test('takes as long for an address without an account as for one with it', async ({ t, mailCount }) => {
    const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
    const { agent, csrf } = await t.anonymous();
    const timed = async (email: string) => {
      const started = performance.now();
      await agent.post('/api/auth/password-reset').set('X-CSRF-Token', csrf).send({ email }).expect(202);
      return performance.now() - started;
    };
    // Spread over several accounts so the hourly cap never turns a known address into a cheap one.
    const known: string[] = [];
    for (let i = 0; i < 9; i++) known.push((await t.addUser({ email: `builder${i}@example.org` })).email);
    const knownTimes: number[] = [];
    const unknownTimes: number[] = [];
    for (let i = 0; i < 27; i++) {
      knownTimes.push(await timed(known[i % known.length]!));
      unknownTimes.push(await timed(`nobody${i}@example.org`));
    }
    expect(mailCount()).toBe(27);
    // Before the outbox the known address took ≈ 34 times as long; the bounds leave room for a busy
    // machine (requests of a few ms each) while any real difference in work shows far outside them.
    const ratio = median(knownTimes) / median(unknownTimes);
    expect(ratio).toBeGreaterThan(1 / 3);
    expect(ratio).toBeLessThan(3);
  });

  test('answers 400 VALIDATION_FAILED for an address that is not one', async ({ requestReset, mailCount }) => {
    const res = await requestReset('not an address');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toEqual(['email']);
    expect(mailCount()).toBe(0);
  });
});

describe('POST /api/auth/password-reset/confirm', () => {
  test('answers 200 and changes the password: the old one fails with 401, the new one works', async ({ resetToken, confirm, login }) => {
    const token = await resetToken('member@example.org');
    const res = await confirm(token);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body).toEqual({ ok: true, message: expect.any(String) });
    const old = await login('member@example.org', PASSWORD);
    expect(old.status).toBe(401);
    expect(old.body.error.code).toBe('BAD_CREDENTIALS');
    const fresh = await login('member@example.org', NEW_PASSWORD);
    expect(fresh.status).toBe(200);
    expect(fresh.body.user.email).toBe('member@example.org');
  });

  test('leaves the person signed out: confirming does not start a session', async ({ t, resetToken }) => {
    const token = await resetToken('member@example.org');
    const { agent, csrf } = await t.anonymous();
    await agent.post('/api/auth/password-reset/confirm').set('X-CSRF-Token', csrf).send({ token, password: NEW_PASSWORD }).expect(200);
    expect((await agent.get('/api/auth/me')).body.user).toBeNull();
  });

  test('works once: a second confirm answers 410 LINK_USED and the first password stands', async ({ resetToken, confirm, login }) => {
    const token = await resetToken('member@example.org');
    expect((await confirm(token)).status).toBe(200);
    const again = await confirm(token, 'a different long password');
    expect(again.status).toBe(410);
    expect(again.headers['content-type']).toMatch(/json/);
    expect(again.body.error.code).toBe('LINK_USED');
    expect((await login('member@example.org', 'a different long password')).status).toBe(401);
    expect((await login('member@example.org', NEW_PASSWORD)).status).toBe(200);
  });

  test('still works just before an hour has passed', async ({ t, resetToken, confirm }) => {
    const token = await resetToken('member@example.org');
    t.clock.now = new Date(t.clock.now.getTime() + HOUR_MS - 60_000);
    expect((await confirm(token)).status).toBe(200);
  });

  test('answers 410 LINK_EXPIRED after an hour and keeps the old password', async ({ t, resetToken, confirm, login }) => {
    const token = await resetToken('member@example.org');
    t.clock.now = new Date(t.clock.now.getTime() + HOUR_MS + 60_000);
    const res = await confirm(token);
    expect(res.status).toBe(410);
    expect(res.body.error.code).toBe('LINK_EXPIRED');
    expect((await login('member@example.org', PASSWORD)).status).toBe(200);
  });

  test('answers 410 LINK_REVOKED for an older link once a newer one was sent', async ({ resetToken, confirm }) => {
    const first = await resetToken('member@example.org');
    const second = await resetToken('member@example.org');
    expect(second).not.toBe(first);
    const old = await confirm(first);
    expect(old.status).toBe(410);
    expect(old.body.error.code).toBe('LINK_REVOKED');
    expect((await confirm(second)).status).toBe(200);
  });

  test('ends the person’s other sessions, but not other people’s', async ({ t, resetToken, confirm }) => {
    const memberBefore = await t.signIn('member@example.org');
    const lead = await t.signIn('lead@example.org');
    expect((await memberBefore.agent.get('/api/auth/me')).status).toBe(200);
    const token = await resetToken('member@example.org');
    expect((await confirm(token)).status).toBe(200);
    expect((await memberBefore.agent.get('/api/auth/me')).body.user).toBeNull();
    const tools = await memberBefore.agent.get('/api/tools');
    expect(tools.status).toBe(401);
    expect(tools.body.error.code).toBe('NOT_SIGNED_IN');
    expect((await lead.agent.get('/api/auth/me')).status).toBe(200);
  });

  test('does not accept an invitation token as a reset token', async ({ t, confirm }) => {
    const lead = await t.signIn('lead@example.org');
    await lead.agent.post('/api/invitations').set('X-CSRF-Token', lead.csrf).send({ email: 'new@example.org', role: 'member' }).expect(201);
    const inviteToken = tokenFromLink((await t.lastMailTo('new@example.org'))!.links[0]!);
    const res = await confirm(inviteToken);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('LINK_NOT_FOUND');
  });

  test('answers 404 LINK_NOT_FOUND for a well-formed token nobody was sent', async ({ confirm }) => {
    const res = await confirm('Z'.repeat(43));
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('LINK_NOT_FOUND');
  });

  test('answers 400 VALIDATION_FAILED naming the password when it is too short, and changes nothing', async ({ resetToken, confirm }) => {
    const token = await resetToken('member@example.org');
    const res = await confirm(token, 'short');
    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.message).toMatch(/password/);
    expect(res.body.error.issues).toEqual([{ path: 'password', message: expect.stringMatching(/at least 10/) }]);
    // The link is still good for a valid password.
    expect((await confirm(token)).status).toBe(200);
  });

  test('answers 400 VALIDATION_FAILED naming the token when it has the wrong shape', async ({ confirm }) => {
    const res = await confirm('not-a-token');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toEqual(['token']);
  });
});
