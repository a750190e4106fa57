import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { signedInPhone } from '../helpers/browser';
import { builtAppWithChromium } from '../helpers/browser-suite';
import { signIn, type Member } from '../helpers/http-sign-in';

const suite = builtAppWithChromium();

const asMember = (who: Member, path: string, init: RequestInit = {}) =>
  fetch(`${suite.app.url}${path}`, { ...init, headers: { 'content-type': 'application/json', cookie: who.cookie, 'x-csrf-token': who.csrf, ...init.headers } });
const balanceOf = async (who: Member) => ((await (await asMember(who, '/api/stock/tab')).json()) as { balanceCents: number }).balanceCents;

describe('the lead refunds an online payment on Payments', () => {
  it('refunds part of a demo member’s online payment through the local fake provider; the list and the tab show it', async () => {
    // The demo member pays $5.00 of the tab on the fake provider's page.
    const marco = await signIn(suite.app.url, 'member@example.org', DEMO_PASSWORD);
    const before = await balanceOf(marco);
    expect(before).toBeGreaterThanOrEqual(500);
    const checkout = await asMember(marco, '/api/payments/checkout', { method: 'POST', body: JSON.stringify({ amountCents: 500 }) });
    expect(checkout.status).toBe(201);
    const { url } = (await checkout.json()) as { url: string };
    const paid = await fetch(url, { method: 'POST', body: new URLSearchParams({ choice: 'pay' }), redirect: 'manual' });
    expect(paid.status).toBe(303);
    expect(await balanceOf(marco)).toBe(before - 500);

    const page = await signedInPhone(suite.browser, suite.app.url, 'lead@example.org', DEMO_PASSWORD, { context: { viewport: { width: 1280, height: 900 } } });
    await page.goto(`${suite.app.url}/payments?method=online`);
    await page.getByRole('heading', { name: 'Payments', level: 1 }).waitFor();
    expect(await page.title()).toBe('Payments · Gripline');
    expect(await page.getByRole('link', { name: 'Export CSV' }).getAttribute('href')).toBe('/api/payments/export.csv?method=online');

    await page.getByRole('button', { name: 'Refund Marco Bellweather’s payment of $5.00' }).click();
    const step = page.getByRole('region', { name: 'Refund $5.00 to Marco Bellweather?' });
    const amount = step.getByLabel('Amount to refund');
    expect(await amount.inputValue()).toBe('5.00');
    await amount.fill('2.00');
    await step.getByRole('button', { name: 'Refund', exact: true }).click();
    await page.getByText('Refunded $2.00 to Marco Bellweather.').waitFor();
    await page.getByRole('cell', { name: '$2.00 · $3.00 left' }).waitFor();
    expect(await step.count()).toBe(0);

    expect(await balanceOf(marco)).toBe(before - 300);
    await page.context().close();
  });
});
