import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { signedInPhone } from '../helpers/browser';
import { builtAppWithChromium } from '../helpers/browser-suite';

const suite = builtAppWithChromium();
const DRAWN = 3;

/** "$1,234.56" → 123456. */
const centsOf = (text: string) => Math.round(Number(text.replace(/[^\d.]/g, '')) * 100);
const countOf = (text: string) => Number(text.replace(/[^\d]/g, ''));

const home = (page: Page) => page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Home' }).click();

/** Home → My tab through the tab line on the member's day; the balance as the page shows it. */
async function openTab(page: Page): Promise<void> {
  await home(page);
  await page.getByRole('link', { name: /on your tab\.$|Your tab is settled\./ }).click();
  await page.getByRole('heading', { name: 'My tab', level: 1 }).waitFor();
}
const tabBalance = async (page: Page) => centsOf((await page.getByRole('region', { name: 'Balance' }).locator('p').first().textContent()) ?? '');

/** Home → the Right flap's page through "Your assemblies in progress". */
async function openRightFlap(page: Page): Promise<void> {
  await home(page);
  await page.getByRole('link', { name: /Right flap/ }).click();
  await page.getByRole('heading', { name: 'Right flap', level: 1 }).waitFor();
}
/** A bill line on the assembly's page: what has been drawn for it so far. */
const drawnSoFar = async (page: Page, description: string) =>
  countOf(((await page.getByRole('listitem', { name: description }).getByText(/ estimated$/).textContent()) ?? '').split(' of ')[0]!);

describe('a draw refreshes every screen that shows it', () => {
  it('shows the tab, the bin and the assembly’s bill updated after a draw, moving between them without a reload', async () => {
    const page = await signedInPhone(suite.browser, suite.app.url, 'member@example.org', DEMO_PASSWORD);
    // Set once; a full page load would lose it.
    await page.evaluate(() => Object.assign(window, { sameDocument: true }));

    // Both screens are cached before the draw.
    await openTab(page);
    const balanceBefore = await tabBalance(page);
    await openRightFlap(page);
    const line = page.getByRole('listitem').filter({ has: page.getByText('Enough on hand.') }).first();
    const description = (await line.getAttribute('aria-label'))!;
    const drawnBefore = await drawnSoFar(page, description);
    const binLink = line.getByRole('link', { name: /^[A-Z0-9-]+$/ });
    const code = (await binLink.textContent())!.trim();

    await binLink.click();
    const onHand = page.getByTestId('bin-on-hand');
    await onHand.waitFor();
    const onHandBefore = countOf((await onHand.textContent())!);
    await page.getByLabel('Quantity to draw').fill(String(DRAWN));
    await page.getByLabel('For which assembly (optional)').selectOption({ label: (await page.getByRole('option', { name: /Right flap/ }).textContent())! });
    await page.getByRole('button', { name: `Draw from ${code}` }).click();
    await page.getByText(new RegExp(`^You drew ${DRAWN} .* on your tab\\.$`)).first().waitFor();

    await openTab(page);
    await expect.poll(() => tabBalance(page), { timeout: 5000 }).toBeGreaterThan(balanceBefore);

    await openRightFlap(page);
    await expect.poll(() => drawnSoFar(page, description), { timeout: 5000 }).toBe(drawnBefore + DRAWN);

    await page.getByRole('listitem', { name: description }).getByRole('link', { name: code }).click();
    await expect.poll(async () => countOf((await page.getByTestId('bin-on-hand').textContent()) ?? ''), { timeout: 5000 }).toBe(onHandBefore - DRAWN);

    expect(await page.evaluate(() => (window as unknown as { sameDocument?: boolean }).sameDocument)).toBe(true);
    await page.context().close();
  });
});
