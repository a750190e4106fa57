import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { buildTestApp, tokenFromLink, type SignedInAgent, type TestApp } from '../helpers/test-app';

let t: TestApp;
let lead: SignedInAgent;
beforeEach(async () => {
  t = await buildTestApp();
  await t.addCrew();
  lead = await t.signIn('lead@example.org');
});
afterEach(() => t.close());

describe('GET /api/mail', () => {
  it('answers an empty list and catching: true before any mail was sent', async () => {
    const res = await lead.agent.get('/api/mail');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body).toEqual({ data: [], catching: true });
  });

  it('lists a sent invitation with its recipient, subject and link', async () => {
    await lead.agent.post('/api/invitations').set('X-CSRF-Token', lead.csrf).send({ email: 'newcomer@example.org', role: 'member' }).expect(201);
    const res = await lead.agent.get('/api/mail');
    expect(res.status).toBe(200);
    expect(res.body.catching).toBe(true);
    expect(res.body.data).toHaveLength(1);
    const [mail] = res.body.data;
    expect(mail).toEqual({
      id: expect.any(Number),
      from: 'test@example.org',
      to: ['newcomer@example.org'],
      subject: expect.stringMatching(/Lee Lead invited you/),
      text: expect.stringContaining(mail.links[0]),
      links: [expect.stringMatching(/^http:\/\/gripline\.test\/invite\/[A-Za-z0-9_-]{43}$/)],
      receivedAt: expect.any(String),
    });
    expect(Number.isNaN(Date.parse(mail.receivedAt))).toBe(false);
    // The listed link is the working one.
    const preview = await (await t.anonymous()).agent.get(`/api/invitations/by-token/${tokenFromLink(mail.links[0])}`);
    expect(preview.status).toBe(200);
    expect(preview.body.email).toBe('newcomer@example.org');
  });

  it('lists the newest message first', async () => {
    await lead.agent.post('/api/invitations').set('X-CSRF-Token', lead.csrf).send({ email: 'first@example.org', role: 'member' }).expect(201);
    const { agent, csrf } = await t.anonymous();
    await agent.post('/api/auth/password-reset').set('X-CSRF-Token', csrf).send({ email: 'member@example.org' }).expect(202);
    const res = await lead.agent.get('/api/mail');
    expect(res.body.data.map((m: { to: string[] }) => m.to[0])).toEqual(['member@example.org', 'first@example.org']);
  });

  it('says catching: false when a real mail server is configured', async () => {
    await t.close();
    t = await buildTestApp({ catchingMail: false });
    await t.addUser({ email: 'lead@example.org', role: 'lead' });
    const res = await (await t.signIn('lead@example.org')).agent.get('/api/mail');
    expect(res.status).toBe(200);
    expect(res.body.catching).toBe(false);
  });

  it('answers 403 FORBIDDEN for a member and a quartermaster', async () => {
    await lead.agent.post('/api/invitations').set('X-CSRF-Token', lead.csrf).send({ email: 'newcomer@example.org', role: 'member' }).expect(201);
    for (const email of ['member@example.org', 'qm@example.org']) {
      const res = await (await t.signIn(email)).agent.get('/api/mail');
      expect(res.status).toBe(403);
      expect(res.headers['content-type']).toMatch(/json/);
      expect(res.body).toEqual({ error: { code: 'FORBIDDEN', message: expect.any(String) } });
    }
  });

  it('answers 401 NOT_SIGNED_IN when signed out', async () => {
    const res = await (await t.anonymous()).agent.get('/api/mail');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('NOT_SIGNED_IN');
  });
});
