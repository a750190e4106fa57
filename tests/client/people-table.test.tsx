import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { Person } from '@shared/schemas/people';
import { PeopleTable } from '@/features/people/components/people-table';
import { renderWithProviders } from '../helpers/render';

const person = (id: number, name: string, role: Person['role'], active = true): Person => ({
  id,
  name,
  email: `${name.split(' ')[0]!.toLowerCase()}@example.org`,
  role,
  active,
  createdAt: `2026-0${id}-01T00:00:00.000Z`,
  deactivatedAt: active ? null : '2026-11-01T00:00:00.000Z',
  hasBadge: false,
  hasPin: false,
});

const PEOPLE = [
  person(1, 'Dana Okafor', 'lead'),
  person(2, 'Ruth Lindqvist', 'quartermaster'),
  person(3, 'Marco Bellweather', 'member'),
  person(4, 'Ines Parra', 'member', false),
];

const names = () =>
  screen
    .getAllByRole('row')
    .slice(1)
    .map((row) => within(row).queryAllByRole('cell')[0]?.textContent ?? '');

describe('PeopleTable', () => {
  it('lists everyone sorted by name', () => {
    renderWithProviders(<PeopleTable people={PEOPLE} selfId={1} />);
    expect(names().map((n) => PEOPLE.find((p) => n.startsWith(p.name))?.name)).toEqual(['Dana Okafor', 'Ines Parra', 'Marco Bellweather', 'Ruth Lindqvist']);
    expect(screen.getByText('Showing 4 of 4 people')).toBeTruthy();
  });

  it('filters by role and by status', async () => {
    renderWithProviders(<PeopleTable people={PEOPLE} selfId={1} />);
    await userEvent.selectOptions(screen.getByLabelText('Role'), 'member');
    expect(screen.getByText('Showing 2 of 4 people')).toBeTruthy();
    await userEvent.selectOptions(screen.getByLabelText('Status'), 'deactivated');
    expect(screen.getByText('Showing 1 of 4 people')).toBeTruthy();
    expect(names()[0]).toMatch(/^Ines Parra/);
    expect(screen.getByRole('button', { name: 'Reactivate' })).toBeTruthy();
  });

  it('searches names and e-mails', async () => {
    renderWithProviders(<PeopleTable people={PEOPLE} selfId={1} />);
    await userEvent.type(screen.getByLabelText('Search name or e-mail'), 'ruth@');
    expect(screen.getByText('Showing 1 of 4 people')).toBeTruthy();
    await userEvent.clear(screen.getByLabelText('Search name or e-mail'));
    await userEvent.type(screen.getByLabelText('Search name or e-mail'), 'nobody');
    expect(screen.getByText('Nobody matches these filters.')).toBeTruthy();
  });

  it('sorts by name descending on a click and says so to screen readers', async () => {
    renderWithProviders(<PeopleTable people={PEOPLE} selfId={1} />);
    const header = screen.getByRole('columnheader', { name: /Name/ });
    expect(header.getAttribute('aria-sort')).toBe('ascending');
    await userEvent.click(within(header).getByRole('button'));
    expect(header.getAttribute('aria-sort')).toBe('descending');
    expect(names()[0]).toMatch(/^Ruth Lindqvist/);
  });

  it('offers no deactivate button on your own row', () => {
    renderWithProviders(<PeopleTable people={PEOPLE} selfId={1} />);
    const danaRow = screen.getAllByRole('row').find((r) => r.textContent?.includes('Dana Okafor'))!;
    expect(within(danaRow).queryByRole('button', { name: 'Deactivate' })).toBeNull();
    const marcoRow = screen.getAllByRole('row').find((r) => r.textContent?.includes('Marco'))!;
    expect(within(marcoRow).getByRole('button', { name: 'Deactivate' })).toBeTruthy();
  });
});
