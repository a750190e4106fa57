import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it } from 'vitest';
import type { Station } from '@shared/schemas/stations';
import { readKeptStation } from '@/features/stations/api/kept-station';
import { EnrolStationForm } from '@/features/stations/components/enrol-station-form';
import { StationList } from '@/features/stations/components/station-list';
import { fakeFetch, renderRoutes, renderWithProviders, testQueryClient } from '../helpers/render';

afterEach(() => localStorage.clear());

const door: Station = { id: 4, name: 'Crib door tablet', enrolledAt: '2026-12-01T09:00:00.000Z', enrolledBy: 'Ruth Calloway', revokedAt: null };

describe('the Stations page', () => {
  it('enrols this device: it keeps the token and opens the station', async () => {
    const calls = fakeFetch((call) =>
      call.path === '/api/stations' ? { status: 201, body: { id: 4, name: 'Crib door tablet', stationToken: 'stn-new' } } : { status: 200, body: { token: 'csrf' } },
    );
    const router = renderRoutes(testQueryClient(), [
      { path: '/stations', element: <EnrolStationForm /> },
      { path: '/station', element: <p>station screen</p> },
    ], '/stations');
    expect(screen.getByText(/anyone standing at it can sign in with their badge and PIN/)).toBeTruthy();
    await userEvent.type(screen.getByLabelText('Station name'), 'Crib door tablet');
    await userEvent.click(screen.getByRole('button', { name: 'Use this device as a station' }));
    expect(await screen.findByText('station screen')).toBeTruthy();
    expect(router.state.location.pathname).toBe('/station');
    expect(readKeptStation()).toEqual({ token: 'stn-new', id: 4, name: 'Crib door tablet' });
    expect(calls.find((c) => c.path === '/api/stations')?.body).toEqual({ name: 'Crib door tablet' });
  });

  it('refuses an empty name before sending', async () => {
    const calls = fakeFetch(() => ({ status: 200, body: { token: 'csrf' } }));
    renderWithProviders(<EnrolStationForm />);
    await userEvent.click(screen.getByRole('button', { name: 'Use this device as a station' }));
    expect(await screen.findByText('Give the station a name.')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toEqual([]);
    expect(readKeptStation()).toBeUndefined();
  });

  it('revokes a station only after a confirm', async () => {
    const calls = fakeFetch((call) => (call.path === '/api/stations/4/revoke' ? { status: 200, body: { ...door, revokedAt: '2026-12-03T10:00:00.000Z' } } : { status: 200, body: { token: 'csrf' } }));
    renderWithProviders(<StationList stations={[door, { ...door, id: 5, name: 'Old bench tablet', revokedAt: '2026-11-20T10:00:00.000Z' }]} />);
    expect(screen.getAllByText(/by Ruth Calloway/)).toHaveLength(2);
    expect(screen.getByText(/revoked/)).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Revoke Old bench tablet' })).toBeNull();
    await userEvent.click(screen.getByRole('button', { name: 'Revoke Crib door tablet' }));
    expect(calls.filter((c) => c.method === 'POST')).toEqual([]);
    await userEvent.click(screen.getByRole('button', { name: 'Confirm revoke Crib door tablet' }));
    await screen.findByRole('button', { name: 'Revoke Crib door tablet' });
    expect(calls.filter((c) => c.path === '/api/stations/4/revoke')).toHaveLength(1);
  });
});
