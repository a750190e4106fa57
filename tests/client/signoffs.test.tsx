import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it } from 'vitest';
import type { Signoff } from '@shared/schemas/signoffs';
import { setCsrfToken } from '@/lib/api-client';
import { HoldTimeCard } from '@/features/signoffs/components/hold-time-card';
import { TimeZoneCard } from '@/features/signoffs/components/time-zone-card';
import { chapterTimeZone } from '@/lib/chapter-zone';
import { MySignoffs } from '@/features/signoffs/components/my-signoffs';
import { SignoffCard } from '@/features/signoffs/components/signoff-card';
import { fakeFetch, renderWithProviders } from '../helpers/render';

const DANA = { id: 1, name: 'Dana Okafor' };
const AIR_TOOLS: Signoff = {
  id: 7,
  name: 'Air tools',
  description: 'Air drill, rivet gun',
  toolCount: 2,
  holders: [{ userId: 2, name: 'Ruth Lindqvist', active: true, grantedAt: '2026-11-20T10:00:00.000Z', grantedBy: DANA }],
};
const PEOPLE = [DANA, { id: 2, name: 'Ruth Lindqvist' }, { id: 3, name: 'Marco Bellweather' }];

beforeEach(() => setCsrfToken('tok'));

describe('SignoffCard', () => {
  it('lists holders and offers only people who do not hold it yet', () => {
    fakeFetch(() => undefined);
    renderWithProviders(<SignoffCard signoff={AIR_TOOLS} people={PEOPLE} />);
    expect(screen.getByText('Needed by 2 tools · 1 signed off')).toBeTruthy();
    expect(screen.getByText(/by Dana Okafor/)).toBeTruthy();
    const options = within(screen.getByLabelText('Person to sign off')).getAllByRole('option').map((o) => o.textContent);
    expect(options).toEqual(['Choose a person', 'Dana Okafor', 'Marco Bellweather']);
  });

  it('asks for a person before calling the server, then sends the chosen id', async () => {
    const calls = fakeFetch(({ method, path }) => {
      if (method === 'POST' && path === '/api/signoffs/7/holders') {
        return { status: 201, body: { id: 9, signoff: { id: 7, name: 'Air tools' }, holder: { id: 3, name: 'Marco Bellweather' }, grantedAt: '2026-12-01T12:00:00.000Z', grantedBy: DANA } };
      }
      if (path === '/api/signoffs') return { status: 200, body: { data: [] } };
    });
    renderWithProviders(<SignoffCard signoff={AIR_TOOLS} people={PEOPLE} />);
    await userEvent.click(screen.getByRole('button', { name: 'Sign off' }));
    expect(await screen.findByText('Choose the person to sign off.')).toBeTruthy();
    expect(calls).toHaveLength(0);
    await userEvent.selectOptions(screen.getByLabelText('Person to sign off'), 'Marco Bellweather');
    await userEvent.click(screen.getByRole('button', { name: 'Sign off' }));
    await waitFor(() => expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ userId: 3 }));
  });

  it('revokes only after the lead confirms', async () => {
    const calls = fakeFetch(({ method }) => (method === 'DELETE' ? { status: 204 } : undefined));
    renderWithProviders(<SignoffCard signoff={AIR_TOOLS} people={PEOPLE} />);
    await userEvent.click(screen.getByRole('button', { name: "Revoke Ruth Lindqvist's Air tools sign-off" }));
    expect(screen.getByText(/will not be able to check out tools that need Air tools/)).toBeTruthy();
    expect(calls).toHaveLength(0);
    await userEvent.click(screen.getByRole('button', { name: 'Confirm revoke' }));
    await waitFor(() => expect(calls.map((c) => `${c.method} ${c.path}`)).toContain('DELETE /api/signoffs/7/holders/2'));
  });
});

describe('HoldTimeCard', () => {
  it('refuses more than two weeks without calling the server, and saves a valid time', async () => {
    const calls = fakeFetch(({ method, body }) => (method === 'PATCH' ? { status: 200, body } : undefined));
    renderWithProviders(<HoldTimeCard holdHours={48} canChange />);
    expect(screen.getByText('48 hours (2 days)')).toBeTruthy();
    const input = screen.getByLabelText('Hours a returned tool waits');
    await userEvent.clear(input);
    await userEvent.type(input, '400');
    await userEvent.click(screen.getByRole('button', { name: 'Save hold time' }));
    expect(await screen.findByText(/at most 336 hours/)).toBeTruthy();
    expect(calls).toHaveLength(0);
    await userEvent.clear(input);
    await userEvent.type(input, '24');
    await userEvent.click(screen.getByRole('button', { name: 'Save hold time' }));
    await waitFor(() => expect(calls[0]).toMatchObject({ method: 'PATCH', path: '/api/settings/crib', body: { holdHours: 24 } }));
  });
});

describe('TimeZoneCard', () => {
  it('shows the chapter zone, saves another from the list, and shows the server’s refusal in words', async () => {
    let refuse = false;
    const calls = fakeFetch(({ method, body }) =>
      method !== 'PATCH'
        ? undefined
        : refuse
          ? { status: 400, body: { error: { code: 'VALIDATION_FAILED', message: 'The request body is not valid. timeZone: That is not a time zone this server knows.', issues: [{ path: 'timeZone', message: 'That is not a time zone this server knows.' }] } } }
          : { status: 200, body: { holdHours: 48, ...(body as object) } },
    );
    renderWithProviders(<TimeZoneCard timeZone="America/Chicago" canChange />);
    expect(screen.getByText('America/Chicago', { selector: 'strong' })).toBeTruthy();
    const select = screen.getByLabelText<HTMLSelectElement>("The chapter's time zone");
    expect(select.value).toBe('America/Chicago');
    expect([...select.options].map((o) => o.value)).toContain('Pacific/Auckland');
    expect(screen.getByRole<HTMLButtonElement>('button', { name: 'Save time zone' }).disabled).toBe(true);
    await userEvent.selectOptions(select, 'Europe/Oslo');
    await userEvent.click(screen.getByRole('button', { name: 'Save time zone' }));
    await waitFor(() => expect(calls.find((c) => c.method === 'PATCH')).toMatchObject({ path: '/api/settings/crib', body: { timeZone: 'Europe/Oslo' } }));
    expect(chapterTimeZone()).toBe('Europe/Oslo');
    refuse = true;
    await userEvent.selectOptions(select, 'Asia/Tokyo');
    await userEvent.click(screen.getByRole('button', { name: 'Save time zone' }));
    expect(await screen.findByText(/not a time zone this server knows/)).toBeTruthy();
  });
});

describe('MySignoffs', () => {
  it('lists the sign-offs the person holds', async () => {
    fakeFetch(({ path }) =>
      path === '/api/signoffs/mine'
        ? { status: 200, body: { data: [{ id: 7, name: 'Air tools', description: '', grantedAt: '2026-11-20T10:00:00.000Z', grantedBy: DANA }] } }
        : undefined,
    );
    renderWithProviders(<MySignoffs />);
    expect(await screen.findByText('Air tools')).toBeTruthy();
    expect(screen.getByText(/by Dana Okafor/)).toBeTruthy();
  });

  it('says when the person holds none', async () => {
    fakeFetch(({ path }) => (path === '/api/signoffs/mine' ? { status: 200, body: { data: [] } } : undefined));
    renderWithProviders(<MySignoffs />);
    expect(await screen.findByText(/You hold no sign-offs yet/)).toBeTruthy();
  });
});
