import { mkdirSync } from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { builtAppWithChromium } from '../helpers/browser-suite';

const SHOTS = 'test-results';
const suite = builtAppWithChromium();

beforeAll(() => {
  mkdirSync(SHOTS, { recursive: true });
});

describe('the chapter time zone', () => {
  it('is chosen by the lead on the Settings page, found in the Menu on a phone, and kept', async () => {
    const context = await suite.browser.newContext({ viewport: { width: 360, height: 780 }, deviceScaleFactor: 1 });
    const page = await context.newPage();
    await page.goto(`${suite.app.url}/`);
    await page.waitForURL(/\/sign-in/);
    await page.getByLabel('E-mail').fill('lead@example.org');
    await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Hello, Dana' }).waitFor();

    await page.getByRole('button', { name: /^Menu/ }).click();
    await page.getByRole('dialog', { name: 'Menu' }).getByRole('group', { name: 'Chapter' }).getByRole('link', { name: 'Settings' }).click();
    await page.getByRole('heading', { name: 'Settings', level: 1 }).waitFor();
    expect(page.url()).toBe(`${suite.app.url}/settings`);
    const zone = page.getByLabel("The chapter's time zone");
    await zone.waitFor();
    await zone.selectOption('Pacific/Auckland');
    await page.getByRole('button', { name: 'Save time zone' }).click();
    await page.getByText("The chapter's days now run on Pacific/Auckland time.").waitFor();
    await page.getByRole('form', { name: 'Time zone' }).scrollIntoViewIfNeeded();
    await page.screenshot({ path: `${SHOTS}/chapter-time-zone-360.png`, fullPage: false });

    await page.reload();
    expect(await page.getByLabel("The chapter's time zone").inputValue()).toBe('Pacific/Auckland');
    expect(await page.evaluate(() => localStorage.getItem('gripline.chapterTimeZone'))).toBe('Pacific/Auckland');
    await context.close();
  });
});
