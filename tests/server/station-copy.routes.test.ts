import { createHash } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { argon2Verify } from 'hash-wasm';
import request from 'supertest';
import { describe, expect } from 'vitest';
import { catalogueSchema } from '@shared/schemas/offline';
import { STATION_TOKEN_HEADER, stationCopySchema, type StationCopy } from '@shared/schemas/stations';
import { assemblies } from '../../server/db/schema/builds';
import { addBinAs, addToolAs, blindRivetBin, patch, post } from '../helpers/crib';
import { crewTest } from '../helpers/crew-test';
import { giveAssemblies } from '../helpers/planning';
import { enrolStation, issueBadge, stationBrowser } from '../helpers/station';
import type { TestApp } from '../helpers/test-app';

/** SHA-256 in hex, computed here rather than through the server's own helper. */
const sha256 = (text: string) => createHash('sha256').update(text).digest('hex');

const getCopy = (t: TestApp, token?: string) => {
  const req = request(t.app).get('/api/station/copy');
  return token === undefined ? req : req.set(STATION_TOKEN_HEADER, token);
};

const test = crewTest
  /** A station named Crib door, enrolled by the quartermaster, and a way to read its copy. */
  .extend('door', async ({ t, qm }) => {
    const station = await enrolStation(qm, 'Crib door');
    return {
      station,
      async copy(): Promise<StationCopy> {
        const res = await getCopy(t, station.stationToken);
        expect(res.status).toBe(200);
        expect(res.headers['cache-control']).toBe('no-store');
        return stationCopySchema.parse(res.body);
      },
    };
  });

describe('GET /api/station/copy', () => {
  test('answers 401 STATION_NOT_ENROLLED without a token, with one no station holds, and with a revoked station’s', async ({ t, qm, door }) => {
    for (const res of [await getCopy(t), await getCopy(t, 'not-a-station-token')]) {
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe('STATION_NOT_ENROLLED');
    }
    await door.copy();
    await post(qm, `/api/stations/${door.station.id}/revoke`).expect(200);
    const revoked = await getCopy(t, door.station.stationToken);
    expect(revoked.status).toBe(401);
    expect(revoked.body.error.code).toBe('STATION_NOT_ENROLLED');
  });

  test('holds active people with a working badge only: a reprint keeps only the new badge, a deactivated person is left out', async ({ t, crew, lead, door, otherMember: _other }) => {
    const oldBadge = await issueBadge(t, crew.member.id, crew.quartermaster.id, '4827');
    const newBadge = await issueBadge(t, crew.member.id, crew.quartermaster.id, '4827');
    const leadBadge = await issueBadge(t, crew.lead.id, crew.quartermaster.id, null);
    const ines = t.db.$client.prepare("select id from users where email = 'ines@example.org'").get() as { id: number };
    await issueBadge(t, ines.id, crew.quartermaster.id);
    await patch(lead, `/api/users/${ines.id}`, { active: false }).expect(200);

    const copy = await door.copy();
    expect(copy.takenAt).toBe(t.clock.now.toISOString());
    expect(copy.station).toEqual({ id: door.station.id, name: 'Crib door' });
    // The quartermaster has no badge; Ines was deactivated.
    expect(copy.people.map((p) => [p.id, p.name, p.role])).toEqual([
      [crew.lead.id, 'Lee Lead', 'lead'],
      [crew.member.id, 'Mia Member', 'member'],
    ]);
    const [leadCopy, memberCopy] = copy.people;
    expect(memberCopy!.badgeHash).toBe(sha256(newBadge));
    expect(JSON.stringify(copy)).not.toContain(sha256(oldBadge));
    expect(leadCopy!.badgeHash).toBe(sha256(leadBadge));
    // No badge token itself, only its hash.
    expect(JSON.stringify(copy)).not.toContain(newBadge);
  });

  test('gives the PIN’s argon2id hash, null for someone without a PIN, and no e-mail anywhere', async ({ t, crew, door }) => {
    await issueBadge(t, crew.member.id, crew.quartermaster.id, '4827');
    await issueBadge(t, crew.lead.id, crew.quartermaster.id, null);
    const copy = await door.copy();
    const byName = new Map(copy.people.map((p) => [p.name, p]));
    expect(byName.get('Lee Lead')!.pinHash).toBeNull();
    const pinHash = byName.get('Mia Member')!.pinHash!;
    expect(pinHash).toMatch(/^\$argon2id\$v=19\$(?:[mtp]=\d+,?){3}\$[A-Za-z0-9+/]+\$[A-Za-z0-9+/]+$/);
    // The browser's own argon2id (the library the station uses) checks a PIN against it.
    expect(await argon2Verify({ password: '4827', hash: pinHash })).toBe(true);
    expect(await argon2Verify({ password: '4828', hash: pinHash })).toBe(false);
    const text = JSON.stringify(copy);
    expect(text).not.toContain('@');
    for (const person of Object.values(crew)) expect(text).not.toContain(person.email);
  });

  test('gives each person their loans, sign-offs, open assemblies and what they drew and have not returned', async ({ t, crew, lead, qm, member, otherMember, door }) => {
    await issueBadge(t, crew.member.id, crew.quartermaster.id);
    const ines = t.db.$client.prepare("select id from users where email = 'ines@example.org'").get() as { id: number };
    await issueBadge(t, ines.id, crew.quartermaster.id);

    const air = (await post(lead, '/api/signoffs', { name: 'Air tools' })).body as { id: number };
    const dimple = (await post(lead, '/api/signoffs', { name: 'Dimpling' })).body as { id: number };
    await post(lead, `/api/signoffs/${air.id}/holders`, { userId: crew.member.id }).expect(201);
    await post(lead, `/api/signoffs/${dimple.id}/holders`, { userId: crew.member.id }).expect(201);
    await post(lead, `/api/signoffs/${dimple.id}/holders`, { userId: ines.id }).expect(201);

    const drill = await addToolAs(qm, { name: 'Air drill, straight', category: 'other', requiredSignoffId: air.id });
    const fan = await addToolAs(qm, { name: 'Spacing fan', category: 'other' });
    const squeezer = await addToolAs(qm, { name: 'Hand squeezer', category: 'other' });
    const drillOut = (await post(member, `/api/tools/${drill.code}/checkout`).expect(201)).body as { dueAt: string };
    const fanOut = (await post(member, `/api/tools/${fan.code}/checkout`).expect(201)).body as { dueAt: string };
    await post(otherMember, `/api/tools/${squeezer.code}/checkout`).expect(201);
    await post(member, `/api/tools/${fan.code}/return`, { condition: 'ok' }).expect(200);

    giveAssemblies(t.db, crew.member.id, [11, 12, 13], { build: 'Two-seat kit', assemblies: { 11: 'Left aileron', 12: 'Right aileron', 13: 'Rudder' } });
    t.db.update(assemblies).set({ status: 'done' }).where(eq(assemblies.id, 12)).run();
    giveAssemblies(t.db, ines.id, [21], { build: 'Single-seat kit', assemblies: { 21: 'Elevator' } });

    const a = await addBinAs(qm, blindRivetBin({ initialQuantity: 500 }));
    const b = await addBinAs(qm, blindRivetBin({ initialQuantity: 200, location: 'Shelf B1' }));
    await post(member, `/api/bins/${a.code}/draw`, { quantity: 10 }).expect(201);
    await post(member, `/api/bins/${a.code}/return`, { quantity: 3 }).expect(201);
    await post(member, `/api/bins/${b.code}/draw`, { quantity: 5 }).expect(201);
    await post(member, `/api/bins/${b.code}/return`, { quantity: 5 }).expect(201);
    await post(otherMember, `/api/bins/${b.code}/draw`, { quantity: 4 }).expect(201);

    const copy = await door.copy();
    const mia = copy.people.find((p) => p.id === crew.member.id)!;
    const them = copy.people.find((p) => p.id === ines.id)!;
    expect(mia.loans).toEqual([{ code: drill.code, dueAt: drillOut.dueAt }]);
    expect(fanOut.dueAt).toEqual(expect.any(String));
    expect(mia.signoffs).toEqual([air.id, dimple.id]);
    expect(mia.assemblies).toEqual([
      { id: 11, name: 'Left aileron', buildName: 'Two-seat kit' },
      { id: 13, name: 'Rudder', buildName: 'Two-seat kit' },
    ]);
    expect(mia.drawn).toEqual({ [a.code]: 7 });
    expect(them.loans.map((l) => l.code)).toEqual([squeezer.code]);
    expect(them.signoffs).toEqual([dimple.id]);
    expect(them.assemblies).toEqual([{ id: 21, name: 'Elevator', buildName: 'Single-seat kit' }]);
    expect(them.drawn).toEqual({ [b.code]: 4 });

    // Tools and bins as in the phone's catalogue, with nobody's drawnByYou on a bin.
    const phone = catalogueSchema.parse((await member.agent.get('/api/offline/catalogue').expect(200)).body);
    expect(copy.tools).toEqual(phone.tools);
    expect(copy.bins).toEqual(phone.bins.map((bin) => ({ ...bin, drawnByYou: 0 })));
    // Each person's part is what their own phone's copy says of them.
    expect(mia.loans).toEqual(phone.yourLoans);
    expect(mia.signoffs).toEqual(phone.yourSignoffs);
    expect(mia.assemblies).toEqual(phone.yourAssemblies);
    expect(mia.drawn).toEqual(Object.fromEntries(phone.bins.filter((bin) => bin.drawnByYou > 0).map((bin) => [bin.code, bin.drawnByYou])));
  });

  test('is answered inside a station session too, without counting as the person’s activity', async ({ t, crew, door, clock }) => {
    const badge = await issueBadge(t, crew.member.id, crew.quartermaster.id);
    const browser = stationBrowser(t, door.station.stationToken);
    expect((await browser.signIn(badge, '4827')).status).toBe(200);
    clock.now = new Date(clock.now.getTime() + 50_000);
    expect(stationCopySchema.parse((await browser.get('/api/station/copy').expect(200)).body).people).toHaveLength(1);
    clock.now = new Date(clock.now.getTime() + 11_000);
    const ended = await browser.get('/api/station/session');
    expect(ended.status).toBe(401);
    expect(ended.body.error.code).toBe('STATION_SESSION_ENDED');
  });
});

describe('the copy’s queries', () => {
  /** Runs `read` and counts the statements better-sqlite3 steps on this app's database meanwhile. */
  async function countStatements(t: TestApp, read: () => Promise<unknown>): Promise<number> {
    const client = t.db.$client;
    const proto = Object.getPrototypeOf(client.prepare('select 1')) as Record<string, (...args: unknown[]) => unknown>;
    const methods = ['all', 'get', 'run', 'iterate'] as const;
    const originals = methods.map((m) => proto[m]!);
    let n = 0;
    methods.forEach((m, i) => {
      proto[m] = function (this: { database: unknown }, ...args: unknown[]) {
        if (this.database === client) n += 1;
        return originals[i]!.apply(this, args);
      };
    });
    try {
      await read();
    } finally {
      methods.forEach((m, i) => (proto[m] = originals[i]!));
    }
    return n;
  }

  test('are as many for 20 badge holders as for 2, each holding a loan, a sign-off, an assembly and a draw', async ({ t, crew, lead, qm, door }) => {
    const signoff = (await post(lead, '/api/signoffs', { name: 'Air tools' })).body as { id: number };
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 5000 }));
    let assemblyId = 100;
    const addHolders = async (count: number) => {
      for (let i = 0; i < count; i += 1) {
        const person = await t.addUser({ email: `holder${assemblyId}@example.org`, name: `Holder ${assemblyId}` });
        await issueBadge(t, person.id, crew.quartermaster.id, null);
        await post(lead, `/api/signoffs/${signoff.id}/holders`, { userId: person.id }).expect(201);
        giveAssemblies(t.db, person.id, [assemblyId]);
        const tool = await addToolAs(qm, { name: `Temporary fastener pliers ${assemblyId}`, category: 'other' });
        const agent = await t.signIn(person.email);
        await post(agent, `/api/tools/${tool.code}/checkout`).expect(201);
        await post(agent, `/api/bins/${bin.code}/draw`, { quantity: 2 }).expect(201);
        assemblyId += 1;
      }
    };

    await addHolders(2);
    let two: StationCopy | undefined;
    const withTwo = await countStatements(t, async () => (two = await door.copy()));
    expect(two!.people).toHaveLength(2);

    await addHolders(18);
    let twenty: StationCopy | undefined;
    const withTwenty = await countStatements(t, async () => (twenty = await door.copy()));
    expect(twenty!.people).toHaveLength(20);
    expect(twenty!.people.every((p) => p.loans.length === 1 && p.signoffs.length === 1 && p.assemblies.length === 1 && p.drawn[bin.code] === 2)).toBe(true);

    expect(withTwo).toBeGreaterThan(0);
    expect(withTwenty).toBe(withTwo);
  });
});
