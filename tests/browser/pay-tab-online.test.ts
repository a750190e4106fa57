import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import BetterSqlite3 from 'better-sqlite3';
import { beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { signedInPhone, type BuiltApp } from '../helpers/browser';
import { builtAppWithChromium } from '../helpers/browser-suite';

const SHOTS = 'test-results';
const suite = builtAppWithChromium();

beforeAll(() => {
  mkdirSync(SHOTS, { recursive: true });
});

/** A demo bin with a unit cost and stock enough to draw from. */
function costedBin(app: BuiltApp): string {
  const db = new BetterSqlite3(join(app.dir, 'gripline.db'), { readonly: true });
  try {
    return (db.prepare('select code from bins where unit_cost_e_4 > 0 and on_hand >= 50 order by id limit 1').get() as { code: string }).code;
  } finally {
    db.close();
  }
}

describe('a member settles the tab online in the demo', () => {
  it('draws, pays on the local provider’s page, comes back to “Payment received” with nothing owed, and finds the receipt in My mail', async () => {
    const page = await signedInPhone(suite.browser, suite.app.url, 'member@example.org', DEMO_PASSWORD);
    const code = costedBin(suite.app);
    await page.goto(`${suite.app.url}/bins/${code}`);
    await page.getByLabel('Quantity to draw').fill('20');
    await page.getByRole('button', { name: `Draw from ${code}` }).click();
    await page.getByText(/^You drew 20 .* on your tab\.$/).first().waitFor();

    await page.goto(`${suite.app.url}/tab`);
    const balance = page.getByRole('region', { name: 'Balance' });
    await balance.getByText(/You owe the chapter \$/).waitFor();
    const owed = (await balance.locator('p').first().textContent())!.trim();
    expect(await page.title()).toBe('My tab · Gripline');

    await page.screenshot({ path: `${SHOTS}/pay-tab-card-phone.png`, fullPage: false });
    await page.getByRole('button', { name: `Pay ${owed}` }).click();
    await page.getByRole('heading', { name: `Pay ${owed} to the chapter` }).waitFor();
    expect(page.url()).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/pay\/cs_test_\w+$/);
    await page.screenshot({ path: `${SHOTS}/pay-tab-hosted-phone.png`, fullPage: true });
    await page.getByRole('button', { name: 'Pay', exact: true }).click();

    await page.waitForURL(/\/tab\?payment=paid&checkout=cs_test_\w+$/);
    const status = page.getByRole('status').filter({ hasText: /Payment received|Still waiting/ });
    await status.getByText(`Payment received: ${owed}`).waitFor();
    await balance.getByText('You owe the chapter nothing.').waitFor();
    expect((await balance.locator('p').first().textContent())!.trim()).toBe('$0.00');
    expect(await page.getByRole('button', { name: /^Pay \$/ }).count()).toBe(0);
    expect(await page.title()).toBe('My tab · Gripline');
    await page.screenshot({ path: `${SHOTS}/pay-tab-received-phone.png`, fullPage: true });

    await page.goto(`${suite.app.url}/my-mail`);
    await page.getByRole('heading', { name: 'My mail' }).waitFor();
    // The outbox worker hands it to the mail catcher within a second or so; the page refreshes every 10 s.
    await page.getByText(`Payment received: ${owed} on your tab`).first().waitFor({ timeout: 15_000 });
    await page.context().close();
  });
});
