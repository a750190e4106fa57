import { eq } from 'drizzle-orm';
import { describe, expect } from 'vitest';
import { mailListSchema, mailMessageSchema } from '@shared/schemas/mail';
import { hashLinkToken } from '../../server/accounts/link-tokens';
import { accountTokens } from '../../server/db/schema/account-tokens';
import { caughtMail, outboxMail } from '../../server/db/schema/mail';
import { OUTBOX_MAX_ATTEMPTS } from '../../server/mail/outbox';
import { post } from '../helpers/crib';
import { crewTest } from '../helpers/crew-test';
import { buildTestApp, tokenFromLink } from '../helpers/test-app';

const deadMailer = { send: () => Promise.reject(new Error('421 mail server busy')), close: () => undefined };

const test = crewTest
  .extend('requestReset', ({ t }) => async (email: string) => {
    const { agent, csrf } = await t.anonymous();
    await agent.post('/api/auth/password-reset').set('X-CSRF-Token', csrf).send({ email }).expect(202);
  })
  /** Fails every attempt of the waiting mail until it is marked failed. */
  .extend('failForGood', ({ t }) => async () => {
    for (let i = 0; i < OUTBOX_MAX_ATTEMPTS; i++) {
      await t.deliverMail(deadMailer);
      t.clock.now = new Date(t.clock.now.getTime() + 2 * 60 * 60_000);
    }
  });

describe('GET /api/mail', () => {
  test('answers an empty list and catching: true before any mail was written', async ({ lead }) => {
    const res = await lead.agent.get('/api/mail');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body).toEqual({ data: [], catching: true });
  });

  test('lists an invitation as waiting at once, with its working link, and as sent once delivered', async ({ t, lead }) => {
    await post(lead, '/api/invitations', { email: 'newcomer@example.org', role: 'member' }).expect(201);
    const waiting = mailListSchema.parse((await lead.agent.get('/api/mail')).body).data;
    expect(waiting).toEqual([
      {
        id: expect.any(Number),
        to: 'newcomer@example.org',
        subject: expect.stringMatching(/Lee Lead invited you/),
        text: expect.stringContaining(waiting[0]!.links[0]!),
        links: [expect.stringMatching(/^http:\/\/gripline\.test\/invite\/[A-Za-z0-9_-]{43}$/)],
        state: 'waiting',
        attempts: 0,
        lastError: null,
        nextAttemptAt: t.clock.now.toISOString(),
        createdAt: t.clock.now.toISOString(),
        sentAt: null,
      },
    ]);
    // The lead may hand the invitation link on: it is listed whole and works.
    const preview = await (await t.anonymous()).agent.get(`/api/invitations/by-token/${tokenFromLink(waiting[0]!.links[0]!)}`);
    expect(preview.status).toBe(200);

    await t.deliverMail();
    const [sent] = (await lead.agent.get('/api/mail')).body.data;
    expect(sent).toMatchObject({ state: 'sent', attempts: 0, nextAttemptAt: null, sentAt: t.clock.now.toISOString() });
  });

  test('lists the newest message first', async ({ t, lead, requestReset }) => {
    await post(lead, '/api/invitations', { email: 'first@example.org', role: 'member' }).expect(201);
    t.clock.now = new Date(t.clock.now.getTime() + 1000);
    await requestReset('member@example.org');
    const res = await lead.agent.get('/api/mail');
    expect(res.body.data.map((m: { to: string }) => m.to)).toEqual(['member@example.org', 'first@example.org']);
  });

  test('shows a message the mail server refused as waiting, with its attempts, last error and next try', async ({ t, lead, requestReset }) => {
    await requestReset('member@example.org');
    expect(await t.deliverMail(deadMailer)).toEqual({ sent: 0, retrying: 1, failed: 0 });
    const [m] = (await lead.agent.get('/api/mail')).body.data;
    expect(m).toMatchObject({ state: 'waiting', attempts: 1, lastError: '421 mail server busy', nextAttemptAt: new Date(t.clock.now.getTime() + 60_000).toISOString() });
  });

  test('says catching: false when a real mail server is configured', async () => {
    const t = await buildTestApp({ catchingMail: false });
    try {
      await t.addUser({ email: 'lead@example.org', role: 'lead' });
      const res = await (await t.signIn('lead@example.org')).agent.get('/api/mail');
      expect(res.status).toBe(200);
      expect(res.body.catching).toBe(false);
    } finally {
      await t.close();
    }
  });

  test('answers 403 FORBIDDEN for a member and a quartermaster', async ({ t, crew }) => {
    for (const email of [crew.member.email, crew.quartermaster.email]) {
      const res = await (await t.signIn(email)).agent.get('/api/mail');
      expect(res.status).toBe(403);
      expect(res.headers['content-type']).toMatch(/json/);
      expect(res.body).toEqual({ error: { code: 'FORBIDDEN', message: expect.any(String) } });
    }
  });

  test('answers 401 NOT_SIGNED_IN when signed out', async ({ t }) => {
    const res = await (await t.anonymous()).agent.get('/api/mail');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('NOT_SIGNED_IN');
  });
});

describe('reset links on Sent mail', () => {
  test('keeps the message but masks the link in someone else’s reset mail: the lead finds no usable link', async ({ t, lead, requestReset }) => {
    await requestReset('member@example.org');
    await t.deliverMail();
    const body = JSON.stringify((await lead.agent.get('/api/mail')).body);
    const [m] = (await lead.agent.get('/api/mail')).body.data;
    expect(m.subject).toMatch(/reset/i);
    expect(m.links).toEqual(['http://gripline.test/reset-password/••••••']);
    expect(m.text).toContain('http://gripline.test/reset-password/••••••');
    // Whatever in the answer looks like a token, none opens the account.
    const candidates = body.match(/[A-Za-z0-9_-]{43}/g) ?? [];
    const hashes = new Set(t.db.select({ h: accountTokens.tokenHash }).from(accountTokens).all().map((r) => r.h));
    expect(candidates.filter((c) => hashes.has(hashLinkToken(c)))).toEqual([]);
    // The member's own copy works.
    const link = (await t.lastMailTo('member@example.org'))!.links[0]!;
    const { agent, csrf } = await t.anonymous();
    const confirmed = await agent.post('/api/auth/password-reset/confirm').set('X-CSRF-Token', csrf).send({ token: tokenFromLink(link), password: 'a brand new password' });
    expect(confirmed.status).toBe(200);
  });

  test('shows the lead their own reset link whole', async ({ lead, requestReset }) => {
    await requestReset('lead@example.org');
    const [m] = (await lead.agent.get('/api/mail')).body.data;
    expect(m.links).toEqual([expect.stringMatching(/^http:\/\/gripline\.test\/reset-password\/[A-Za-z0-9_-]{43}$/)]);
  });

  test('keeps no usable reset token in the database once the mail has gone to a real mail server', async ({ t, crew, requestReset }) => {
    await requestReset(crew.member.email);
    const offered: string[] = [];
    await t.deliverMail({ send: (m) => (offered.push(m.text), Promise.resolve()), close: () => undefined });
    const token = tokenFromLink(offered[0]!.match(/http:\/\/gripline\.test\/reset-password\/\S+/)![0]);
    const tables = t.db.$client.prepare("select name from sqlite_master where type = 'table'").all() as { name: string }[];
    const dump = JSON.stringify(tables.map(({ name }) => t.db.$client.prepare(`select * from "${name}"`).all()));
    expect(dump).not.toContain(token);
    expect(dump).toContain(hashLinkToken(token));
    const { agent, csrf } = await t.anonymous();
    await agent.post('/api/auth/password-reset/confirm').set('X-CSRF-Token', csrf).send({ token, password: 'a brand new password' }).expect(200);
  });
});

describe('GET /api/mail/mine', () => {
  test('shows each person only the mail caught for them, links whole', async ({ t, crew, requestReset }) => {
    await requestReset(crew.member.email);
    await requestReset(crew.quartermaster.email);
    await t.deliverMail();
    const member = await t.signIn('member@example.org');
    const res = await member.agent.get('/api/mail/mine');
    expect(res.status).toBe(200);
    const { data } = mailListSchema.parse(res.body);
    expect(data.map((m) => m.to)).toEqual(['member@example.org']);
    expect(data[0]!.links).toEqual([expect.stringMatching(/\/reset-password\/[A-Za-z0-9_-]{43}$/)]);
  });

  test('answers 401 NOT_SIGNED_IN when signed out', async ({ t }) => {
    const res = await (await t.anonymous()).agent.get('/api/mail/mine');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('NOT_SIGNED_IN');
  });
});

describe('POST /api/mail/:id/retry', () => {
  test('puts a failed message back to waiting with a fresh round of attempts; the next run sends it', async ({ t, lead, requestReset, failForGood }) => {
    await requestReset('member@example.org');
    await failForGood();
    const [failed] = (await lead.agent.get('/api/mail')).body.data;
    expect(failed).toMatchObject({ state: 'failed', attempts: OUTBOX_MAX_ATTEMPTS, lastError: '421 mail server busy', nextAttemptAt: null });

    const res = await post(lead, `/api/mail/${failed.id}/retry`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(mailMessageSchema.parse(res.body)).toMatchObject({ id: failed.id, state: 'waiting', attempts: 0, nextAttemptAt: t.clock.now.toISOString() });
    expect(await t.deliverMail()).toEqual({ sent: 1, retrying: 0, failed: 0 });
    expect(t.db.select().from(caughtMail).all()).toHaveLength(1);
  });

  test('answers 409 MAIL_NOT_FAILED for a waiting or sent message', async ({ t, lead, requestReset }) => {
    await requestReset('member@example.org');
    const [m] = (await lead.agent.get('/api/mail')).body.data;
    const waiting = await post(lead, `/api/mail/${m.id}/retry`);
    expect(waiting.status).toBe(409);
    expect(waiting.body.error).toEqual({ code: 'MAIL_NOT_FAILED', message: expect.stringMatching(/still waiting/) });
    await t.deliverMail();
    expect((await post(lead, `/api/mail/${m.id}/retry`)).body.error.code).toBe('MAIL_NOT_FAILED');
  });

  test('answers 404 MAIL_NOT_FOUND for an unknown id and 400 for one that is not a number', async ({ lead }) => {
    expect((await post(lead, '/api/mail/999/retry')).body.error.code).toBe('MAIL_NOT_FOUND');
    const bad = await post(lead, '/api/mail/abc/retry');
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('VALIDATION_FAILED');
  });

  test('answers 403 FORBIDDEN for a member, and the message stays failed', async ({ t, lead, requestReset, failForGood }) => {
    await requestReset('member@example.org');
    await failForGood();
    const [failed] = (await lead.agent.get('/api/mail')).body.data;
    const member = await t.signIn('member@example.org');
    expect((await post(member, `/api/mail/${failed.id}/retry`)).status).toBe(403);
    expect(t.db.select().from(outboxMail).where(eq(outboxMail.id, failed.id)).get()!.state).toBe('failed');
  });
});
