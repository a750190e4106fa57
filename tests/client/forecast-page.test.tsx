import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Suspense } from 'react';
import { beforeEach, describe, expect, it } from 'vitest';
import type { ForecastList } from '@shared/schemas/forecast';
import { ForecastRoute } from '@/app/routes/app/forecast';
import { setCsrfToken } from '@/lib/api-client';
import { needsOrderForecast, stockedForecast } from '../helpers/forecast-fixture';
import { fakeFetch, renderWithProviders } from '../helpers/render';

const LIST: ForecastList = {
  data: [stockedForecast(), needsOrderForecast()],
  meta: { generatedAt: '2027-01-04T07:00:00.000Z', serviceLevel: 0.95, horizonWeeks: 26 },
};

function renderForecast(list: ForecastList = LIST) {
  const calls = fakeFetch(({ path }) => (path === '/api/forecast' ? { status: 200, body: list } : undefined));
  renderWithProviders(
    <Suspense fallback={<p>Loading…</p>}>
      <ForecastRoute />
    </Suspense>,
    '/forecast',
  );
  return calls;
}

const card = (code: string) => screen.getByRole('article', { name: new RegExp(`^${code} `) });
/** The key figures as term → value. */
const figures = (el: HTMLElement) => Object.fromEntries([...el.querySelectorAll('dt')].map((dt) => [dt.textContent, dt.nextElementSibling?.textContent]));
const articles = () => screen.queryAllByRole('article').map((a) => within(a).getAllByRole('link')[0]!.textContent);

beforeEach(() => setCsrfToken('tok'));

describe('Forecast page', () => {
  it('puts bins that need ordering first and says each status in words', async () => {
    const calls = renderForecast();
    expect(await screen.findByRole('heading', { name: 'Forecast', level: 1 })).toBeTruthy();
    expect(calls.map((c) => c.path)).toEqual(['/api/forecast']);
    expect(articles()).toEqual(['B-0001', 'B-0002']);
    expect(within(card('B-0001')).getByText('Needs ordering')).toBeTruthy();
    expect(within(card('B-0002')).getByText('No order needed')).toBeTruthy();
    expect(screen.getByText(/Needs ordering: 1 of 2 bins\. Showing 2 of 2\./)).toBeTruthy();
  });

  it('gives a bin’s levels, demand source, z and service level, lead time, EOQ and order in words', async () => {
    renderForecast();
    const b1 = await screen.findByRole('article', { name: /^B-0001 / });
    expect(within(b1).getByRole('link', { name: 'B-0001' }).getAttribute('href')).toBe('/bins/B-0001');
    expect(figures(b1)).toEqual({ 'On hand': '140 each', 'Reorder point': '155 each', 'Safety stock': '35 each', 'Suggested order': '2,000 each' });
    const sentences = within(within(b1).getByRole('list', { name: 'In words' })).getAllByRole('listitem').map((li) => li.textContent);
    expect(sentences).toEqual([
      'Demand from planned assemblies: 1,040 each over 26 weeks, about 40 a week.',
      'Lead time 3 weeks: about 120 each used while an order is on its way.',
      // z at 95 % is 1.6449 by an exact inverse normal (trade-checks.md §6), shown to two places
      'Safety stock 35 each: z = 1.64 for a 95 % service level, with weekly draws varying by 12 (σ).',
      'Reorder point 155 each: lead-time demand plus safety stock.',
      'Suggested order 2,000 each (8 packs of 250); the economic order quantity is 1,766.',
      'On order: 500 each expected in the week of Feb 8, 2027.',
      'Projected to run out in the week of Jan 25, 2027 unless more comes in.',
    ]);
    expect(within(b1).getByText(/^On hand 140 is at or below the reorder point 155; .*lead time\.$/)).toBeTruthy();

    const b2 = card('B-0002');
    expect(within(b2).getByText('Demand from the last 26 weeks of draws: 260 each over 26 weeks, about 10 a week.')).toBeTruthy();
    expect(within(b2).getByText('Lowest projected on hand: 540 each, in the week of Jun 28, 2027.')).toBeTruthy();
    // The chart is a picture with a text name; the figures are in the sentences and the table.
    expect(within(b1).getByRole('img').getAttribute('aria-label')).toContain('figures are in the text and the week table');
  });

  it('opens the week table: demand, receipts due and projected on hand for all 26 weeks', async () => {
    renderForecast();
    const b1 = await screen.findByRole('article', { name: /^B-0001 / });
    const toggle = within(b1).getByRole('button', { name: /Week by week/ });
    expect(toggle.getAttribute('aria-expanded')).toBe('false');
    expect(within(b1).queryByRole('table')).toBeNull();
    await userEvent.click(toggle);
    expect(toggle.getAttribute('aria-expanded')).toBe('true');
    const rows = within(within(b1).getByRole('table', { name: 'B-0001 week by week' })).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(26);
    const text = (row: HTMLElement) => [...row.children].map((c) => c.textContent);
    // 140 − 40 = 100 after the first week; 500 arrives in week 6: −60 + 500 − 40 = 400
    // Reorder point 155, safety stock 35: 100 is at the reorder point, 20 below safety stock, −20 has run out.
    expect(text(rows[0]!)).toEqual(['Jan 4, 2027', '40', '—', '100 at or below reorder point']);
    expect(text(rows[2]!)).toEqual(['Jan 18, 2027', '40', '—', '20 below safety stock']);
    expect(text(rows[3]!)).toEqual(['Jan 25, 2027', '40', '—', '−20 runs out']);
    expect(text(rows[5]!)).toEqual(['Feb 8, 2027', '40', '500', '400']);
    // 140 + 500 − 26 × 40 = −400 at the end of the horizon
    expect(text(rows[25]!)).toEqual(['Jun 28, 2027', '40', '—', '−400 runs out']);
  });

  it('filters to the bins that need ordering, and searches by code, designation or supplier', async () => {
    renderForecast();
    await screen.findByRole('heading', { name: 'Forecast', level: 1 });
    await userEvent.click(screen.getByRole('checkbox', { name: 'Needs ordering only' }));
    expect(articles()).toEqual(['B-0001']);
    expect(screen.getByText(/Showing 1 of 1\./)).toBeTruthy();
    await userEvent.click(screen.getByRole('checkbox', { name: 'Needs ordering only' }));
    await userEvent.type(screen.getByRole('searchbox', { name: 'Search bins' }), 'cedar hollow');
    expect(articles()).toEqual(['B-0002']);
    await userEvent.click(screen.getByRole('checkbox', { name: 'Needs ordering only' }));
    expect(articles()).toEqual([]);
    expect(screen.getByText('No bin matches this search.')).toBeTruthy();
  });

  it('says so when no bin needs ordering', async () => {
    renderForecast({ ...LIST, data: [stockedForecast()] });
    await screen.findByRole('heading', { name: 'Forecast', level: 1 });
    await userEvent.click(screen.getByRole('checkbox', { name: 'Needs ordering only' }));
    expect(screen.getByText('No bin needs ordering now.')).toBeTruthy();
  });
});
