import { mkdirSync } from 'node:fs';
import type { Locator, Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import type { LoanStats } from '@shared/schemas/loan-stats';
import type { SpendMonth } from '@shared/schemas/stock-money';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { builtAppWithChromium } from '../helpers/browser-suite';

const SHOTS = 'test-results';
const suite = builtAppWithChromium();

beforeAll(() => {
  mkdirSync(SHOTS, { recursive: true });
});

async function leadOn(width: number): Promise<Page> {
  const context = await suite.browser.newContext({ viewport: { width, height: 900 } });
  const page = await context.newPage();
  await page.goto(`${suite.app.url}/sign-in`);
  await page.getByLabel('E-mail').fill('lead@example.org');
  await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { name: /Hello/ }).waitFor();
  await page.goto(`${suite.app.url}/overview`);
  await page.getByRole('heading', { name: 'Overview', level: 1 }).waitFor();
  return page;
}

/** A card of the page by its heading. */
const card = (page: Page, title: string) => page.locator('section').filter({ has: page.getByRole('heading', { name: title, level: 2 }) });

/** The rows of a table named by its caption, each as its cells' text. */
async function rowsOf(page: Page, caption: string): Promise<string[][]> {
  const table = page.locator('table').filter({ has: page.locator('caption', { hasText: caption }) });
  return table.locator('tbody tr').evaluateAll((rows) => rows.map((r) => [...r.querySelectorAll('td')].map((td) => (td.textContent ?? '').trim())));
}

const count = new Intl.NumberFormat('en-US');
const weekName = (start: string) => `Week of ${new Date(`${start}T00:00:00Z`).toLocaleDateString('en-US', { month: 'short', day: 'numeric', year: 'numeric', timeZone: 'UTC' })}`;

/** The bars recharts drew in a chart (zero-height ones are not drawn). */
const barsIn = (chart: Locator) => chart.locator('.recharts-bar-rectangle path');

describe('the lead’s overview', () => {
  it('draws each chart and shows the same figures in the table beside it', async () => {
    const page = await leadOn(1280);
    expect(await page.title()).toBe('Overview · Gripline');
    const stats = await page.evaluate(async () => (await (await fetch('/api/loans/stats')).json()) as LoanStats);
    const spend = await page.evaluate(async () => (await (await fetch('/api/stock/spend?months=12')).json()) as { months: SpendMonth[] });
    // The demo chapter has half a year of loans to show.
    expect(stats.weeks.filter((w) => w.total > 0).length).toBeGreaterThanOrEqual(20);

    const loansChart = card(page, 'Loans per week').locator('figure [role="img"]');
    const overdueChart = card(page, 'Days overdue per week').locator('figure [role="img"]');
    const spendChart = card(page, 'Consumables used by month').locator('figure [role="img"]');
    for (const chart of [loansChart, overdueChart, spendChart]) expect(await chart.locator('svg.recharts-surface').count()).toBeGreaterThan(0);

    // Loans: one bar per kind lent in a week, one legend entry per kind; the table has every week, newest first.
    const lentBars = stats.weeks.reduce((s, w) => s + Object.values(w.byKind).filter((n) => n > 0).length, 0);
    expect(await barsIn(loansChart).count()).toBe(lentBars);
    expect(await card(page, 'Loans per week').locator('.recharts-legend-item').count()).toBe(stats.kinds.length);
    const loanRows = await rowsOf(page, 'Loans per week by tool kind');
    expect(loanRows.map((r) => [r[0], r[2]])).toEqual([...stats.weeks].reverse().map((w) => [weekName(w.start), count.format(w.total)]));

    // Days overdue: one bar per week with any, and the table's figures week by week.
    expect(await barsIn(overdueChart).count()).toBe(stats.weeks.filter((w) => w.overdueDays > 0).length);
    const overdueRows = await rowsOf(page, 'Days overdue per week');
    expect(overdueRows).toEqual([...stats.weeks].reverse().map((w) => [weekName(w.start), count.format(w.overdueDays)]));

    // The tools used most and the idle ones, each linking to its tool.
    const used = await rowsOf(page, 'Tools lent most');
    expect(used.map((r) => [r[2], r[3]])).toEqual(stats.mostUsed.map((t) => [count.format(t.loans), count.format(t.daysOut)]));
    expect(used.map((r) => r[0])).toEqual(stats.mostUsed.map((t) => `${t.code} ${t.name}`));
    const idle = await rowsOf(page, 'Tools not lent since');
    expect(idle).toHaveLength(stats.idle.length);
    const first = stats.mostUsed[0]!;
    expect(await page.getByRole('link', { name: `${first.code} ${first.name}` }).getAttribute('href')).toBe(`/tools/${first.code}`);

    // Consumables: a bar per kind used in a month, and its table as on the Consumables page.
    const usedBars = spend.months.reduce((s, m) => s + Object.values(m.byKind).filter((c) => c !== 0).length, 0);
    expect(await barsIn(spendChart).count()).toBe(usedBars);
    const dollars = new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD' });
    const spendRows = await rowsOf(page, 'Consumables used per month by bin kind');
    expect(spendRows.map((r) => r[2])).toEqual([...spend.months].reverse().map((m) => dollars.format(m.consumedCents / 100)));

    // Wide: each table sits beside its chart.
    const chartBox = (await loansChart.boundingBox())!;
    const tableBox = (await card(page, 'Loans per week').locator('table').boundingBox())!;
    expect(tableBox.x).toBeGreaterThanOrEqual(chartBox.x + chartBox.width);
    await page.screenshot({ path: `${SHOTS}/overview-wide.png`, fullPage: true });

    // On paper the tables print with the charts.
    await page.emulateMedia({ media: 'print' });
    expect(await card(page, 'Days overdue per week').locator('table').isVisible()).toBe(true);
    expect(await overdueChart.isVisible()).toBe(true);
    await page.context().close();
  });

  it('puts each table under its chart on a phone, within the screen’s width', async () => {
    const page = await leadOn(360);
    const chart = card(page, 'Days overdue per week').locator('figure');
    await chart.locator('svg.recharts-surface').first().waitFor();
    const chartBox = (await chart.boundingBox())!;
    const tableBox = (await card(page, 'Days overdue per week').locator('table').boundingBox())!;
    expect(tableBox.y).toBeGreaterThanOrEqual(chartBox.y + chartBox.height);
    // Nothing runs off the side: a wide table scrolls inside its own region.
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(360);
    await page.screenshot({ path: `${SHOTS}/overview-phone.png`, fullPage: true });
    await page.context().close();
  });
});
