import { describe, expect } from 'vitest';
import {
  csrfResponseSchema,
  invitationPreviewSchema,
  loginResponseSchema,
  meResponseSchema,
} from '@shared/schemas/auth';
import { errorEnvelopeSchema } from '@shared/schemas/errors';
import { mailListSchema } from '@shared/schemas/mail';
import { peopleListSchema, pendingInvitationListSchema, pendingInvitationSchema, personSchema } from '@shared/schemas/people';
import { accountsTest } from '../helpers/crew-test';
import { PASSWORD, tokenFromLink } from '../helpers/test-app';

/**
 * Every response matches the shared schema exactly (strict objects: an extra field, such as a
 * password hash, fails the parse), so client and server cannot drift apart.
 */
describe('response contracts', () => {
  accountsTest('auth: csrf, login and me', async ({ t }) => {
    const { agent, csrf } = await t.anonymous();
    expect(csrfResponseSchema.safeParse({ token: csrf }).success).toBe(true);
    const login = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: 'lead@example.org', password: PASSWORD });
    expect(loginResponseSchema.parse(login.body).user.role).toBe('lead');
    const me = await agent.get('/api/auth/me');
    expect(meResponseSchema.parse(me.body).user?.email).toBe('lead@example.org');
    expect(JSON.stringify(login.body) + JSON.stringify(me.body)).not.toMatch(/argon2|password/i);
  });

  accountsTest('people, invitations and mail', async ({ t }) => {
    const lead = await t.signIn('lead@example.org');
    const people = await lead.agent.get('/api/users');
    expect(peopleListSchema.parse(people.body).data).toHaveLength(3);
    expect(JSON.stringify(people.body)).not.toMatch(/argon2|passwordHash/);

    const invited = await lead.agent.post('/api/invitations').set('X-CSRF-Token', lead.csrf).send({ email: 'new@example.org', role: 'member' });
    expect(pendingInvitationSchema.parse(invited.body).email).toBe('new@example.org');
    expect(pendingInvitationListSchema.parse((await lead.agent.get('/api/invitations')).body).data).toHaveLength(1);

    const mail = mailListSchema.parse((await lead.agent.get('/api/mail')).body);
    const token = tokenFromLink(mail.data[0]!.links[0]!);
    const preview = await (await t.anonymous()).agent.get(`/api/invitations/by-token/${token}`);
    expect(invitationPreviewSchema.parse(preview.body)).toMatchObject({ email: 'new@example.org', role: 'member', invitedBy: 'Lee Lead' });

    const memberId = peopleListSchema.parse(people.body).data.find((p) => p.role === 'member')!.id;
    const changed = await lead.agent.patch(`/api/users/${memberId}`).set('X-CSRF-Token', lead.csrf).send({ role: 'quartermaster' });
    expect(personSchema.parse(changed.body).role).toBe('quartermaster');
  });

  accountsTest('errors use the one envelope', async ({ t }) => {
    const { agent, csrf } = await t.anonymous();
    const bad = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({});
    const parsed = errorEnvelopeSchema.parse(bad.body);
    expect(parsed.error.code).toBe('VALIDATION_FAILED');
    expect(parsed.error.issues?.length).toBeGreaterThan(0);
  });
});
