import 'fake-indexeddb/auto';
import { act, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { StationRoute } from '@/app/routes/station';
import { renderWithProviders } from '../helpers/render';
import { BADGE, fakeStationServer, keepTestStation, OTHER_BADGE, PIN, scanBadge, STATION_TOKEN, typePin } from '../helpers/station-screen';

beforeEach(keepTestStation);

afterEach(() => {
  vi.useRealTimers();
  localStorage.clear();
});

describe('the crib station', () => {
  it('says a device without a kept station is not one, with a way to sign in', async () => {
    localStorage.clear();
    fakeStationServer();
    renderWithProviders(<StationRoute />, '/station');
    expect(await screen.findByRole('heading', { name: 'This device is not a station' })).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Sign in' }).getAttribute('href')).toContain('/sign-in');
  });

  it('signs a person in with badge and PIN, sending the station token, and never shows the badge', async () => {
    const calls = fakeStationServer();
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    expect(await screen.findByRole('heading', { name: 'Scan your badge' })).toBeTruthy();
    await scanBadge(user, BADGE);
    await typePin(user, PIN);
    expect(await screen.findByRole('heading', { name: 'Hello, Marco Bellweather' })).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Scan a tool or bin' })).toBeTruthy();
    const signIn = calls.find((c) => c.path === '/api/station/sign-in')!;
    expect(signIn.body).toEqual({ badge: BADGE, pin: PIN });
    expect(signIn.headers['X-Station-Token']).toBe(STATION_TOKEN);
    expect(document.body.innerHTML).not.toContain(BADGE);
  });

  it('keeps the PIN step and says the server’s words after a wrong PIN', async () => {
    fakeStationServer();
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    await scanBadge(user, BADGE);
    await typePin(user, '1111');
    expect(await screen.findByText('That PIN is not right. 4 more tries before this badge is locked here.')).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Type your PIN' })).toBeTruthy();
    expect(screen.queryByText(/Hello,/)).toBeNull();
  });

  it('counts down in the last 10 seconds and goes back to the badge after a minute without a tap', async () => {
    vi.useFakeTimers({ shouldAdvanceTime: true });
    const calls = fakeStationServer();
    const user = userEvent.setup({ advanceTimers: (ms) => vi.advanceTimersByTime(ms) });
    renderWithProviders(<StationRoute />, '/station');
    await scanBadge(user, BADGE);
    await typePin(user, PIN);
    await screen.findByRole('heading', { name: 'Hello, Marco Bellweather' });

    await act(() => vi.advanceTimersByTimeAsync(45_000));
    expect(screen.queryByText(/Signing out in/)).toBeNull();
    await act(() => vi.advanceTimersByTimeAsync(5_000));
    expect(screen.getByText('Signing out in 10 s. Tap anywhere to stay.')).toBeTruthy();
    await act(() => vi.advanceTimersByTimeAsync(10_000));
    expect(await screen.findByRole('heading', { name: 'Scan your badge' })).toBeTruthy();
    expect(document.body.textContent).not.toContain('Marco');
    expect(calls.some((c) => c.path === '/api/station/done')).toBe(true);
  });

  it('starts the minute over on a tap, and tells the server so it does not end the session first', async () => {
    vi.useFakeTimers({ shouldAdvanceTime: true });
    const calls = fakeStationServer((call) => (call.path === '/api/auth/me' ? { status: 200, body: { id: 3, name: 'Marco Bellweather', email: 'marco@example.test', role: 'member' } } : undefined));
    const user = userEvent.setup({ advanceTimers: (ms) => vi.advanceTimersByTime(ms) });
    renderWithProviders(<StationRoute />, '/station');
    await scanBadge(user, BADGE);
    await typePin(user, PIN);
    await screen.findByRole('heading', { name: 'Hello, Marco Bellweather' });
    await act(() => vi.advanceTimersByTimeAsync(55_000));
    expect(screen.getByText(/Signing out in/)).toBeTruthy();
    await user.click(screen.getByRole('heading', { name: 'Scan a tool or bin' }));
    await act(() => vi.advanceTimersByTimeAsync(1_000));
    expect(screen.queryByText(/Signing out in/)).toBeNull();
    const keptAlive = calls.filter((c) => c.path === '/api/auth/me');
    expect(keptAlive).toHaveLength(1);
    expect(keptAlive[0]!.headers['X-Station-Token']).toBe(STATION_TOKEN);
    await act(() => vi.advanceTimersByTimeAsync(30_000));
    expect(screen.getByRole('heading', { name: 'Hello, Marco Bellweather' })).toBeTruthy();
  });

  it('Done ends the session and leaves nothing of the person on screen or in the cache', async () => {
    const calls = fakeStationServer();
    const user = userEvent.setup();
    const { queryClient } = renderWithProviders(<StationRoute />, '/station');
    await scanBadge(user, BADGE);
    await typePin(user, PIN);
    await screen.findByRole('heading', { name: 'Hello, Marco Bellweather' });
    await user.click(screen.getByRole('button', { name: 'Done' }));
    expect(await screen.findByRole('heading', { name: 'Scan your badge' })).toBeTruthy();
    expect(document.body.textContent).not.toContain('Marco Bellweather');
    expect(queryClient.getQueryCache().getAll()).toEqual([]);
    expect(calls.filter((c) => c.path === '/api/station/done')).toHaveLength(1);
  });

  it('a new badge scanned while someone is signed in ends their session and asks for the new PIN', async () => {
    const calls = fakeStationServer();
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    await scanBadge(user, BADGE);
    await typePin(user, PIN);
    await screen.findByRole('heading', { name: 'Hello, Marco Bellweather' });
    await user.type(screen.getByLabelText('Scanner, or type a tool or bin code'), `${OTHER_BADGE}{Enter}`);
    expect(await screen.findByRole('heading', { name: 'Type your PIN' })).toBeTruthy();
    expect(document.body.textContent).not.toContain('Marco');
    expect(calls.some((c) => c.path === '/api/station/done')).toBe(true);
    await typePin(user, PIN);
    expect(await screen.findByRole('heading', { name: 'Hello, Ines Okafor' })).toBeTruthy();
  });

  it('keeps the person signed in when their own badge is read again (held up to the camera while they typed the PIN)', async () => {
    const calls = fakeStationServer();
    const user = userEvent.setup();
    renderWithProviders(<StationRoute />, '/station');
    await scanBadge(user, BADGE);
    await typePin(user, PIN);
    await screen.findByRole('heading', { name: 'Hello, Marco Bellweather' });
    await user.type(screen.getByLabelText('Scanner, or type a tool or bin code'), `${BADGE}{Enter}`);
    expect(screen.getByRole('heading', { name: 'Hello, Marco Bellweather' })).toBeTruthy();
    expect(screen.queryByRole('heading', { name: 'Type your PIN' })).toBeNull();
    expect(calls.some((c) => c.path === '/api/station/done')).toBe(false);
  });

  it('starts a person’s session with nothing cached from whoever used the browser before', async () => {
    fakeStationServer();
    const user = userEvent.setup();
    const { queryClient } = renderWithProviders(<StationRoute />, '/station');
    // The quartermaster who enrolled this tablet was signed in on it a moment ago.
    queryClient.setQueryData(['auth', 'me'], { id: 1, name: 'Ruth Calloway', email: 'ruth@example.test', role: 'quartermaster' });
    await scanBadge(user, BADGE);
    await typePin(user, PIN);
    await screen.findByRole('heading', { name: 'Hello, Marco Bellweather' });
    expect(queryClient.getQueryData(['auth', 'me'])).toBeUndefined();
  });
});
