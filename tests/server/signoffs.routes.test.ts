import { eq } from 'drizzle-orm';
import { describe, expect } from 'vitest';
import { mySignoffListSchema, signoffGrantSchema, signoffListSchema, signoffSchema } from '@shared/schemas/signoffs';
import { memberSignoffs } from '../../server/db/schema/signoffs';
import { crewTest } from '../helpers/crew-test';
import { del, patch, post } from '../helpers/crib';

const test = crewTest
  .extend('define', ({ lead }) => async (name: string, description?: string): Promise<number> => {
    const res = await post(lead, '/api/signoffs', { name, description });
    if (res.status !== 201) throw new Error(`could not define ${name}: ${res.status} ${JSON.stringify(res.body)}`);
    return (res.body as { id: number }).id;
  })
  .extend('list', ({ member }) => async () => {
    return signoffListSchema.parse((await member.agent.get('/api/signoffs').expect(200)).body).data;
  });

describe('POST /api/signoffs', () => {
  test('defines a sign-off that everyone signed in can read, with no holders and no tools yet', async ({ lead, list }) => {
    const res = await post(lead, '/api/signoffs', { name: '  Air tools ', description: 'Air drill, rivet gun, die grinder' });
    expect(res.status).toBe(201);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(signoffSchema.parse(res.body)).toMatchObject({ name: 'Air tools', description: 'Air drill, rivet gun, die grinder', toolCount: 0, holders: [] });
    expect(await list()).toEqual([res.body]);
  });

  test('answers 409 SIGNOFF_NAME_TAKEN for a name already used, whatever its case', async ({ lead, define }) => {
    await define('Air tools');
    const res = await post(lead, '/api/signoffs', { name: 'AIR TOOLS' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('SIGNOFF_NAME_TAKEN');
    expect(res.body.error.message).toMatch(/"AIR TOOLS" already exists/);
  });

  test('answers 400 VALIDATION_FAILED for a missing name or an unknown field', async ({ lead }) => {
    const empty = await post(lead, '/api/signoffs', { name: '   ' });
    expect(empty.status).toBe(400);
    expect(empty.body.error.code).toBe('VALIDATION_FAILED');
    expect(empty.body.error.issues).toEqual([{ path: 'name', message: 'Enter a name for the sign-off.' }]);
    const extra = await post(lead, '/api/signoffs', { name: 'Compressor', level: 3 });
    expect(extra.status).toBe(400);
    expect(extra.body.error.code).toBe('VALIDATION_FAILED');
  });

  test('answers 403 to a member and a quartermaster, and 401 when signed out', async ({ t, qm, member, list }) => {
    for (const who of [member, qm]) {
      const res = await post(who, '/api/signoffs', { name: 'Air tools' });
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('FORBIDDEN');
    }
    const anon = await t.anonymous();
    const res = await post(anon, '/api/signoffs', { name: 'Air tools' });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('NOT_SIGNED_IN');
    expect((await anon.agent.get('/api/signoffs')).status).toBe(401);
    expect((await anon.agent.get('/api/signoffs/mine')).status).toBe(401);
    expect(await list()).toEqual([]);
  });
});

describe('PATCH /api/signoffs/:id', () => {
  test('renames and describes a sign-off', async ({ lead, define }) => {
    const id = await define('Air tools');
    const res = await patch(lead, `/api/signoffs/${id}`, { name: 'Pneumatic tools', description: 'Anything on the air line' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id, name: 'Pneumatic tools', description: 'Anything on the air line' });
  });

  test('refuses a name another sign-off has, an empty change, an unknown id, and anyone but a lead', async ({ lead, qm, define }) => {
    const id = await define('Air tools');
    await define('Drill press');
    const taken = await patch(lead, `/api/signoffs/${id}`, { name: 'drill press' });
    expect(taken.status).toBe(409);
    expect(taken.body.error.code).toBe('SIGNOFF_NAME_TAKEN');
    expect((await patch(lead, `/api/signoffs/${id}`, { name: 'air TOOLS' })).status).toBe(200);
    const empty = await patch(lead, `/api/signoffs/${id}`, {});
    expect(empty.status).toBe(400);
    expect(empty.body.error.message).toMatch(/Send a new name, a new description, or both/);
    const unknown = await patch(lead, '/api/signoffs/999', { name: 'Grinder' });
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.code).toBe('SIGNOFF_NOT_FOUND');
    const badId = await patch(lead, '/api/signoffs/abc', { name: 'Grinder' });
    expect(badId.status).toBe(400);
    expect(badId.body.error.code).toBe('VALIDATION_FAILED');
    expect((await patch(qm, `/api/signoffs/${id}`, { name: 'Grinder' })).status).toBe(403);
  });
});

describe('POST /api/signoffs/:id/holders and DELETE /api/signoffs/:id/holders/:userId', () => {
  test('signs a member off dated now by the lead, shows them as a holder and in their own list', async ({ t, crew, lead, qm, member, define, list }) => {
    const id = await define('Air tools');
    const res = await post(lead, `/api/signoffs/${id}/holders`, { userId: crew.member.id });
    expect(res.status).toBe(201);
    expect(signoffGrantSchema.parse(res.body)).toMatchObject({
      signoff: { id, name: 'Air tools' },
      holder: { id: crew.member.id, name: 'Mia Member' },
      grantedAt: t.clock.now.toISOString(),
      grantedBy: { id: crew.lead.id, name: 'Lee Lead' },
    });
    expect((await list())[0]!.holders).toEqual([
      { userId: crew.member.id, name: 'Mia Member', active: true, grantedAt: t.clock.now.toISOString(), grantedBy: { id: crew.lead.id, name: 'Lee Lead' } },
    ]);
    const mine = mySignoffListSchema.parse((await member.agent.get('/api/signoffs/mine')).body).data;
    expect(mine.map((s) => s.name)).toEqual(['Air tools']);
    expect(mySignoffListSchema.parse((await qm.agent.get('/api/signoffs/mine')).body).data).toEqual([]);
  });

  test('answers 409 ALREADY_SIGNED_OFF when the person already holds it', async ({ crew, lead, define }) => {
    const id = await define('Air tools');
    await post(lead, `/api/signoffs/${id}/holders`, { userId: crew.member.id }).expect(201);
    const again = await post(lead, `/api/signoffs/${id}/holders`, { userId: crew.member.id });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('ALREADY_SIGNED_OFF');
    expect(again.body.error.message).toMatch(/Mia Member already holds the "Air tools" sign-off/);
  });

  test('refuses an unknown person (404), a deactivated person (409), an unknown sign-off (404) and a bad body (400)', async ({ crew, lead, define }) => {
    const id = await define('Air tools');
    const nobody = await post(lead, `/api/signoffs/${id}/holders`, { userId: 999 });
    expect(nobody.status).toBe(404);
    expect(nobody.body.error.code).toBe('PERSON_NOT_FOUND');
    await patch(lead, `/api/users/${crew.quartermaster.id}`, { active: false }).expect(200);
    const gone = await post(lead, `/api/signoffs/${id}/holders`, { userId: crew.quartermaster.id });
    expect(gone.status).toBe(409);
    expect(gone.body.error.code).toBe('PERSON_DEACTIVATED');
    expect(gone.body.error.message).toMatch(/Quinn Quartermaster is deactivated/);
    const noSignoff = await post(lead, '/api/signoffs/999/holders', { userId: crew.member.id });
    expect(noSignoff.status).toBe(404);
    expect(noSignoff.body.error.code).toBe('SIGNOFF_NOT_FOUND');
    for (const body of [{}, { userId: 'Mia' }, { userId: 0 }, { userId: 1.5 }]) {
      const bad = await post(lead, `/api/signoffs/${id}/holders`, body);
      expect(bad.status).toBe(400);
      expect(bad.body.error.code).toBe('VALIDATION_FAILED');
      expect(bad.body.error.issues[0].message).toBe('Choose the person to sign off.');
    }
  });

  test('revokes with 204, keeps the grant on record with who revoked it and when, and allows a new grant later', async ({ t, crew, lead, member, define, list }) => {
    const id = await define('Air tools');
    await post(lead, `/api/signoffs/${id}/holders`, { userId: crew.member.id }).expect(201);
    t.clock.now = new Date('2026-12-05T09:30:00Z');
    const revoked = await del(lead, `/api/signoffs/${id}/holders/${crew.member.id}`);
    expect(revoked.status).toBe(204);
    expect((await list())[0]!.holders).toEqual([]);
    expect((await member.agent.get('/api/signoffs/mine')).body.data).toEqual([]);
    const again = await del(lead, `/api/signoffs/${id}/holders/${crew.member.id}`);
    expect(again.status).toBe(404);
    expect(again.body.error.code).toBe('NOT_SIGNED_OFF');

    t.clock.now = new Date('2026-12-09T08:00:00Z');
    await post(lead, `/api/signoffs/${id}/holders`, { userId: crew.member.id }).expect(201);
    const history = t.db.select().from(memberSignoffs).where(eq(memberSignoffs.userId, crew.member.id)).all();
    expect(history).toEqual([
      expect.objectContaining({ grantedAt: new Date('2026-12-01T12:00:00Z'), grantedById: crew.lead.id, revokedAt: new Date('2026-12-05T09:30:00Z'), revokedById: crew.lead.id }),
      expect.objectContaining({ grantedAt: new Date('2026-12-09T08:00:00Z'), grantedById: crew.lead.id, revokedAt: null, revokedById: null }),
    ]);
    expect((await list())[0]!.holders.map((h) => h.grantedAt)).toEqual(['2026-12-09T08:00:00.000Z']);
  });

  test('keeps a deactivated holder on the list, marked inactive, and lets the lead revoke them', async ({ crew, lead, define, list }) => {
    const id = await define('Air tools');
    await post(lead, `/api/signoffs/${id}/holders`, { userId: crew.quartermaster.id }).expect(201);
    await patch(lead, `/api/users/${crew.quartermaster.id}`, { active: false }).expect(200);
    expect((await list())[0]!.holders).toEqual([expect.objectContaining({ userId: crew.quartermaster.id, active: false })]);
    expect((await del(lead, `/api/signoffs/${id}/holders/${crew.quartermaster.id}`)).status).toBe(204);
    expect((await list())[0]!.holders).toEqual([]);
  });

  test('grants once when the same grant is sent many times at once', async ({ t, crew, lead, define }) => {
    const id = await define('Air tools');
    const results = await Promise.all(Array.from({ length: 6 }, () => post(lead, `/api/signoffs/${id}/holders`, { userId: crew.member.id })));
    expect(results.filter((r) => r.status === 201)).toHaveLength(1);
    expect(results.filter((r) => r.status === 409 && r.body.error.code === 'ALREADY_SIGNED_OFF')).toHaveLength(5);
    expect(t.db.select().from(memberSignoffs).all()).toHaveLength(1);
  });

  test('answers 403 to a member or quartermaster granting or revoking, and 400 for a malformed id', async ({ crew, lead, qm, member, define }) => {
    const id = await define('Air tools');
    for (const who of [member, qm]) {
      expect((await post(who, `/api/signoffs/${id}/holders`, { userId: crew.member.id })).body.error.code).toBe('FORBIDDEN');
      expect((await del(who, `/api/signoffs/${id}/holders/${crew.member.id}`)).status).toBe(403);
    }
    const bad = await del(lead, `/api/signoffs/${id}/holders/someone`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('VALIDATION_FAILED');
  });

  test('counts the tools in the crib that need the sign-off', async ({ qm, define, list }) => {
    const id = await define('Air tools');
    await post(qm, '/api/tools', { name: 'Air drill', category: 'air_drill', requiredSignoffId: id }).expect(201);
    await post(qm, '/api/tools', { name: 'Rivet gun 3X', category: 'rivet_gun', requiredSignoffId: id }).expect(201);
    await post(qm, '/api/tools', { name: 'Deburring tool', category: 'deburring_tool' }).expect(201);
    expect((await list())[0]!.toolCount).toBe(2);
  });
});

describe('checkout of a tool that needs a sign-off', () => {
  test('refuses a member without it and names the sign-off and the lead, allows it after the grant, refuses again after revoking', async ({ crew, lead, qm, member, define }) => {
    const id = await define('Air tools');
    await post(qm, '/api/tools', { name: 'Air drill', category: 'air_drill', requiredSignoffId: id }).expect(201);

    const refused = await post(member, '/api/tools/T-0001/checkout');
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('SIGNOFF_REQUIRED');
    expect(refused.body.error.message).toBe('T-0001 needs the "Air tools" sign-off, which you do not have yet. Ask Lee Lead (chapter lead) to sign you off.');
    expect((await member.agent.get('/api/tools/T-0001')).body.forYou.reason).toMatch(/Ask Lee Lead \(chapter lead\)/);

    await post(lead, `/api/signoffs/${id}/holders`, { userId: crew.member.id }).expect(201);
    expect((await member.agent.get('/api/tools/T-0001')).body.forYou.actions).toEqual(['check_out']);
    expect((await post(member, '/api/tools/T-0001/checkout')).status).toBe(201);
    await post(member, '/api/tools/T-0001/return', { condition: 'ok' }).expect(200);

    await del(lead, `/api/signoffs/${id}/holders/${crew.member.id}`).expect(204);
    const again = await post(member, '/api/tools/T-0001/checkout');
    expect(again.status).toBe(403);
    expect(again.body.error.code).toBe('SIGNOFF_REQUIRED');
  });

  test('names every active lead, and leaves out a deactivated one', async ({ t, lead, qm, member, define }) => {
    const id = await define('Air tools');
    await post(qm, '/api/tools', { name: 'Die grinder', category: 'other', requiredSignoffId: id }).expect(201);
    await t.addUser({ email: 'dana@example.org', name: 'Dana Okafor', role: 'lead' });
    const former = await t.addUser({ email: 'ray@example.org', name: 'Ray Former', role: 'lead' });
    await patch(lead, `/api/users/${former.id}`, { active: false }).expect(200);
    const refused = await post(member, '/api/tools/T-0001/checkout');
    expect(refused.body.error.message).toMatch(/Ask Dana Okafor or Lee Lead \(chapter leads\) to sign you off\.$/);
  });
});
