import { describe, expect } from 'vitest';
import { findWorkingBadge } from '../../server/accounts/badges.repo';
import { hashLinkToken } from '../../server/accounts/link-tokens';
import { findUserById } from '../../server/accounts/users.repo';
import { crewTest } from '../helpers/crew-test';
import type { SignedInAgent } from '../helpers/test-app';

const test = crewTest
  .extend('issueBadge', () => (as: SignedInAgent, id: number | string) => as.agent.post(`/api/users/${id}/badge`).set('X-CSRF-Token', as.csrf).send({}))
  .extend('setPin', () => (as: SignedInAgent, body: unknown) => as.agent.put('/api/me/pin').set('X-CSRF-Token', as.csrf).send(body as object))
  .extend('clearPin', () => (as: SignedInAgent, id: number | string) => as.agent.delete(`/api/users/${id}/pin`).set('X-CSRF-Token', as.csrf));

describe('POST /api/users/:id/badge', () => {
  test('a quartermaster issues a badge: 201 with an opaque token the badge table knows', async ({ t, crew, qm, issueBadge }) => {
    const res = await issueBadge(qm, crew.member.id);
    expect(res.status).toBe(201);
    expect(res.body).toEqual({ badge: expect.any(String) });
    const token = res.body.badge as string;
    expect(token).not.toContain(crew.member.email);
    expect(token).not.toBe(String(crew.member.id));
    expect(findWorkingBadge(t.db, hashLinkToken(token))?.user.id).toBe(crew.member.id);
    // Only the hash is stored.
    expect(JSON.stringify(t.db.$client.prepare('select * from badges').all())).not.toContain(token);
  });

  test('a new badge makes the old one stop working', async ({ t, crew, lead, issueBadge }) => {
    const first = (await issueBadge(lead, crew.member.id)).body.badge as string;
    const second = (await issueBadge(lead, crew.member.id)).body.badge as string;
    expect(second).not.toBe(first);
    expect(findWorkingBadge(t.db, hashLinkToken(first))).toBeUndefined();
    expect(findWorkingBadge(t.db, hashLinkToken(second))?.user.id).toBe(crew.member.id);
  });

  test('a member may not issue badges: 403', async ({ crew, member, issueBadge }) => {
    const res = await issueBadge(member, crew.member.id);
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('FORBIDDEN');
  });

  test('an unknown person is 404 and a deactivated one 409, in words', async ({ t, crew, lead, qm, issueBadge }) => {
    const unknown = await issueBadge(qm, 9999);
    expect(unknown.status).toBe(404);
    expect(unknown.body.error).toMatchObject({ code: 'PERSON_NOT_FOUND', message: expect.stringMatching(/9999/) });
    await lead.agent.patch(`/api/users/${crew.member.id}`).set('X-CSRF-Token', lead.csrf).send({ active: false });
    const gone = await issueBadge(qm, crew.member.id);
    expect(gone.status).toBe(409);
    expect(gone.body.error).toMatchObject({ code: 'PERSON_DEACTIVATED', message: expect.stringMatching(/Mia Member/) });
    expect(t.db.$client.prepare('select count(*) as n from badges').get()).toEqual({ n: 0 });
  });

  test('a bad id is a 400', async ({ qm, issueBadge }) => {
    expect((await issueBadge(qm, 'abc')).status).toBe(400);
  });
});

describe('PUT /api/me/pin and DELETE /api/users/:id/pin', () => {
  test('anyone signed in sets their own PIN: 204, stored as a hash', async ({ t, crew, member, setPin }) => {
    const res = await setPin(member, { pin: '4821' });
    expect(res.status).toBe(204);
    const row = findUserById(t.db, crew.member.id)!;
    expect(row.pinHash).toMatch(/^\$argon2id\$/);
    expect(row.pinHash).not.toContain('4821');
  });

  test('a PIN that is not 4 to 8 digits is a 400 that says so', async ({ member, setPin }) => {
    for (const pin of ['123', '123456789', '12a4', '']) {
      const res = await setPin(member, { pin });
      expect(res.status).toBe(400);
      expect(JSON.stringify(res.body)).toMatch(/4 to 8 digits/);
    }
    expect((await setPin(member, {})).status).toBe(400);
  });

  test('signed out is 401', async ({ t, setPin }) => {
    const anon = await t.anonymous();
    expect((await setPin(anon, { pin: '1234' })).status).toBe(401);
  });

  test('a PIN alone never signs anyone in: the PIN as the password is refused', async ({ t, crew, member, setPin }) => {
    await setPin(member, { pin: '482193' });
    const { agent, csrf } = await t.anonymous();
    const res = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: crew.member.email, password: '482193' });
    expect(res.status).toBe(401);
  });

  test('a lead clears a PIN: 204; others may not', async ({ t, crew, member, qm, lead, setPin, clearPin }) => {
    await setPin(member, { pin: '4821' });
    expect((await clearPin(qm, crew.member.id)).status).toBe(403);
    expect((await clearPin(member, crew.member.id)).status).toBe(403);
    expect(findUserById(t.db, crew.member.id)!.pinHash).not.toBeNull();
    expect((await clearPin(lead, crew.member.id)).status).toBe(204);
    expect(findUserById(t.db, crew.member.id)!.pinHash).toBeNull();
    expect((await clearPin(lead, 9999)).status).toBe(404);
  });
});

describe('the person list says who has a badge and a PIN', () => {
  test('hasBadge and hasPin, never the hash or token', async ({ crew, lead, member, issueBadge, setPin }) => {
    const before = (await lead.agent.get('/api/users')).body.data as { id: number; hasBadge: boolean; hasPin: boolean }[];
    expect(before.find((p) => p.id === crew.member.id)).toMatchObject({ hasBadge: false, hasPin: false });
    const token = (await issueBadge(lead, crew.member.id)).body.badge as string;
    await setPin(member, { pin: '4821' });
    const res = await lead.agent.get('/api/users');
    const after = res.body.data as { id: number; hasBadge: boolean; hasPin: boolean }[];
    expect(after.find((p) => p.id === crew.member.id)).toMatchObject({ hasBadge: true, hasPin: true });
    expect(after.find((p) => p.id === crew.lead.id)).toMatchObject({ hasBadge: false, hasPin: false });
    expect(JSON.stringify(res.body)).not.toContain(token);
    expect(JSON.stringify(res.body)).not.toMatch(/argon2|pinHash|tokenHash/);
  });
});
