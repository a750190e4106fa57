import { eq } from 'drizzle-orm';
import { describe, expect } from 'vitest';
import { signoffRequestListSchema, signoffRequestSchema } from '@shared/schemas/signoff-requests';
import { outboxMail } from '../../server/db/schema/mail';
import { signoffRequests } from '../../server/db/schema/signoff-requests';
import { addToolAs, patch, post } from '../helpers/crib';
import { crewTest } from '../helpers/crew-test';
import type { SignedInAgent } from '../helpers/test-app';

let signoffId: number;
let drill: string;

const ask = (who: SignedInAgent, body: Record<string, unknown>) => post(who, '/api/signoffs/requests', body);

const test = crewTest
  .extend('openRequests', ({ lead }) => async () => signoffRequestListSchema.parse((await lead.agent.get('/api/signoffs/requests').expect(200)).body).data)
  .extend('mailTo', ({ t }) => (address: string) => t.db.select().from(outboxMail).where(eq(outboxMail.toAddress, address)).all());

test.beforeEach(async ({ lead, qm }) => {
  signoffId = ((await post(lead, '/api/signoffs', { name: 'Air tools' })).body as { id: number }).id;
  drill = (await addToolAs(qm, { name: 'Air drill', category: 'air_drill', requiredSignoffId: signoffId })).code;
});

describe('POST /api/signoffs/requests', () => {
  test('records a member’s request from a tool, with the note, for the lead to see', async ({ crew, member, openRequests }) => {
    const res = await ask(member, { toolCode: drill, note: '  I did the drill course in March. ' });
    expect(res.status).toBe(201);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(signoffRequestSchema.parse(res.body)).toEqual({
      id: expect.any(Number),
      signoff: { id: signoffId, name: 'Air tools' },
      member: { id: crew.member.id, name: 'Mia Member' },
      tool: { code: drill, name: 'Air drill' },
      note: 'I did the drill course in March.',
      state: 'open',
      askedAt: '2026-12-01T12:00:00.000Z',
      closedAt: null,
      declineReason: null,
    });
    expect(await openRequests()).toEqual([res.body]);
    const mine = signoffRequestListSchema.parse((await member.agent.get('/api/signoffs/requests/mine').expect(200)).body).data;
    expect(mine).toEqual([res.body]);
  });

  test('answers 409 SIGNOFF_REQUEST_OPEN while one is open for the same sign-off, from this tool or another', async ({ qm, member, openRequests }) => {
    const rivetGun = (await addToolAs(qm, { name: 'Rivet gun', category: 'other', requiredSignoffId: signoffId })).code;
    expect((await ask(member, { toolCode: drill })).status).toBe(201);
    for (const toolCode of [drill, rivetGun]) {
      const again = await ask(member, { toolCode });
      expect(again.status).toBe(409);
      expect(again.body.error.code).toBe('SIGNOFF_REQUEST_OPEN');
      expect(again.body.error.message).toContain('Air tools');
    }
    expect(await openRequests()).toHaveLength(1);
  });

  test('refuses a tool without a sign-off, an unknown tool, one already signed off, and unknown fields', async ({ crew, lead, qm, member }) => {
    const fan = (await addToolAs(qm, { name: 'Spacing fan', category: 'spacing_fan' })).code;
    expect((await ask(member, { toolCode: fan })).body.error.code).toBe('NO_SIGNOFF_NEEDED');
    const unknown = await ask(member, { toolCode: 'T-9999' });
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.code).toBe('TOOL_NOT_FOUND');
    await post(lead, `/api/signoffs/${signoffId}/holders`, { userId: crew.member.id }).expect(201);
    const held = await ask(member, { toolCode: drill });
    expect(held.status).toBe(409);
    expect(held.body.error.code).toBe('ALREADY_SIGNED_OFF');
    const extra = await ask(member, { toolCode: drill, urgent: true });
    expect(extra.status).toBe(400);
    expect(extra.body.error.issues[0].path).toBe('urgent');
    expect((await ask(member, {})).body.error.code).toBe('VALIDATION_FAILED');
  });
});

describe('answering a sign-off request', () => {
  test('closes the request as granted when the lead signs the member off, and mails them', async ({ t, crew, lead, member, openRequests }) => {
    const id = ((await ask(member, { toolCode: drill })).body as { id: number }).id;
    await post(lead, `/api/signoffs/${signoffId}/holders`, { userId: crew.member.id }).expect(201);
    expect(await openRequests()).toEqual([]);
    const row = t.db.select().from(signoffRequests).where(eq(signoffRequests.id, id)).get()!;
    expect(row).toMatchObject({ state: 'granted', closedById: crew.lead.id, closedAt: t.clock.now });
    const mail = await t.lastMailTo('member@example.org');
    expect(mail?.subject).toBe('You are signed off for "Air tools"');
    expect(mail?.text).toContain(`Lee Lead has signed you off for "Air tools", as you asked from Air drill (${drill})`);
    // The member may now check the tool out, and may ask again after a revocation.
    expect((await post(member, `/api/tools/${drill}/checkout`, {})).status).toBe(201);
  });

  test('grants without a request as before, sending no answer', async ({ crew, lead, mailTo }) => {
    await post(lead, `/api/signoffs/${signoffId}/holders`, { userId: crew.member.id }).expect(201);
    expect(mailTo('member@example.org')).toEqual([]);
  });

  test('declines with a reason the member reads in the mail; the member may then ask again', async ({ t, lead, member, openRequests }) => {
    const id = ((await ask(member, { toolCode: drill })).body as { id: number }).id;
    const noReason = await post(lead, `/api/signoffs/requests/${id}/decline`, { reason: '  ' });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.issues[0].path).toBe('reason');
    const res = await post(lead, `/api/signoffs/requests/${id}/decline`, { reason: 'Come to Saturday’s air tool session first.' });
    expect(res.status).toBe(200);
    expect(signoffRequestSchema.parse(res.body)).toMatchObject({ id, state: 'declined', declineReason: 'Come to Saturday’s air tool session first.', closedAt: '2026-12-01T12:00:00.000Z' });
    expect(await openRequests()).toEqual([]);
    const mail = await t.lastMailTo('member@example.org');
    expect(mail?.subject).toBe('Your request for the "Air tools" sign-off was declined');
    expect(mail?.text).toContain('The reason: Come to Saturday’s air tool session first.');

    const twice = await post(lead, `/api/signoffs/requests/${id}/decline`, { reason: 'Again' });
    expect(twice.status).toBe(409);
    expect(twice.body.error.code).toBe('SIGNOFF_REQUEST_CLOSED');
    expect((await post(lead, '/api/signoffs/requests/9999/decline', { reason: 'No' })).status).toBe(404);
    expect((await ask(member, { toolCode: drill })).status).toBe(201);
  });

  test('leaves a deactivated person’s request off the lead’s list, and shows it again on reactivation', async ({ crew, lead, member, openRequests }) => {
    await ask(member, { toolCode: drill }).expect(201);
    await patch(lead, `/api/users/${crew.member.id}`, { active: false }).expect(200);
    expect(await openRequests()).toEqual([]);
    await patch(lead, `/api/users/${crew.member.id}`, { active: true }).expect(200);
    expect((await openRequests()).map((r) => r.member.name)).toEqual(['Mia Member']);
  });

  test('lets only a lead list or decline requests', async ({ t, qm, member, openRequests }) => {
    const id = ((await ask(member, { toolCode: drill })).body as { id: number }).id;
    for (const who of [qm, member]) {
      expect((await who.agent.get('/api/signoffs/requests')).status).toBe(403);
      const res = await post(who, `/api/signoffs/requests/${id}/decline`, { reason: 'No' });
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('FORBIDDEN');
    }
    const anon = await t.anonymous();
    expect((await post(anon, '/api/signoffs/requests', { toolCode: drill })).status).toBe(401);
    expect(await openRequests()).toHaveLength(1);
  });
});
