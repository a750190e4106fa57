import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it } from 'vitest';
import type { Person } from '@shared/schemas/people';
import { PeopleTable } from '@/features/people/components/people-table';
import { StationPinCard } from '@/features/auth/components/station-pin-card';
import { setCsrfToken } from '@/lib/api-client';
import { fakeFetch, renderWithProviders } from '../helpers/render';

const person = (id: number, name: string, station: { hasBadge: boolean; hasPin: boolean }): Person => ({
  id,
  name,
  email: `${name.split(' ')[0]!.toLowerCase()}@example.org`,
  role: 'member',
  active: true,
  createdAt: '2026-03-01T00:00:00.000Z',
  deactivatedAt: null,
  ...station,
});

const rowOf = (name: string) => screen.getAllByRole('row').find((r) => r.textContent?.includes(name))!;

beforeEach(() => setCsrfToken('tok'));

describe('People: badge and PIN', () => {
  it('shows who has a badge and a PIN set, and leads to Labels to print a badge', () => {
    renderWithProviders(<PeopleTable people={[person(2, 'Mia Member', { hasBadge: true, hasPin: true }), person(3, 'Otto Other', { hasBadge: false, hasPin: false })]} selfId={1} />);
    const mia = rowOf('Mia Member');
    expect(within(mia).getByText('Badge')).toBeTruthy();
    expect(within(mia).getByText('PIN set')).toBeTruthy();
    const otto = rowOf('Otto Other');
    expect(within(otto).getByText('No badge')).toBeTruthy();
    expect(within(otto).getByText('No PIN')).toBeTruthy();
    expect(within(otto).getByRole('link', { name: 'Print badge for Otto Other' }).getAttribute('href')).toBe('/labels?person=3');
  });

  it('a lead clears a PIN after confirming', async () => {
    const calls = fakeFetch((call) => (call.method === 'DELETE' && call.path === '/api/users/2/pin' ? { status: 204 } : undefined));
    renderWithProviders(<PeopleTable people={[person(2, 'Mia Member', { hasBadge: false, hasPin: true })]} selfId={1} />);
    const mia = rowOf('Mia Member');
    await userEvent.click(within(mia).getByRole('button', { name: 'Clear PIN' }));
    expect(calls.some((c) => c.method === 'DELETE')).toBe(false);
    await userEvent.click(within(mia).getByRole('button', { name: 'Confirm clear PIN' }));
    await waitFor(() => expect(calls.some((c) => c.method === 'DELETE' && c.path === '/api/users/2/pin')).toBe(true));
  });
});

describe('Station PIN card', () => {
  it('sets a PIN of 4 to 8 digits on a numeric keypad, autocomplete off', async () => {
    const calls = fakeFetch((call) => (call.method === 'PUT' && call.path === '/api/me/pin' ? { status: 204 } : undefined));
    renderWithProviders(<StationPinCard />);
    const field = screen.getByLabelText('New PIN');
    expect(field.getAttribute('inputmode')).toBe('numeric');
    expect(field.getAttribute('autocomplete')).toBe('off');
    await userEvent.type(field, '12a');
    await userEvent.click(screen.getByRole('button', { name: 'Save PIN' }));
    expect(await screen.findByText('A PIN is 4 to 8 digits.')).toBeTruthy();
    expect(calls.some((c) => c.path === '/api/me/pin')).toBe(false);
    await userEvent.clear(field);
    await userEvent.type(field, '482193');
    await userEvent.click(screen.getByRole('button', { name: 'Save PIN' }));
    await waitFor(() => expect(calls.find((c) => c.path === '/api/me/pin')?.body).toEqual({ pin: '482193' }));
  });
});
