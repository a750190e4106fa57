import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { MemberToday as Today } from '@shared/schemas/today-member';
import { MemberToday } from '@/app/routes/app/home/member-today';
import { fakeFetch, renderWithProviders } from '../helpers/render';

const none = { total: 0, items: [] };
const emptyDay: Today = { asOf: '2026-12-01T12:00:00.000Z', loans: none, setAside: none, queue: none, assemblies: none, tab: { balanceCents: 0 }, attention: none };
const answer = (body: Today) => fakeFetch((call) => (call.path === '/api/today/member' ? { status: 200, body } : undefined));

const loan = (i: number) => ({
  loanId: i,
  tool: { code: `T-000${i}`, name: `Tool ${i}` },
  dueAt: '2026-12-08T06:59:59.999Z',
  dueDay: 'Monday, December 7',
  dueWords: i === 1 ? '3 days late' : 'due in 6 days',
  overdue: i === 1,
  soon: false,
});

describe("MemberToday, the member's part of home", () => {
  it('says an empty day in a sentence, with the tab', async () => {
    answer(emptyDay);
    renderWithProviders(<MemberToday />);
    expect(await screen.findByText('A clear bench: nothing from the crib is out with you and nothing waits for you.')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Your tab is settled.' }).getAttribute('href')).toBe('/tab');
    expect(screen.queryByRole('heading', { name: 'Out with you' })).toBeNull();
  });

  it('links each loan to its tool with its due words, links to all loans past five, and says the empty parts in a sentence', async () => {
    answer({ ...emptyDay, loans: { total: 7, items: [1, 2, 3, 4, 5].map(loan) }, tab: { balanceCents: 30001 } });
    renderWithProviders(<MemberToday />);
    expect((await screen.findByRole('link', { name: 'T-0001 Tool 1' })).getAttribute('href')).toBe('/tools/T-0001');
    expect(screen.getByText('3 days late')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'All 7 of your loans' }).getAttribute('href')).toBe('/loans');
    expect(screen.getByText('Nothing is set aside for you.')).toBeTruthy();
    expect(screen.getByText('No assembly of yours is in progress.')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'You owe $300.01 on your tab.' })).toBeTruthy();
  });

  it('gives a card only to the parts with something in them; the empty parts share the tab card, one sentence each', async () => {
    answer({ ...emptyDay, loans: { total: 1, items: [loan(2)] } });
    renderWithProviders(<MemberToday />);
    await screen.findByRole('heading', { name: 'Out with you' });
    expect(screen.getAllByRole('heading').map((h) => h.textContent)).toEqual(['Out with you', 'My tab']);
    const tabCard = screen.getByRole('heading', { name: 'My tab' }).closest('section')!;
    expect([...tabCard.querySelectorAll('li')].map((li) => li.textContent)).toEqual([
      'Nothing is set aside for you.',
      'You are not in line for any tool.',
      'No assembly of yours is in progress.',
      'Nothing you returned for attention is still waiting.',
    ]);
  });

  it('links what an assembly lacks to the tool and the bin', async () => {
    answer({
      ...emptyDay,
      assemblies: {
        total: 1,
        items: [
          {
            id: 4,
            name: 'Rudder',
            buildName: 'Tail kit',
            tools: [{ need: 'Drill bit #30', tool: { code: 'T-0021', name: 'Drill bit #30' }, words: 'all on loan' }],
            bins: [{ description: 'Solid rivet 1/8', binCode: 'B-0003', words: 'short by 43: 20 on hand, 63 still to draw' }],
          },
        ],
      },
    });
    renderWithProviders(<MemberToday />);
    expect((await screen.findByRole('link', { name: 'Rudder · Tail kit' })).getAttribute('href')).toBe('/assemblies/4');
    expect(screen.getByRole('link', { name: 'Drill bit #30' }).getAttribute('href')).toBe('/tools/T-0021');
    expect(screen.getByRole('link', { name: 'Solid rivet 1/8' }).getAttribute('href')).toBe('/bins/B-0003');
  });
});
