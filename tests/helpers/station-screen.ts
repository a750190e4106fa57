// The station keeps its copy and queue in IndexedDB.
import 'fake-indexeddb/auto';
import { screen } from '@testing-library/react';
import type userEvent from '@testing-library/user-event';
import type { StationSession } from '@shared/schemas/stations';
import { KEPT_STATION_KEY } from '@/features/stations/api/kept-station';
import { fakeFetch, type FakeCall } from './render';

/** The station screen's side of the contract, for client tests with a fake API. */
/** Badge tokens as printed: 43 characters of base64url (invented). */
export const BADGE = 'Qm7xL2pV9cTz4RkW8nYb1HsD6fJq3GaE5uXo0iNwKtM';
export const OTHER_BADGE = 'Zr4Kw81cPe6TnB2vYx9LqH3sMd7GfU0jRa5oWiCk_-A';
export const PIN = '2468';
export const STATION_TOKEN = 'stn-token-1';

type User = ReturnType<typeof userEvent.setup>;

export function keepTestStation(): void {
  localStorage.setItem(KEPT_STATION_KEY, JSON.stringify({ token: STATION_TOKEN, id: 4, name: 'Crib door tablet' }));
}

export const stationSession = (name: string, id: number): StationSession => ({
  user: { id, name, email: `${name.split(' ')[0]!.toLowerCase()}@example.test`, role: 'member' },
  station: { id: 4, name: 'Crib door tablet' },
  idleSeconds: 60,
});

/**
 * A fake server: the right badge and PIN sign in, a wrong PIN is refused in words; `more` answers
 * anything else (a tool opened at the station).
 */
export function fakeStationServer(more: (call: FakeCall) => { status: number; body?: unknown } | undefined = () => undefined) {
  return fakeFetch((call: FakeCall) => {
    if (call.path === '/api/auth/csrf') return { status: 200, body: { token: 'csrf' } };
    if (call.path === '/api/station/done') return { status: 204 };
    if (call.path === '/api/station/sign-in') {
      const { badge, pin } = call.body as { badge: string; pin: string };
      if (pin !== PIN) return { status: 401, body: { error: { code: 'WRONG_PIN', message: 'That PIN is not right. 4 more tries before this badge is locked here.' } } };
      if (badge === BADGE) return { status: 200, body: stationSession('Marco Bellweather', 3) };
      if (badge === OTHER_BADGE) return { status: 200, body: stationSession('Ines Okafor', 5) };
    }
    return more(call);
  });
}

export async function scanBadge(user: User, badge: string) {
  await user.type(await screen.findByLabelText('Badge scanner'), `${badge}{Enter}`);
}

export async function typePin(user: User, pin: string) {
  await screen.findByRole('heading', { name: 'Type your PIN' });
  for (const digit of pin) await user.click(screen.getByRole('button', { name: digit }));
  await user.click(screen.getByRole('button', { name: 'OK' }));
}

/** Badge, PIN, and waits for the greeting. */
export async function signInAtStation(user: User, badge = BADGE) {
  await scanBadge(user, badge);
  await typePin(user, PIN);
  await screen.findByRole('heading', { name: /^Hello, / });
}
