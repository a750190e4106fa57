import Papa from 'papaparse';
import { describe, expect } from 'vitest';
import { stationSessionSchema } from '@shared/schemas/stations';
import { addBinAs, addToolAs, blindRivetBin, patch, post } from '../helpers/crib';
import { issueBadge, type StationBrowser, stationBrowser, stationTest } from '../helpers/station';

const SECOND = 1000;
const MINUTE = 60 * SECOND;

/** A POST as the station's queue sends it: the replay session's CSRF token plus the queue's headers. */
const queued = (browser: StationBrowser, path: string, body: object, key: string | null, performedAt: Date | null) => {
  const req = browser.post(path, body);
  if (key !== null) req.set('Idempotency-Key', key);
  if (performedAt !== null) req.set('X-Performed-At', performedAt.toISOString());
  return req;
};

const test = stationTest;

describe('POST /api/station/replay-sign-in', () => {
  test('opens a session for the badge’s holder with no PIN, answered like sign-in with its CSRF token', async ({ door }) => {
    const res = await door.browser.replaySignIn(door.badge);
    expect(res.status).toBe(200);
    const session = stationSessionSchema.parse(res.body);
    expect(session).toMatchObject({ user: { email: 'member@example.org' }, station: { id: door.station.id, name: 'Crib door' }, idleSeconds: 60 });
    expect(res.headers['x-csrf-token']).toEqual(expect.any(String));
    expect(res.headers['set-cookie']?.[0]).toMatch(/^gripline\.sid=/);
    expect((await door.browser.get('/api/auth/me').expect(200)).body.user.email).toBe('member@example.org');
    // The token it answered is the session's: GET /api/auth/csrf says the same.
    expect((await door.browser.get('/api/auth/csrf').expect(200)).body.token).toBe(res.headers['x-csrf-token']);
  });

  test('refuses a badge nobody holds, a reprinted one and a deactivated holder’s as sign-in does', async ({ t, crew, lead, door }) => {
    const unknown = await door.browser.replaySignIn('no-such-badge');
    expect(unknown.status).toBe(401);
    expect(unknown.body.error.code).toBe('BADGE_NOT_RECOGNISED');

    const signInWords = (await door.browser.signIn('no-such-badge', '4827')).body.error.message as string;
    expect(unknown.body.error.message).toBe(signInWords);

    await issueBadge(t, crew.member.id, crew.quartermaster.id);
    const reprinted = await door.browser.replaySignIn(door.badge);
    expect(reprinted.status).toBe(401);
    expect(reprinted.body.error.code).toBe('BADGE_NOT_RECOGNISED');

    const leadBadge = await issueBadge(t, crew.lead.id, crew.quartermaster.id);
    const other = await t.addUser({ email: 'ines@example.org', name: 'Ines Other' });
    const inesBadge = await issueBadge(t, other.id, crew.quartermaster.id);
    await patch(lead, `/api/users/${other.id}`, { active: false }).expect(200);
    const deactivated = await door.browser.replaySignIn(inesBadge);
    expect(deactivated.status).toBe(401);
    expect(deactivated.body.error.code).toBe('BADGE_NOT_RECOGNISED');
    expect((await door.browser.replaySignIn(leadBadge)).status).toBe(200);
  });

  test('refuses a missing, unknown or revoked station, and a revoked station ends its open replay session', async ({ t, qm, door }) => {
    const stranger = stationBrowser(t, 'not-a-station-token');
    expect((await stranger.replaySignIn(door.badge)).body.error.code).toBe('STATION_NOT_ENROLLED');
    await door.browser.replaySignIn(door.badge);
    await post(qm, `/api/stations/${door.station.id}/revoke`).expect(200);
    const open = await door.browser.get('/api/auth/me');
    expect(open.status).toBe(401);
    expect(open.body.error.code).toBe('STATION_NOT_ENROLLED');
    const again = await door.browser.replaySignIn(door.badge);
    expect(again.status).toBe(401);
    expect(again.body.error.code).toBe('STATION_NOT_ENROLLED');
  });

  test('a badge locked by wrong PINs at that station still replays, and the lock stays as it was', async ({ t, door, advance }) => {
    for (let i = 0; i < 5; i += 1) await door.browser.signIn(door.badge, '0000');
    const locked = await door.browser.signIn(door.badge, '4827');
    expect(locked.status).toBe(429);
    const failures = () => (t.db.$client.prepare('select count(*) as n from station_pin_failures').get() as { n: number }).n;
    expect(failures()).toBe(5);

    advance(MINUTE);
    expect((await door.browser.replaySignIn(door.badge)).status).toBe(200);
    await door.browser.post('/api/station/done').expect(204);
    expect(failures()).toBe(5);
    const still = await door.browser.signIn(door.badge, '4827');
    expect(still.status).toBe(429);
    expect(still.body.error.code).toBe('BADGE_LOCKED');
    expect(still.headers['retry-after']).toBe(String(14 * 60));
  });

  test('names an unknown field', async ({ door }) => {
    await door.browser.signIn(door.badge, '4827');
    const res = await door.browser.post('/api/station/replay-sign-in', { badge: door.badge, pin: '4827' });
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toEqual([{ path: 'pin', message: 'Unknown field "pin".' }]);
  });
});

describe('a replay session', () => {
  test('checks a tool out at the time it was done offline, and the tool’s history names the station', async ({ qm, member, door, clock }) => {
    const tool = await addToolAs(qm, { name: 'Rivet gun 2X', category: 'rivet_gun', loanDays: 3 });
    const arrived = clock.now;
    const performedAt = new Date(arrived.getTime() - 20 * MINUTE);
    await door.browser.replaySignIn(door.badge);

    const res = await queued(door.browser, `/api/tools/${tool.code}/checkout`, {}, 'station-queue-0001', performedAt);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ checkedOutAt: performedAt.toISOString(), recordedAt: arrived.toISOString() });

    const events = (await qm.agent.get(`/api/tools/${tool.code}/events`).expect(200)).body.data as { action: string; at: string; station: string | null; actor: { name: string } | null }[];
    const checkout = events.find((e) => e.action === 'checked_out');
    expect(checkout).toMatchObject({ at: performedAt.toISOString(), station: 'Crib door', actor: { name: 'Mia Member' } });
    const mine = (await member.agent.get('/api/loans/mine').expect(200)).body.data as { tool: { code: string }; checkedOutAt: string; checkoutRecordedAt: string }[];
    expect(mine).toEqual([expect.objectContaining({ tool: expect.objectContaining({ code: tool.code }), checkedOutAt: performedAt.toISOString(), checkoutRecordedAt: arrived.toISOString() })]);
  });

  test('the same Idempotency-Key again answers the first answer, replayed, and does nothing twice', async ({ qm, door, clock, advance }) => {
    const tool = await addToolAs(qm, { name: 'Air drill, straight', category: 'other' });
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 500 }));
    const performedAt = new Date(clock.now.getTime() - 10 * MINUTE);
    await door.browser.replaySignIn(door.badge);
    const first = await queued(door.browser, `/api/tools/${tool.code}/checkout`, {}, 'station-queue-0002', performedAt).expect(201);
    const draw = await queued(door.browser, `/api/bins/${bin.code}/draw`, { quantity: 10 }, 'station-queue-0003', performedAt).expect(201);

    // The station lost the answers and replays again, in a new replay session.
    advance(5 * SECOND);
    await door.browser.post('/api/station/done').expect(204);
    await door.browser.replaySignIn(door.badge);
    const second = await queued(door.browser, `/api/tools/${tool.code}/checkout`, {}, 'station-queue-0002', performedAt);
    expect(second.status).toBe(201);
    expect(second.headers['idempotent-replayed']).toBe('true');
    expect(second.body).toEqual(first.body);
    const drawAgain = await queued(door.browser, `/api/bins/${bin.code}/draw`, { quantity: 10 }, 'station-queue-0003', performedAt);
    expect(drawAgain.headers['idempotent-replayed']).toBe('true');
    expect(drawAgain.body).toEqual(draw.body);

    const events = (await qm.agent.get(`/api/tools/${tool.code}/events`).expect(200)).body.data as { action: string }[];
    expect(events.filter((e) => e.action === 'checked_out')).toHaveLength(1);
    expect((await qm.agent.get(`/api/bins/${bin.code}`).expect(200)).body.onHand).toBe(490);
  });

  test('records draws and returns unused at the performed time, with the station, and a tool return too', async ({ qm, door, clock }) => {
    const tool = await addToolAs(qm, { name: 'Hand squeezer', category: 'other' });
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 500 }));
    const outAt = new Date(clock.now.getTime() - 30 * MINUTE);
    const backAt = new Date(clock.now.getTime() - 10 * MINUTE);
    await door.browser.replaySignIn(door.badge);
    await queued(door.browser, `/api/tools/${tool.code}/checkout`, {}, 'station-queue-0010', outAt).expect(201);
    await queued(door.browser, `/api/bins/${bin.code}/draw`, { quantity: 10 }, 'station-queue-0011', outAt).expect(201);
    await queued(door.browser, `/api/bins/${bin.code}/return`, { quantity: 3 }, 'station-queue-0012', backAt).expect(201);
    const back = await queued(door.browser, `/api/tools/${tool.code}/return`, { condition: 'ok' }, 'station-queue-0013', backAt).expect(200);
    expect(back.body.returnedAt).toBe(backAt.toISOString());

    const ledger = (await qm.agent.get(`/api/bins/${bin.code}/ledger`).expect(200)).body.data as { kind: string; quantity: number; at: string; station: string | null }[];
    expect(ledger.filter((e) => e.kind !== 'receive').map((e) => [e.kind, e.quantity, e.at, e.station])).toEqual([
      ['return_unused', 3, backAt.toISOString(), 'Crib door'],
      ['draw', -10, outAt.toISOString(), 'Crib door'],
    ]);
  });

  test('refuses an action without both queue headers, and everything not on its list, with 403 STATION_SCOPE', async ({ qm, door, clock }) => {
    const tool = await addToolAs(qm, { name: 'Spacing fan', category: 'other' });
    const bin = await addBinAs(qm, blindRivetBin());
    const performedAt = new Date(clock.now.getTime() - MINUTE);
    await door.browser.replaySignIn(door.badge);

    const refusals = [
      await queued(door.browser, `/api/tools/${tool.code}/checkout`, {}, null, null),
      await queued(door.browser, `/api/tools/${tool.code}/checkout`, {}, 'station-queue-0020', null),
      await queued(door.browser, `/api/tools/${tool.code}/checkout`, {}, null, performedAt),
      await queued(door.browser, `/api/bins/${bin.code}/draw`, { quantity: 1 }, null, null),
      await door.browser.get('/api/users'),
      await door.browser.get(`/api/tools/${tool.code}`),
      await door.browser.get('/api/station/session'),
      await door.browser.get('/api/station/copy'),
      await door.browser.post(`/api/tools/${tool.code}/holds`),
      await door.browser.post('/api/station/sign-in', { badge: door.badge, pin: '4827' }),
    ];
    for (const res of refusals) {
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('STATION_SCOPE');
      expect(res.body.error.message).toContain('only sends the check outs, returns and draws queued at the station while it was offline');
    }
    expect((await qm.agent.get(`/api/tools/${tool.code}`).expect(200)).body.status).toBe('available');
    // A bad header value is the action's own 400, naming it.
    const bad = await queued(door.browser, `/api/tools/${tool.code}/checkout`, {}, 'station-queue-0021', null).set('X-Performed-At', 'yesterday');
    expect(bad.status).toBe(400);
    expect(bad.body.error).toMatchObject({ code: 'INVALID_HEADER', issues: [{ path: 'X-Performed-At' }] });
  });

  test('ends after 60 s without a request, and without its station token', async ({ door, advance, qm, clock }) => {
    const tool = await addToolAs(qm, { name: 'Temporary fastener pliers', category: 'other' });
    await door.browser.replaySignIn(door.badge);
    advance(61 * SECOND);
    const idle = await queued(door.browser, `/api/tools/${tool.code}/checkout`, {}, 'station-queue-0030', new Date(clock.now.getTime() - MINUTE));
    expect(idle.status).toBe(401);
    expect(idle.body.error.code).toBe('STATION_SESSION_ENDED');

    await door.browser.replaySignIn(door.badge);
    const noToken = await door.browser.agent.get('/api/auth/me');
    expect(noToken.status).toBe(401);
    expect(noToken.body.error.code).toBe('STATION_NOT_ENROLLED');
  });

  test('a normal station session may open a replay session for the next person', async ({ t, crew, door }) => {
    const leadBadge = await issueBadge(t, crew.lead.id, crew.quartermaster.id, '99887766');
    await door.browser.signIn(leadBadge, '99887766');
    const res = await door.browser.replaySignIn(door.badge);
    expect(res.status).toBe(200);
    expect(stationSessionSchema.parse(res.body).user.email).toBe('member@example.org');
    expect((await door.browser.get('/api/station/session')).body.error.code).toBe('STATION_SCOPE');
  });
});

describe('the ledger CSV', () => {
  test('names the station an entry was made at, and is empty for the rest', async ({ qm, door, clock }) => {
    const bin = await addBinAs(qm, blindRivetBin({ initialQuantity: 500 }));
    await door.browser.signIn(door.badge, '4827');
    await door.browser.post(`/api/bins/${bin.code}/draw`, { quantity: 20 }).expect(201);
    const day = clock.now.toISOString().slice(0, 10);
    const res = await qm.agent.get(`/api/bins/ledger.csv?from=${day}&to=${day}`).expect(200);
    const parsed = Papa.parse<Record<string, string>>(res.text.replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: true });
    expect(parsed.meta.fields?.at(-1)).toBe('station');
    expect(parsed.data.map((r) => [r.kind, r.station])).toEqual([
      ['receive', ''],
      ['draw', 'Crib door'],
    ]);
  });
});
