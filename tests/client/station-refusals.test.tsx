import 'fake-indexeddb/auto';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { StationRoute } from '@/app/routes/station';
import { readKeptStation } from '@/features/stations/api/kept-station';
import { afterRefusedSignIn } from '@/features/stations/hooks/station-steps';
import { ApiError } from '@/lib/api-client';
import { renderWithProviders, type FakeCall } from '../helpers/render';
import { fakeStationServer, keepTestStation, signInAtStation } from '../helpers/station-screen';

describe('what a refused station sign-in says', () => {
  it('says for how many minutes a locked badge stays locked, from the server’s Retry-After', () => {
    expect(afterRefusedSignIn(new ApiError(429, 'BADGE_LOCKED', 'Locked.', [], 14 * 60 + 5), 'b')).toEqual({
      kind: 'badge',
      notice: 'Too many wrong PINs: this badge is locked at this station for 15 minutes.',
    });
    expect(afterRefusedSignIn(new ApiError(429, 'BADGE_LOCKED', 'Locked.', [], 30), 'b')).toMatchObject({ notice: expect.stringContaining('for 1 minute.') });
  });

  it('sends someone without a PIN to their own phone, and keeps the PIN step only for a wrong PIN', () => {
    expect(afterRefusedSignIn(new ApiError(401, 'NO_PIN', 'No PIN.'), 'b')).toEqual({
      kind: 'badge',
      notice: 'You have no PIN yet. Set one on your profile on your own phone, then scan your badge here again.',
    });
    expect(afterRefusedSignIn(new ApiError(401, 'WRONG_PIN', '3 tries left.'), 'b')).toEqual({ kind: 'pin', badge: 'b', notice: '3 tries left.' });
    expect(afterRefusedSignIn(new ApiError(401, 'BADGE_NOT_RECOGNISED', 'That badge is not one of ours.'), 'b')).toEqual({ kind: 'badge', notice: 'That badge is not one of ours.' });
    expect(afterRefusedSignIn(new ApiError(401, 'STATION_NOT_ENROLLED', 'Revoked.'), 'b')).toBe('not-enrolled');
  });
});

afterEach(() => localStorage.clear());

/** The server's answer to a scanned tool: the session or the station is over. */
const refusedWith = (code: string) => (call: FakeCall) => (call.path.startsWith('/api/tools/') ? { status: 401, body: { error: { code, message: 'Refused.' } } } : undefined);

describe('when the server ends a station session', () => {
  it('goes back to the badge step with nothing of the person when a request says the session ended', async () => {
    keepTestStation();
    fakeStationServer(refusedWith('STATION_SESSION_ENDED'));
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    await signInAtStation(user);
    await user.type(screen.getByLabelText('Scanner, or type a tool or bin code'), 'T-0042{Enter}');
    expect(await screen.findByText('The station signed you out. Scan your badge to go on.')).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Scan your badge' })).toBeTruthy();
    expect(document.body.textContent).not.toContain('Marco');
  });

  it('forgets the station when the server says it was revoked', async () => {
    keepTestStation();
    fakeStationServer(refusedWith('STATION_NOT_ENROLLED'));
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    await signInAtStation(user);
    await user.type(screen.getByLabelText('Scanner, or type a tool or bin code'), 'T-0042{Enter}');
    expect(await screen.findByRole('heading', { name: 'This device is not a station' })).toBeTruthy();
    expect(readKeptStation()).toBeUndefined();
  });
});

describe('a station without a connection', () => {
  it('says it needs one instead of taking a badge (the offline queue is not used at the station)', async () => {
    keepTestStation();
    vi.spyOn(navigator, 'onLine', 'get').mockReturnValue(false);
    const calls = fakeStationServer();
    renderWithProviders(<StationRoute />, '/station');
    expect(await screen.findByRole('heading', { name: 'The station needs a connection' })).toBeTruthy();
    expect(screen.queryByLabelText('Badge scanner')).toBeNull();
    expect(calls).toEqual([]);
  });
});
