import { describe, expect } from 'vitest';
import { findWorkingBadge } from '../../server/accounts/badges.repo';
import { hashLinkToken } from '../../server/accounts/link-tokens';
import { crewTest } from '../helpers/crew-test';
import { postSheet, qrTextsOnSheet } from '../helpers/label-sheet';
import { pdfStreams, shownText } from '../helpers/pdf-read';

const LAYOUT = 'thermal-1x1-2x1in';

/** The badge tokens the QR codes of a one-label-a-page sheet hold, page by page. */
const qrTokens = (pdf: Buffer) => qrTextsOnSheet(pdf, LAYOUT);

describe('POST /api/labels/sheet with people', () => {
  crewTest('prints a badge: the QR holds a token that signs in at a station, the name under it, and the old badge stops working', async ({ t, crew, qm }) => {
    const first = await postSheet(qm, { layoutId: LAYOUT, people: [crew.member.id] });
    expect(first.status).toBe(200);
    expect(first.headers['content-type']).toBe('application/pdf');
    const [oldToken] = qrTokens(first.body as Buffer);
    expect(findWorkingBadge(t.db, hashLinkToken(oldToken!))?.user.id).toBe(crew.member.id);
    const text = pdfStreams(first.body as Buffer).flatMap(shownText);
    expect(text).toContain('Mia Member');
    expect(text.join(' ')).not.toContain(oldToken);

    const second = await postSheet(qm, { layoutId: LAYOUT, people: [crew.member.id] });
    const [newToken] = qrTokens(second.body as Buffer);
    expect(newToken).not.toBe(oldToken);
    expect(findWorkingBadge(t.db, hashLinkToken(newToken!))?.user.id).toBe(crew.member.id);
    expect(findWorkingBadge(t.db, hashLinkToken(oldToken!))).toBeUndefined();
  });

  crewTest('prints one badge per person, in the order given', async ({ crew, lead }) => {
    const res = await postSheet(lead, { layoutId: LAYOUT, people: [crew.quartermaster.id, crew.member.id] });
    expect(res.status).toBe(200);
    const text = pdfStreams(res.body as Buffer).flatMap(shownText);
    const words = text.join(' ');
    expect(words).toMatch(/^BADGE Quinn\s+Quartermaster BADGE Mia Member$/);
    expect(qrTokens(res.body as Buffer).every((token) => token !== null && token.length > 20)).toBe(true);
    expect(qrTokens(res.body as Buffer)).toHaveLength(2);
  });

  crewTest('a member may not print badges', async ({ crew, member }) => {
    const res = await postSheet(member, { layoutId: LAYOUT, people: [crew.member.id] });
    expect(res.status).toBe(403);
  });

  crewTest('an unknown or deactivated person is refused in words, and nobody’s badge changes', async ({ t, crew, lead, qm }) => {
    const unknown = await postSheet(qm, { layoutId: LAYOUT, people: [crew.member.id, 9999] });
    expect(unknown.status).toBe(404);
    expect((unknown.body as { error: { message: string } }).error.message).toMatch(/9999/);
    await lead.agent.patch(`/api/users/${crew.member.id}`).set('X-CSRF-Token', lead.csrf).send({ active: false });
    const gone = await postSheet(qm, { layoutId: LAYOUT, people: [crew.member.id] });
    expect(gone.status).toBe(409);
    expect(t.db.$client.prepare('select count(*) as n from badges').get()).toEqual({ n: 0 });
  });

  crewTest('asks for something to label when there are neither codes nor people', async ({ qm }) => {
    const res = await postSheet(qm, { layoutId: LAYOUT });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body)).toMatch(/Pick at least one tool, bin or person/);
  });
});

describe('GET /api/labels/people', () => {
  crewTest('lists the active people by name with whether they have a badge, to a quartermaster; not to a member', async ({ t, crew, lead, qm, member }) => {
    await lead.agent.post(`/api/users/${crew.member.id}/badge`).set('X-CSRF-Token', lead.csrf).send({});
    const gone = await t.addUser({ email: 'gone@example.org', name: 'Gus Gone' });
    await lead.agent.patch(`/api/users/${gone.id}`).set('X-CSRF-Token', lead.csrf).send({ active: false });
    const res = await qm.agent.get('/api/labels/people');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      data: [
        { id: crew.lead.id, name: 'Lee Lead', hasBadge: false },
        { id: crew.member.id, name: 'Mia Member', hasBadge: true },
        { id: crew.quartermaster.id, name: 'Quinn Quartermaster', hasBadge: false },
      ],
    });
    expect((await member.agent.get('/api/labels/people')).status).toBe(403);
  });
});
