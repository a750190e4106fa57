import { describe, expect } from 'vitest';
import { stationListSchema, stationSessionSchema } from '@shared/schemas/stations';
import { addBinAs, addToolAs, blindRivetBin, post } from '../helpers/crib';
import { enrolStation, issueBadge, stationBrowser, stationTest } from '../helpers/station';

const SECOND = 1000;
const MINUTE = 60 * SECOND;

const test = stationTest;

describe('enrolling stations', () => {
  test('a quartermaster enrols, lists and revokes a station; the token is shown once', async ({ qm, lead }) => {
    const station = await enrolStation(qm, '  Crib door ');
    expect(station).toMatchObject({ name: 'Crib door' });
    expect(station.stationToken).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const list = stationListSchema.parse((await lead.agent.get('/api/stations').expect(200)).body);
    expect(list.data).toEqual([expect.objectContaining({ id: station.id, name: 'Crib door', enrolledBy: 'Quinn Quartermaster', revokedAt: null })]);
    expect(JSON.stringify(list)).not.toContain(station.stationToken);

    const revoked = await post(lead, `/api/stations/${station.id}/revoke`).expect(200);
    expect(revoked.body).toMatchObject({ id: station.id, revokedAt: expect.any(String) });
    const again = await post(qm, `/api/stations/${station.id}/revoke`).expect(409);
    expect(again.body.error.code).toBe('STATION_REVOKED');
    await post(qm, '/api/stations/999/revoke').expect(404);
  });

  test('a member may not enrol or list stations, and a name is required', async ({ qm, member }) => {
    expect((await post(member, '/api/stations', { name: 'Mine' })).status).toBe(403);
    expect((await member.agent.get('/api/stations')).status).toBe(403);
    const bad = await post(qm, '/api/stations', { name: '  ' }).expect(400);
    expect(JSON.stringify(bad.body)).toContain('Give the station a name.');
  });
});

describe('signing in at a station', () => {
  test('a badge and its PIN sign the person in, scoped to the station', async ({ door, lead }) => {
    const res = await door.browser.signIn(door.badge, '4827');
    expect(res.status).toBe(200);
    const session = stationSessionSchema.parse(res.body);
    expect(session).toMatchObject({ user: { email: 'member@example.org' }, station: { id: door.station.id, name: 'Crib door' }, idleSeconds: 60 });
    expect(res.headers['set-cookie']?.[0]).toMatch(/^gripline\.sid=/);
    expect(stationSessionSchema.parse((await door.browser.get('/api/station/session').expect(200)).body).user.email).toBe('member@example.org');

    const users = await door.browser.get('/api/users');
    expect(users.status).toBe(403);
    expect(users.body.error.code).toBe('STATION_SCOPE');
    expect((await door.browser.get('/api/builds')).body.error.code).toBe('STATION_SCOPE');
    // The lead's own session is not scoped.
    await lead.agent.get('/api/users').expect(200);
  });

  test('a checkout at the station records the station and shows on the member’s own My loans', async ({ door, qm, member }) => {
    const tool = await addToolAs(qm, { name: 'Rivet gun 2X', category: 'rivet_gun' });
    await door.browser.signIn(door.badge, '4827');
    await door.browser.get(`/api/tools/${tool.code}`).expect(200);
    await door.browser.post(`/api/tools/${tool.code}/checkout`).expect(201);
    const mine = (await member.agent.get('/api/loans/mine').expect(200)).body.data as { tool: { code: string } }[];
    expect(mine.map((l) => l.tool.code)).toEqual([tool.code]);
    const events = (await qm.agent.get(`/api/tools/${tool.code}/events`).expect(200)).body.data as { action: string; station: string | null }[];
    expect(events.find((e) => e.action === 'checked_out')?.station).toBe('Crib door');
    expect(events.find((e) => e.action === 'added')?.station).toBeNull();
    await door.browser.post(`/api/tools/${tool.code}/return`, { condition: 'ok' }).expect(200);
    const after = (await qm.agent.get(`/api/tools/${tool.code}/events`).expect(200)).body.data as { action: string; station: string | null }[];
    expect(after.find((e) => e.action === 'returned')?.station).toBe('Crib door');
  });

  test('a draw at the station records the station on the ledger line', async ({ door, qm }) => {
    const bin = await addBinAs(qm, blindRivetBin());
    await door.browser.signIn(door.badge, '4827');
    await door.browser.post(`/api/bins/${bin.code}/draw`, { quantity: 20 }).expect(201);
    const ledger = (await qm.agent.get(`/api/bins/${bin.code}/ledger`).expect(200)).body.data as { kind: string; station: string | null }[];
    expect(ledger.find((e) => e.kind === 'draw')?.station).toBe('Crib door');
    expect(ledger.find((e) => e.kind !== 'draw')?.station).toBeNull();
  });

  test('the next badge scanned replaces the person at the station', async ({ t, door, crew }) => {
    const leadBadge = await issueBadge(t, crew.lead.id, crew.quartermaster.id, '99887766');
    await door.browser.signIn(door.badge, '4827');
    const next = await door.browser.signIn(leadBadge, '99887766');
    expect(next.status).toBe(200);
    expect(stationSessionSchema.parse((await door.browser.get('/api/station/session').expect(200)).body).user.email).toBe('lead@example.org');
    // Still a station session: the lead's own powers stay on the lead's own device.
    expect((await door.browser.get('/api/users')).body.error.code).toBe('STATION_SCOPE');
  });

  test('names an unknown field and a PIN that is not 4 to 8 digits', async ({ door }) => {
    const extra = await door.browser.signIn(door.badge, '4827').then(() => door.browser.post('/api/station/sign-in', { badge: door.badge, pin: '4827', remember: true }));
    expect(extra.status).toBe(400);
    expect(extra.body.error.issues).toEqual([{ path: 'remember', message: 'Unknown field "remember".' }]);
    const short = await door.browser.post('/api/station/sign-in', { badge: door.badge, pin: '12' });
    expect(short.body.error.issues).toEqual([{ path: 'pin', message: 'A PIN is 4 to 8 digits.' }]);
  });

  test('refuses an unknown or missing station token, and a badge nobody holds', async ({ t, door }) => {
    const stranger = stationBrowser(t, 'not-a-station-token');
    expect((await stranger.signIn(door.badge, '4827')).body.error.code).toBe('STATION_NOT_ENROLLED');
    const res = await door.browser.signIn('no-such-badge', '4827');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('BADGE_NOT_RECOGNISED');
  });

  test('a person without a PIN is told to set one', async ({ t, door, crew }) => {
    const badge = await issueBadge(t, crew.lead.id, crew.quartermaster.id, null);
    const res = await door.browser.signIn(badge, '1234');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('NO_PIN');
  });

  test('a reprinted (revoked) badge and a revoked station are refused', async ({ t, door, crew, qm }) => {
    await issueBadge(t, crew.member.id, crew.quartermaster.id);
    expect((await door.browser.signIn(door.badge, '4827')).body.error.code).toBe('BADGE_NOT_RECOGNISED');
    await post(qm, `/api/stations/${door.station.id}/revoke`).expect(200);
    const res = await door.browser.signIn(door.badge, '4827');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('STATION_NOT_ENROLLED');
  });

  test('revoking the station ends the session it has open', async ({ door, qm }) => {
    await door.browser.signIn(door.badge, '4827');
    await post(qm, `/api/stations/${door.station.id}/revoke`).expect(200);
    const res = await door.browser.get('/api/station/session');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('STATION_NOT_ENROLLED');
    expect((await door.browser.agent.get('/api/auth/me').expect(200)).body.user).toBeNull();
  });

  test('a station session without its station token ends', async ({ door }) => {
    await door.browser.signIn(door.badge, '4827');
    const res = await door.browser.agent.get('/api/auth/me');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('STATION_NOT_ENROLLED');
    expect((await door.browser.get('/api/station/session')).body.error.code).toBe('STATION_SESSION_ENDED');
  });
});

describe('wrong PINs', () => {
  test('say how many tries are left, then lock the badge at that station only, for 15 minutes', async ({ t, door, qm, advance }) => {
    for (const left of [4, 3, 2, 1]) {
      const res = await door.browser.signIn(door.badge, '0000');
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe('WRONG_PIN');
      expect(res.body.error.message).toContain(`${left} ${left === 1 ? 'try' : 'tries'} left`);
      advance(MINUTE);
    }
    const fifth = await door.browser.signIn(door.badge, '0000');
    expect(fifth.status).toBe(429);
    expect(fifth.body.error.code).toBe('BADGE_LOCKED');
    expect(fifth.headers['retry-after']).toBe(String(15 * 60));
    advance(5 * MINUTE);
    const right = await door.browser.signIn(door.badge, '4827');
    expect(right.status).toBe(429);
    expect(right.headers['retry-after']).toBe(String(10 * 60));

    const hall = stationBrowser(t, (await enrolStation(qm, 'Hall')).stationToken);
    expect((await hall.signIn(door.badge, '4827')).status).toBe(200);
    await t.signIn('member@example.org');

    advance(10 * MINUTE);
    expect((await door.browser.signIn(door.badge, '4827')).status).toBe(200);
  });
});

describe('wrong PINs sent at once', () => {
  test('are checked one after another, so a burst cannot try more than five', async ({ t, door, crew }) => {
    await door.browser.signIn(door.badge, '0000');
    const burst = await Promise.all(['1111', '2222', '3333', '4444', '5555', '6666', '7777'].map((pin) => door.browser.post('/api/station/sign-in', { badge: door.badge, pin })));
    const codes = burst.map((r) => (r.body as { error?: { code: string } }).error?.code ?? String(r.status));
    expect(codes.filter((c) => c === 'WRONG_PIN')).toHaveLength(3);
    expect(codes.filter((c) => c === 'BADGE_LOCKED')).toHaveLength(4);
    const failures = t.db.$client.prepare('select count(*) as n from station_pin_failures where badge_id = (select id from badges where user_id = ?)').get(crew.member.id) as { n: number };
    expect(failures.n).toBe(5);
    expect((await door.browser.signIn(door.badge, '4827')).status).toBe(429);
  });
});

describe('the station session ends', () => {
  test('after 60 s without a request, by the app clock', async ({ door, advance }) => {
    await door.browser.signIn(door.badge, '4827');
    advance(50 * SECOND);
    await door.browser.get('/api/auth/me').expect(200);
    advance(59 * SECOND);
    expect(stationSessionSchema.parse((await door.browser.get('/api/station/session').expect(200)).body).idleSeconds).toBe(1);
    advance(61 * SECOND - 59 * SECOND);
    const res = await door.browser.get('/api/auth/me');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('STATION_SESSION_ENDED');
    expect((await door.browser.get('/api/station/session')).status).toBe(401);
  });

  test('on Done', async ({ door }) => {
    await door.browser.signIn(door.badge, '4827');
    await door.browser.post('/api/station/done').expect(204);
    const res = await door.browser.get('/api/station/session');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('STATION_SESSION_ENDED');
  });

  test('a normal session is neither scoped nor ended by idling', async ({ member, advance }) => {
    advance(5 * MINUTE);
    await member.agent.get('/api/builds').expect(200);
    expect((await member.agent.get('/api/station/session')).body.error.code).toBe('STATION_SESSION_ENDED');
  });
});
