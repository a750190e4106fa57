import 'fake-indexeddb/auto';
import { act, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { IDEMPOTENCY_KEY_HEADER, PERFORMED_AT_HEADER } from '@shared/schemas/offline';
import type { StationCopy, StationCopyPerson } from '@shared/schemas/stations';
import { stationSignInWords } from '@shared/stations/station-sign-in-rules';
import { StationRoute } from '@/app/routes/station';
import { SAME_LABEL_QUIET_MS } from '@/app/routes/station/just-left';
import { enqueue, refusedOf, waitingOf, type NewQueuedAction } from '@/features/offline/api/queue';
import { stationRefusedOf, stationWaitingOf } from '@/features/offline/api/station-queue';
import { offlineDb } from '@/features/offline/db';
import { readKeptStation } from '@/features/stations/api/kept-station';
import { NOT_A_BADGE } from '@/features/stations/hooks/station-steps';
import { renderWithProviders, type FakeCall } from '../helpers/render';
import { copyPerson, stationCopyFixture } from '../helpers/station-copy-fixture';
import { BADGE, fakeStationServer, keepTestStation, OTHER_BADGE, PIN, scanBadge, STATION_TOKEN, stationSession, typePin } from '../helpers/station-screen';

// The camera is the tools' component; here it hands over what a QR code would say.
const camera = vi.hoisted(() => ({ read: undefined as undefined | ((code: string) => void) }));
vi.mock('@/features/tools/components/camera-scanner', () => ({
  CameraScanner: ({ onCode }: { onCode: (code: string) => void }) => {
    camera.read = onCode;
    return null;
  },
}));

const STATION_ID = 4;
/** A third person's badge, with no PIN set; and a badge of the right shape the station has never seen. */
const OTTO_BADGE = 'Ot7oB4dg3X9kLm2Qw8Er5Ty1Ui6Op0As4Df7Gh2JkLz';
const NEW_BADGE = 'Nw3Bd9Xq2Lm7Kp4Rt8Ys1Vu6Wz0Ac5Be3Cf9Dg2EhJk';
const SLOW = { timeout: 15_000 };

let marco: StationCopyPerson;
let ines: StationCopyPerson;
let otto: StationCopyPerson;

beforeAll(async () => {
  marco = await copyPerson(3, 'Marco Bellweather', BADGE, PIN, { drawn: { 'B-0107': 12 }, loans: [] });
  ines = await copyPerson(5, 'Ines Okafor', OTHER_BADGE, PIN);
  otto = await copyPerson(6, 'Otto Renfield', OTTO_BADGE, null);
});

let copy: StationCopy;

beforeEach(async () => {
  keepTestStation();
  await Promise.all([offlineDb.actions.clear(), offlineDb.stationCopies.clear(), offlineDb.stationPinFailures.clear(), offlineDb.catalogues.clear()]);
  copy = stationCopyFixture([marco, ines, otto]);
  // A test before may have left the server "not answering".
  window.dispatchEvent(new Event('online'));
});

afterEach(() => {
  localStorage.clear();
});

const keepCopy = () => offlineDb.stationCopies.put({ stationId: STATION_ID, copy });

/** No network: the browser says so and every request fails as fetch does then. */
function noNetwork() {
  vi.spyOn(navigator, 'onLine', 'get').mockReturnValue(false);
  const fetchSpy = vi.fn(() => Promise.reject(new TypeError('Failed to fetch')));
  vi.stubGlobal('fetch', fetchSpy);
  return fetchSpy;
}

const serveCopy = (more: (call: FakeCall) => { status: number; body?: unknown } | undefined = () => undefined) =>
  fakeStationServer((call) => (call.path === '/api/station/copy' ? { status: 200, body: copy } : more(call)));

const stationEntry = (who: StationCopyPerson, badge: string, action: Omit<NewQueuedAction, 'memberId' | 'catalogueAt' | 'station'>): NewQueuedAction => ({
  ...action,
  memberId: who.id,
  catalogueAt: copy.takenAt,
  station: { stationId: STATION_ID, badge, personName: who.name },
});

/** The station with its copy and no network, Marco signed in there by badge and PIN. */
async function marcoSignedInOffline() {
  await keepCopy();
  noNetwork();
  const user = userEvent.setup();
  renderWithProviders(<StationRoute />, '/station');
  await scanBadge(user, BADGE);
  await typePin(user, PIN);
  await screen.findByRole('heading', { name: 'Hello, Marco Bellweather' }, SLOW);
  return user;
}

const copyReady = () => screen.findByText(/^Ready without the network/);

describe('the badge screen refuses what is not a badge at once', () => {
  it('from the scanner field: not a Gripline badge, no PIN step, nothing sent', async () => {
    const calls = fakeStationServer();
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    await scanBadge(user, 'WIFI:S:crib-guest;T:WPA;P:hangar42;;');
    expect((await screen.findByRole('alert')).textContent).toBe(NOT_A_BADGE);
    expect(screen.getByRole('heading', { name: 'Scan your badge' })).toBeTruthy();
    expect(screen.queryByRole('heading', { name: 'Type your PIN' })).toBeNull();
    expect(calls.filter((c) => c.path === '/api/station/sign-in')).toEqual([]);
  });

  it('from the camera: a stranger’s QR code gets the same words', async () => {
    const calls = fakeStationServer();
    renderWithProviders(<StationRoute />, '/station');
    await screen.findByRole('heading', { name: 'Scan your badge' });
    act(() => camera.read!('https://example.org/menu?table=4'));
    expect((await screen.findByRole('alert')).textContent).toBe(NOT_A_BADGE);
    expect(screen.queryByRole('heading', { name: 'Type your PIN' })).toBeNull();
    // A badge's shape from the camera goes on to the PIN.
    act(() => camera.read!(BADGE));
    expect(await screen.findByRole('heading', { name: 'Type your PIN' })).toBeTruthy();
    expect(calls.filter((c) => c.path === '/api/station/sign-in')).toEqual([]);
  });
});

describe('a scan while someone is signed in', () => {
  it('says a code of no label or badge is not ours, and keeps the person signed in', async () => {
    const calls = fakeStationServer();
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    await scanBadge(user, BADGE);
    await typePin(user, PIN);
    await screen.findByRole('heading', { name: 'Hello, Marco Bellweather' });
    await user.type(screen.getByLabelText('Scanner, or type a tool or bin code'), 'lunch-menu{Enter}');
    expect(await screen.findByText('That code is not a Gripline label or badge. Scan a tool or bin label.')).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Hello, Marco Bellweather' })).toBeTruthy();
    expect(calls.some((c) => c.path === '/api/station/done')).toBe(false);
  });
});

describe('the PIN pad and a USB keypad', () => {
  it('takes digits, Backspace and Enter from the keyboard as from the buttons', async () => {
    const calls = fakeStationServer();
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    await scanBadge(user, BADGE);
    await screen.findByRole('heading', { name: 'Type your PIN' });
    await user.keyboard('24689');
    expect(screen.getByText('5 of 4 to 8 digits typed')).toBeTruthy();
    await user.keyboard('{Backspace}{Enter}');
    expect(await screen.findByRole('heading', { name: 'Hello, Marco Bellweather' })).toBeTruthy();
    expect(calls.find((c) => c.path === '/api/station/sign-in')?.body).toEqual({ badge: BADGE, pin: PIN });
  });

  it('leaves Enter on the Cancel button to that button', async () => {
    const calls = fakeStationServer();
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    await scanBadge(user, BADGE);
    await screen.findByRole('heading', { name: 'Type your PIN' });
    await user.keyboard('2468');
    act(() => screen.getByRole('button', { name: 'Cancel' }).focus());
    await user.keyboard('{Enter}');
    expect(await screen.findByRole('heading', { name: 'Scan your badge' })).toBeTruthy();
    expect(calls.filter((c) => c.path === '/api/station/sign-in')).toEqual([]);
  });

  it('does not send fewer than 4 digits on Enter', async () => {
    const calls = fakeStationServer();
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    await scanBadge(user, BADGE);
    await screen.findByRole('heading', { name: 'Type your PIN' });
    await user.keyboard('246{Enter}');
    expect(screen.getByText('3 of 4 to 8 digits typed')).toBeTruthy();
    expect(calls.filter((c) => c.path === '/api/station/sign-in')).toEqual([]);
  });
});

describe('the station’s copy', () => {
  it('is taken when the station opens (with its token), kept under the station, and greets a badge’s holder by name', async () => {
    const calls = serveCopy();
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    await copyReady();
    const stored = await offlineDb.stationCopies.get(STATION_ID);
    expect(stored?.copy.people.map((p) => p.name)).toEqual(['Marco Bellweather', 'Ines Okafor', 'Otto Renfield']);
    expect(calls.find((c) => c.path === '/api/station/copy')?.headers['X-Station-Token']).toBe(STATION_TOKEN);

    await scanBadge(user, BADGE);
    expect(await screen.findByText('Hello, Marco Bellweather.')).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Type your PIN' })).toBeTruthy();
  });

  it('refuses at once a badge it does not know, after taking a fresh copy once (it may be newly printed)', async () => {
    const calls = serveCopy();
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    await copyReady();
    await scanBadge(user, NEW_BADGE);
    expect((await screen.findByRole('alert')).textContent).toBe(stationSignInWords.badgeNotRecognised);
    expect(screen.queryByRole('heading', { name: 'Type your PIN' })).toBeNull();
    expect(calls.filter((c) => c.path === '/api/station/copy')).toHaveLength(2);
    expect(calls.filter((c) => c.path === '/api/station/sign-in')).toEqual([]);
  });

  it('takes the badge of someone in the fresh copy though not in the one kept', async () => {
    await offlineDb.stationCopies.put({ stationId: STATION_ID, copy: stationCopyFixture([marco]) });
    serveCopy();
    const user = userEvent.setup();
    // The kept copy (Marco only) shows first; the one served has Ines too.
    renderWithProviders(<StationRoute />, '/station');
    await copyReady();
    await scanBadge(user, OTHER_BADGE);
    expect(await screen.findByText('Hello, Ines Okafor.')).toBeTruthy();
  });

  it('is taken again after a session ends', async () => {
    const calls = serveCopy();
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    await copyReady();
    await scanBadge(user, BADGE);
    await typePin(user, PIN);
    await screen.findByRole('heading', { name: 'Hello, Marco Bellweather' });
    const before = calls.filter((c) => c.path === '/api/station/copy').length;
    await user.click(screen.getByRole('button', { name: 'Done' }));
    await waitFor(() => expect(calls.filter((c) => c.path === '/api/station/copy')).toHaveLength(before + 1));
    // The session was ended before the copy was asked for, so it is not asked under the person's session.
    const paths = calls.map((c) => c.path);
    expect(paths.lastIndexOf('/api/station/done')).toBeLessThan(paths.lastIndexOf('/api/station/copy'));
  });

  it('is deleted, with the station, when the server says the station is not enrolled', async () => {
    await keepCopy();
    fakeStationServer((call) => (call.path === '/api/station/copy' ? { status: 401, body: { error: { code: 'STATION_NOT_ENROLLED', message: 'Revoked.' } } } : undefined));
    renderWithProviders(<StationRoute />, '/station');
    expect(await screen.findByRole('heading', { name: 'This device is not a station' })).toBeTruthy();
    await waitFor(async () => expect(await offlineDb.stationCopies.get(STATION_ID)).toBeUndefined());
    expect(readKeptStation()).toBeUndefined();
  });
});

describe('a station without the network, with its copy', () => {
  it('signs a person in by badge and PIN against the copy, and says what happens to what they do', async () => {
    await keepCopy();
    const fetchSpy = noNetwork();
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    await scanBadge(user, BADGE);
    expect(await screen.findByText('Hello, Marco Bellweather.')).toBeTruthy();
    await typePin(user, PIN);
    expect(await screen.findByRole('heading', { name: 'Hello, Marco Bellweather' }, SLOW)).toBeTruthy();
    expect(screen.getByText('No connection: what you do here is sent when it is back.')).toBeTruthy();
    expect(fetchSpy).not.toHaveBeenCalled();
    expect(document.body.innerHTML).not.toContain(BADGE);
  });

  it('says the tries left after a wrong PIN, locks the badge after 5, and keeps the lock through a reload', async () => {
    await keepCopy();
    noNetwork();
    const user = userEvent.setup();
    const first = renderWithProviders(<StationRoute />, '/station');
    await scanBadge(user, BADGE);
    for (let left = 4; left >= 1; left--) {
      await typePin(user, '1111');
      expect(await screen.findByText(stationSignInWords.wrongPin(left), undefined, SLOW)).toBeTruthy();
    }
    expect(screen.getByText('That PIN is not right: 1 try left before this badge is locked here for 15 minutes.')).toBeTruthy();
    await typePin(user, '1111');
    expect(await screen.findByText('Too many wrong PINs: this badge is locked at this station for 15 minutes.', undefined, SLOW)).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Scan your badge' })).toBeTruthy();

    first.unmount();
    renderWithProviders(<StationRoute />, '/station');
    await scanBadge(user, BADGE);
    await typePin(user, PIN);
    expect(await screen.findByText('Too many wrong PINs: this badge is locked at this station for 15 minutes.', undefined, SLOW)).toBeTruthy();
    expect(screen.queryByRole('heading', { name: /^Hello, / })).toBeNull();

    // Only that badge, only here: Ines signs in.
    await scanBadge(user, OTHER_BADGE);
    await typePin(user, PIN);
    expect(await screen.findByRole('heading', { name: 'Hello, Ines Okafor' }, SLOW)).toBeTruthy();
  });

  it('sends someone without a PIN to their phone in the same words as online', async () => {
    await keepCopy();
    noNetwork();
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    await scanBadge(user, OTTO_BADGE);
    await typePin(user, '1234');
    expect(await screen.findByText('You have no PIN yet. Set one on your profile on your own phone, then scan your badge here again.')).toBeTruthy();
  });

  it('refuses at once a badge the copy does not know', async () => {
    await keepCopy();
    noNetwork();
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    await scanBadge(user, NEW_BADGE);
    expect((await screen.findByRole('alert')).textContent).toBe(stationSignInWords.badgeNotRecognised);
    expect(screen.queryByRole('heading', { name: 'Type your PIN' })).toBeNull();
  });

  it('checks against the copy when the sign-in gets no answer', async () => {
    serveCopy();
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    await copyReady();
    await scanBadge(user, BADGE);
    await screen.findByRole('heading', { name: 'Type your PIN' });
    // The Wi-Fi drops as the PIN is sent.
    vi.stubGlobal('fetch', vi.fn(() => Promise.reject(new TypeError('Failed to fetch'))));
    await typePin(user, PIN);
    expect(await screen.findByRole('heading', { name: 'Hello, Marco Bellweather' }, SLOW)).toBeTruthy();
    expect(screen.getByText('No connection: what you do here is sent when it is back.')).toBeTruthy();
  });

  it('queues a check out with the person, their badge and the station; the phone’s queue does not list it', async () => {
    const user = await marcoSignedInOffline();
    await user.type(screen.getByLabelText('Scanner, or type a tool or bin code'), 'T-0042{Enter}');
    await user.click(await screen.findByRole('button', { name: 'Check out T-0042' }));

    await waitFor(async () => expect(await stationWaitingOf(STATION_ID)).toHaveLength(1));
    const [entry] = await stationWaitingOf(STATION_ID);
    expect(entry).toMatchObject({ memberId: marco.id, kind: 'check_out', code: 'T-0042', station: { stationId: STATION_ID, badge: BADGE, personName: 'Marco Bellweather' } });
    expect(await waitingOf(marco.id)).toEqual([]);
    expect(await refusedOf(marco.id)).toEqual([]);
  });

  it('opens a scanned tool under the station’s greeting, in the station’s words, leaving the tab’s title alone', async () => {
    const user = await marcoSignedInOffline();
    const title = document.title;
    await user.type(screen.getByLabelText('Scanner, or type a tool or bin code'), 'T-0042{Enter}');
    await screen.findByRole('button', { name: 'Check out T-0042' });
    expect(screen.getByText(/What you do here waits on this station and is sent when the connection is back\./)).toBeTruthy();
    expect(screen.queryByText(/this phone/)).toBeNull();
    expect(screen.getAllByRole('heading', { level: 1 }).map((h) => h.textContent)).toEqual(['Hello, Marco Bellweather']);
    expect(document.title).toBe(title);
  });

  it('takes the label still in front of the camera after a checkout for that, not for a new scan; typed, the code opens at once', async () => {
    const user = await marcoSignedInOffline();
    // An item is open when its "Scan a tool or bin" way back is on screen instead of the scan list.
    const itemOpen = () => screen.queryByRole('button', { name: 'Scan a tool or bin' }) !== null;
    await user.type(screen.getByLabelText('Scanner, or type a tool or bin code'), 'T-0042{Enter}');
    await user.click(await screen.findByRole('button', { name: 'Check out T-0042' }));
    const waiting = await screen.findByText(/^Waiting to send: T-0042\./, undefined, SLOW);

    // The scan list's camera starts afresh and reads the label the member still holds up.
    act(() => camera.read!('T-0042'));
    expect(itemOpen()).toBe(false);
    expect(waiting.isConnected).toBe(true);

    // Shown again once the moment has passed, it opens.
    const later = Date.now() + SAME_LABEL_QUIET_MS;
    vi.spyOn(Date, 'now').mockReturnValue(later);
    act(() => camera.read!('T-0042'));
    await waitFor(() => expect(itemOpen()).toBe(true));
    vi.mocked(Date.now).mockRestore();

    // Left with "Scan a tool or bin", the same holds; typed, it opens at once.
    await user.click(screen.getByRole('button', { name: 'Scan a tool or bin' }));
    act(() => camera.read!('T-0042'));
    expect(itemOpen()).toBe(false);
    await user.type(screen.getByLabelText('Scanner, or type a tool or bin code'), 'T-0042{Enter}');
    await waitFor(() => expect(itemOpen()).toBe(true));
  });

  it('offers return unused up to what the person drew by the copy', async () => {
    const user = await marcoSignedInOffline();
    await user.type(screen.getByLabelText('Scanner, or type a tool or bin code'), 'B-0107{Enter}');
    await user.click(await screen.findByRole('radio', { name: 'Return unused' }));
    expect(screen.getByText('You drew 12 each and have not returned them.')).toBeTruthy();
  });

  it('takes the next badge as online: the person goes, the next one’s PIN is asked', async () => {
    const user = await marcoSignedInOffline();
    await user.type(screen.getByLabelText('Scanner, or type a tool or bin code'), `${OTHER_BADGE}{Enter}`);
    expect(await screen.findByText('Hello, Ines Okafor.')).toBeTruthy();
    expect(document.body.textContent).not.toContain('Marco');
    await typePin(user, PIN);
    expect(await screen.findByRole('heading', { name: 'Hello, Ines Okafor' }, SLOW)).toBeTruthy();
  });

  it('after Done, takes the badge still in front of the camera for that, not for signing in again', async () => {
    const user = await marcoSignedInOffline();
    await user.click(screen.getByRole('button', { name: 'Done' }));
    await screen.findByRole('heading', { name: 'Scan your badge' });

    // The badge screen's camera starts afresh and reads the badge the member still holds.
    act(() => camera.read!(BADGE));
    // The badge is checked against the copy by hashing (asynchronous): give that its time before saying no.
    await expect(screen.findByRole('heading', { name: 'Type your PIN' }, { timeout: 1_500 })).rejects.toThrow();
    expect(document.body.textContent).not.toContain('Marco');

    // Shown again once the moment has passed, it asks for the PIN.
    const later = Date.now() + SAME_LABEL_QUIET_MS;
    vi.spyOn(Date, 'now').mockReturnValue(later);
    act(() => camera.read!(BADGE));
    expect(await screen.findByRole('heading', { name: 'Type your PIN' })).toBeTruthy();
    vi.mocked(Date.now).mockRestore();
  });

  it('after Done, a badge typed into the badge scanner is taken at once', async () => {
    const user = await marcoSignedInOffline();
    await user.click(screen.getByRole('button', { name: 'Done' }));
    await screen.findByRole('heading', { name: 'Scan your badge' });
    await scanBadge(user, BADGE);
    expect(await screen.findByRole('heading', { name: 'Type your PIN' })).toBeTruthy();
  });

  it('Done ends an offline session as online, with nothing sent', async () => {
    await keepCopy();
    const fetchSpy = noNetwork();
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    await scanBadge(user, BADGE);
    await typePin(user, PIN);
    await screen.findByRole('heading', { name: 'Hello, Marco Bellweather' }, SLOW);
    await user.click(screen.getByRole('button', { name: 'Done' }));
    expect(await screen.findByRole('heading', { name: 'Scan your badge' })).toBeTruthy();
    expect(document.body.textContent).not.toContain('Marco');
    expect(fetchSpy).not.toHaveBeenCalled();
  });

  it('counts down and ends an offline session after the idle minute, as online', async () => {
    vi.useFakeTimers({ shouldAdvanceTime: true });
    try {
      await keepCopy();
      noNetwork();
      const user = userEvent.setup({ advanceTimers: (ms) => vi.advanceTimersByTime(ms) });
      renderWithProviders(<StationRoute />, '/station');
      await scanBadge(user, OTHER_BADGE);
      await typePin(user, PIN);
      await screen.findByRole('heading', { name: 'Hello, Ines Okafor' }, SLOW);
      await act(() => vi.advanceTimersByTimeAsync(50_000));
      expect(screen.getByText('Signing out in 10 s. Tap anywhere to stay.')).toBeTruthy();
      await act(() => vi.advanceTimersByTimeAsync(10_000));
      expect(await screen.findByText('Signed out after a minute without a scan or tap.')).toBeTruthy();
      expect(document.body.textContent).not.toContain('Ines');
    } finally {
      vi.useRealTimers();
    }
  });

  it('says how many actions wait to be sent', async () => {
    await keepCopy();
    await enqueue(stationEntry(marco, BADGE, { kind: 'check_out', code: 'T-0042', what: 'Fan', body: {} }));
    await enqueue(stationEntry(ines, OTHER_BADGE, { kind: 'draw', code: 'B-0107', what: 'Rivets', body: { quantity: 5 } }));
    noNetwork();
    renderWithProviders(<StationRoute />, '/station');
    expect(await screen.findByText('2 actions wait to be sent.')).toBeTruthy();
  });

  it('without a copy, still says it needs a connection', async () => {
    noNetwork();
    renderWithProviders(<StationRoute />, '/station');
    expect(await screen.findByRole('heading', { name: 'The station needs a connection' })).toBeTruthy();
  });
});

describe('sending what the station queued', () => {
  const posts = (calls: FakeCall[]) => calls.filter((c) => c.method === 'POST');

  it('signs each person in again by their badge, sends their actions in order with their keys, and ends the session at the end', async () => {
    await enqueue(stationEntry(marco, BADGE, { kind: 'check_out', code: 'T-0042', what: 'Fan', body: {} }));
    await enqueue(stationEntry(marco, BADGE, { kind: 'draw', code: 'B-0107', what: 'Rivets', body: { quantity: 5 } }));
    await enqueue(stationEntry(ines, OTHER_BADGE, { kind: 'check_out', code: 'T-0043', what: 'Drill', body: {} }));
    // Marco's own phone queue in the same browser: the station leaves it alone.
    await enqueue({ memberId: marco.id, kind: 'return', code: 'T-0050', what: 'Puller', body: { condition: 'ok' }, catalogueAt: copy.takenAt });
    const keys = (await stationWaitingOf(STATION_ID)).map((a) => a.key);
    const calls = serveCopy((call) => {
      if (call.path === '/api/station/replay-sign-in') return { status: 200, body: stationSession((call.body as { badge: string }).badge === BADGE ? 'Marco Bellweather' : 'Ines Okafor', 3) };
      if (call.method === 'POST') return { status: 201, body: {} };
      return undefined;
    });
    renderWithProviders(<StationRoute />, '/station');

    await waitFor(async () => expect(await stationWaitingOf(STATION_ID)).toEqual([]));
    await waitFor(() => expect(posts(calls).at(-1)?.path).toBe('/api/station/done'));
    expect(posts(calls).map((c) => c.path)).toEqual([
      '/api/station/replay-sign-in',
      '/api/tools/T-0042/checkout',
      '/api/bins/B-0107/draw',
      '/api/station/replay-sign-in',
      '/api/tools/T-0043/checkout',
      '/api/station/done',
    ]);
    const sent = posts(calls).filter((c) => !c.path.startsWith('/api/station/'));
    expect(posts(calls).filter((c) => c.path === '/api/station/replay-sign-in').map((c) => c.body)).toEqual([{ badge: BADGE }, { badge: OTHER_BADGE }]);
    expect(sent.map((c) => c.headers[IDEMPOTENCY_KEY_HEADER])).toEqual(keys);
    expect(sent.every((c) => c.headers[PERFORMED_AT_HEADER] && c.headers['X-Station-Token'] === STATION_TOKEN)).toBe(true);
    expect((await waitingOf(marco.id)).map((a) => a.code)).toEqual(['T-0050']);
  });

  it('puts a refusal on the Not sent list with who, what and the server’s sentence; Seen takes it off', async () => {
    await enqueue(stationEntry(marco, BADGE, { kind: 'check_out', code: 'T-0042', what: 'Rivet spacing fan', body: {} }));
    await enqueue(stationEntry(ines, OTHER_BADGE, { kind: 'draw', code: 'B-0107', what: 'Rivets', body: { quantity: 5 } }));
    await enqueue(stationEntry(marco, BADGE, { kind: 'check_out', code: 'T-0043', what: 'Air drill', body: {} }));
    const calls = serveCopy((call) => {
      if (call.path === '/api/station/replay-sign-in') {
        return (call.body as { badge: string }).badge === OTHER_BADGE
          ? { status: 401, body: { error: { code: 'BADGE_NOT_RECOGNISED', message: stationSignInWords.badgeNotRecognised } } }
          : { status: 200, body: stationSession('Marco Bellweather', 3) };
      }
      if (call.path === '/api/tools/T-0042/checkout') return { status: 409, body: { error: { code: 'TOOL_ON_LOAN', message: 'T-0042 is on loan: Ruth Calloway has it until Friday.' } } };
      if (call.method === 'POST') return { status: 201, body: {} };
      return undefined;
    });
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');

    const notSent = (await screen.findByRole('heading', { name: 'Not sent' })).closest('section')!;
    await waitFor(() => expect(within(notSent).getAllByRole('listitem')).toHaveLength(2));
    expect(within(notSent).getByText(/^Marco Bellweather: Check out T-0042/, { selector: 'p' })).toBeTruthy();
    expect(within(notSent).getByText('T-0042 is on loan: Ruth Calloway has it until Friday.')).toBeTruthy();
    expect(within(notSent).getByText(/^Ines Okafor: Draw 5 from B-0107/, { selector: 'p' })).toBeTruthy();
    expect(within(notSent).getByText(stationSignInWords.badgeNotRecognised)).toBeTruthy();
    // Marco's later action still went: a refusal is not a reason to stop.
    await waitFor(() => expect(posts(calls).map((c) => c.path)).toContain('/api/tools/T-0043/checkout'));
    expect(posts(calls).filter((c) => c.path === '/api/station/replay-sign-in').map((c) => c.body)).toEqual([{ badge: BADGE }, { badge: OTHER_BADGE }, { badge: BADGE }]);

    await user.click(within(notSent).getByRole('button', { name: 'Seen Marco Bellweather: Check out T-0042' }));
    await waitFor(async () => expect((await stationRefusedOf(STATION_ID)).map((a) => a.code)).toEqual(['B-0107']));
    await waitFor(() => expect(screen.queryByText('T-0042 is on loan: Ruth Calloway has it until Friday.')).toBeNull());
    expect(within(notSent).getAllByRole('listitem')).toHaveLength(1);
  });

  it('stops at an action the server cannot take now (503) and keeps it and the rest', async () => {
    await enqueue(stationEntry(marco, BADGE, { kind: 'check_out', code: 'T-0042', what: 'Fan', body: {} }));
    await enqueue(stationEntry(marco, BADGE, { kind: 'check_out', code: 'T-0043', what: 'Drill', body: {} }));
    const calls = serveCopy((call) => (call.path === '/api/station/replay-sign-in' ? { status: 200, body: stationSession('Marco Bellweather', 3) } : { status: 503, body: {} }));
    renderWithProviders(<StationRoute />, '/station');
    await waitFor(() => expect(posts(calls).at(-1)?.path).toBe('/api/station/done'));
    expect(posts(calls).map((c) => c.path)).toEqual(['/api/station/replay-sign-in', '/api/tools/T-0042/checkout', '/api/station/done']);
    expect((await stationWaitingOf(STATION_ID)).map((a) => a.code)).toEqual(['T-0042', 'T-0043']);
    expect(await stationRefusedOf(STATION_ID)).toEqual([]);
  });
});
