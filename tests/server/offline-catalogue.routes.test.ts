import { eq } from 'drizzle-orm';
import { describe, expect } from 'vitest';
import { catalogueSchema } from '@shared/schemas/offline';
import { assemblies, builds } from '../../server/db/schema/builds';
import { addBinAs, addToolAs, blindRivetBin, post } from '../helpers/crib';
import { giveAssemblies } from '../helpers/planning';
import { crewTest } from '../helpers/crew-test';
import type { SignedInAgent } from '../helpers/test-app';

const catalogue = async (who: SignedInAgent) => {
  const res = await who.agent.get('/api/offline/catalogue');
  expect(res.status).toBe(200);
  expect(res.headers['content-type']).toMatch(/application\/json/);
  expect(res.headers['cache-control']).toBe('no-store');
  return { res, body: catalogueSchema.parse(res.body) };
};

describe('GET /api/offline/catalogue', () => {
  crewTest('answers 401 to a visitor who is not signed in', async ({ t }) => {
    const visitor = await t.anonymous();
    expect((await visitor.agent.get('/api/offline/catalogue')).status).toBe(401);
  });

  crewTest('gives the member every tool but retired ones, with holders, holds and sign-offs', async ({ t, crew, lead, qm, member, otherMember }) => {
    const signoff = (await post(lead, '/api/signoffs', { name: 'Air tools' })).body as { id: number };
    await post(lead, `/api/signoffs/${signoff.id}/holders`, { userId: crew.member.id }).expect(201);
    const drill = await addToolAs(qm, { name: 'Air drill, straight', category: 'other', location: 'Crib A', loanDays: 5, requiredSignoffId: signoff.id, accessories: ['Chuck key'] });
    const fan = await addToolAs(qm, { name: 'Spacing fan', category: 'other' });
    const gun = await addToolAs(qm, { name: 'Rivet gun, 3X', category: 'other' });
    const old = await addToolAs(qm, { name: 'Worn bucking bar', category: 'other' });
    await post(qm, `/api/tools/${old.code}/retire`, { note: 'cracked face' }).expect(200);
    const out = (await post(member, `/api/tools/${drill.code}/checkout`, {})).body as { dueAt: string };
    await post(otherMember, `/api/tools/${fan.code}/checkout`, {}).expect(201);
    await post(otherMember, `/api/tools/${gun.code}/holds`).expect(201);

    const { body } = await catalogue(member);
    expect(body.takenAt).toBe(t.clock.now.toISOString());
    expect(body.you).toEqual({ id: crew.member.id, name: 'Mia Member', role: 'member' });
    expect(body.tools.map((x) => x.code)).toEqual([drill.code, fan.code, gun.code]);
    expect(body.tools[0]).toEqual({
      code: drill.code,
      name: 'Air drill, straight',
      category: 'other',
      location: 'Crib A',
      status: 'on_loan',
      accessories: ['Chuck key'],
      loanDays: 5,
      requiredSignoffId: signoff.id,
      requiredSignoffName: 'Air tools',
      holder: { id: crew.member.id, name: 'Mia Member' },
      dueAt: out.dueAt,
      accessoriesOut: null,
      heldFor: null,
      traySize: null,
      trayCapacity: null,
    });
    expect(body.tools[1]).toMatchObject({ status: 'on_loan', holder: { name: 'Ines Other' } });
    expect(body.tools[2]).toMatchObject({ status: 'held', holder: null, dueAt: null, heldFor: { name: 'Ines Other' } });
    expect(body.yourLoans).toEqual([{ code: drill.code, dueAt: out.dueAt }]);
    expect(body.yourSignoffs).toEqual([signoff.id]);

    const theirs = (await catalogue(otherMember)).body;
    expect(theirs.yourLoans.map((l) => l.code)).toEqual([fan.code]);
    expect(theirs.yourSignoffs).toEqual([]);
  });

  crewTest('gives every bin with its designation, on hand and what this member drew and has not returned', async ({ qm, member, otherMember }) => {
    const a = await addBinAs(qm, blindRivetBin({ initialQuantity: 500 }));
    const b = await addBinAs(qm, blindRivetBin({ initialQuantity: 200, location: 'Shelf B1' }));
    await post(member, `/api/bins/${a.code}/draw`, { quantity: 60 }).expect(201);
    await post(member, `/api/bins/${a.code}/return`, { quantity: 15 }).expect(201);
    await post(member, `/api/bins/${b.code}/draw`, { quantity: 10 }).expect(201);
    await post(member, `/api/bins/${b.code}/return`, { quantity: 10 }).expect(201);
    await post(otherMember, `/api/bins/${a.code}/draw`, { quantity: 7 }).expect(201);

    const { body } = await catalogue(member);
    const designation = (await member.agent.get(`/api/bins/${a.code}`)).body.designation as string;
    expect(body.bins).toEqual([
      { code: a.code, kind: 'blind_structural', designation, location: 'Shelf A2', unit: 'each', onHand: 448, drawnByYou: 45 },
      { code: b.code, kind: 'blind_structural', designation, location: 'Shelf B1', unit: 'each', onHand: 200, drawnByYou: 0 },
    ]);
    expect((await catalogue(otherMember)).body.bins.map((x) => x.drawnByYou)).toEqual([7, 0]);
    expect((await catalogue(qm)).body.bins.map((x) => x.drawnByYou)).toEqual([0, 0]);
  });

  crewTest('lists the member’s own assemblies that are not done, with their build', async ({ t, crew, member }) => {
    giveAssemblies(t.db, crew.member.id, [11, 12]);
    t.db.update(assemblies).set({ status: 'done' }).where(eq(assemblies.id, 12)).run();
    giveAssemblies(t.db, crew.lead.id, [21]);
    const { body } = await catalogue(member);
    const build = t.db.select().from(builds).where(eq(builds.ownerId, crew.member.id)).get()!;
    expect(body.yourAssemblies).toEqual([{ id: 11, name: 'Assembly 11', buildName: build.name }]);
  });
});
