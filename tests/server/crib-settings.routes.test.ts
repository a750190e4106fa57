import { describe, expect } from 'vitest';
import { cribSettingsSchema } from '@shared/schemas/signoffs';
import { crewTest } from '../helpers/crew-test';
import { PASSWORD, type SignedInAgent } from '../helpers/test-app';
import { serverTimeZone } from '@shared/time/chapter-time';
import { post } from '../helpers/crib';

const HOUR_MS = 60 * 60 * 1000;

const patch = (who: SignedInAgent, body: unknown) => who.agent.patch('/api/settings/crib').set('X-CSRF-Token', who.csrf).send(body as object);

describe('GET /api/settings/crib', () => {
  crewTest('gives everyone signed in the hold time, 48 hours until the lead changes it', async ({ member }) => {
    const res = await member.agent.get('/api/settings/crib');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(cribSettingsSchema.parse(res.body)).toEqual({ holdHours: 48, timeZone: serverTimeZone() });
  });

  crewTest('answers 401 when signed out', async ({ t }) => {
    const res = await (await t.anonymous()).agent.get('/api/settings/crib');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('NOT_SIGNED_IN');
  });
});

describe('PATCH /api/settings/crib', () => {
  crewTest('lets the lead change the hold time, which everyone then reads', async ({ lead, qm }) => {
    const res = await patch(lead, { holdHours: 24 });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ holdHours: 24, timeZone: serverTimeZone() });
    expect((await qm.agent.get('/api/settings/crib')).body).toEqual({ holdHours: 24, timeZone: serverTimeZone() });
  });

  crewTest('accepts 1 and 336 hours and refuses 0, 337, a fraction, text or null with 400', async ({ lead, member }) => {
    expect((await patch(lead, { holdHours: 1 })).status).toBe(200);
    expect((await patch(lead, { holdHours: 336 })).status).toBe(200);
    for (const body of [{ holdHours: 0 }, { holdHours: 337 }, { holdHours: 2.5 }, { holdHours: 'two days' }, { holdHours: null }]) {
      const res = await patch(lead, body);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('VALIDATION_FAILED');
      expect(res.body.error.issues[0].path).toBe('holdHours');
    }
    expect((await patch(lead, { holdHours: 12, loanDays: 3 })).status).toBe(400);
    expect((await member.agent.get('/api/settings/crib')).body.holdHours).toBe(336);
    const empty = await patch(lead, {});
    expect(empty.status).toBe(400);
    expect(empty.body.error.code).toBe('VALIDATION_FAILED');
    expect(empty.body.error.message).toMatch(/hold time or the time zone/);
  });

  crewTest('answers 403 to a member and a quartermaster, 401 when signed out', async ({ t, qm, member }) => {
    for (const who of [member, qm]) {
      const res = await patch(who, { holdHours: 2 });
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('FORBIDDEN');
    }
    const anon = await patch(await t.anonymous(), { holdHours: 2 });
    expect(anon.status).toBe(401);
    expect((await member.agent.get('/api/settings/crib')).body).toEqual({ holdHours: 48, timeZone: serverTimeZone() });
  });

  crewTest('uses the new hold time for the next hold offer', async ({ t, lead, qm, member }) => {
    await post(qm, '/api/tools', { name: 'Torque wrench', category: 'torque_wrench' }).expect(201);
    await post(member, '/api/tools/T-0001/checkout').expect(201);
    await post(qm, '/api/tools/T-0001/holds').expect(201);
    await patch(lead, { holdHours: 6 }).expect(200);

    t.clock.now = new Date('2026-12-03T08:15:00Z');
    const back = await post(member, '/api/tools/T-0001/return', { condition: 'ok' });
    expect(back.body).toMatchObject({ status: 'held', offeredTo: { name: 'Quinn Quartermaster' } });
    const tool = await qm.agent.get('/api/tools/T-0001');
    expect(tool.body.holds.offerExpiresAt).toBe(new Date(t.clock.now.getTime() + 6 * HOUR_MS).toISOString());
    expect(tool.body.forYou.yourHold).toMatchObject({ status: 'offered', offerExpiresAt: '2026-12-03T14:15:00.000Z' });
  });
});

describe('PATCH /api/settings/crib with a time zone', () => {
  crewTest('lets the lead set the chapter time zone, which everyone then reads and the hold time keeps', async ({ lead, member }) => {
    await patch(lead, { holdHours: 12 }).expect(200);
    const res = await patch(lead, { timeZone: 'America/Denver' });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ holdHours: 12, timeZone: 'America/Denver' });
    expect((await member.agent.get('/api/settings/crib')).body).toEqual({ holdHours: 12, timeZone: 'America/Denver' });
  });

  crewTest('refuses a zone the server does not know, an empty one or a number with 400 naming timeZone, and keeps the old one', async ({ lead, member }) => {
    await patch(lead, { timeZone: 'Europe/Oslo' }).expect(200);
    for (const timeZone of ['Mars/Olympus_Mons', '', 'GMT+25', 3]) {
      const res = await patch(lead, { timeZone });
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('VALIDATION_FAILED');
      expect(res.body.error.issues[0].path).toBe('timeZone');
      expect(res.body.error.issues[0].message).toMatch(/time zone/i);
    }
    expect((await member.agent.get('/api/settings/crib')).body.timeZone).toBe('Europe/Oslo');
  });

  crewTest('answers 403 to a member who tries to change the zone', async ({ member }) => {
    const res = await patch(member, { timeZone: 'Asia/Tokyo' });
    expect(res.status).toBe(403);
    expect((await member.agent.get('/api/settings/crib')).body.timeZone).toBe(serverTimeZone());
  });

  crewTest('tells the signed-in person the chapter zone with who they are, at sign-in and after', async ({ t, lead, member }) => {
    await patch(lead, { timeZone: 'Pacific/Auckland' }).expect(200);
    const me = await member.agent.get('/api/auth/me');
    expect(me.body.timeZone).toBe('Pacific/Auckland');
    const anon = await t.anonymous();
    const login = await anon.agent.post('/api/auth/login').set('X-CSRF-Token', anon.csrf).send({ email: 'qm@example.org', password: PASSWORD });
    expect(login.status).toBe(200);
    expect(login.body.timeZone).toBe('Pacific/Auckland');
    const fresh = await t.signIn('qm@example.org');
    expect((await fresh.agent.get('/api/auth/me')).body).toMatchObject({ user: { email: 'qm@example.org' }, timeZone: 'Pacific/Auckland' });
  });
});
