import { mkdirSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { builtAppWithChromium } from '../helpers/browser-suite';

const SHOTS = 'test-results';
const suite = builtAppWithChromium();

beforeAll(() => {
  mkdirSync(SHOTS, { recursive: true });
});

async function phonePage(): Promise<Page> {
  const context = await suite.browser.newContext({ viewport: { width: 360, height: 780 }, deviceScaleFactor: 1 });
  return context.newPage();
}

/** On a phone the lead's pages sit in the Menu of the bottom bar. */
async function openFromMenu(page: Page, name: string) {
  await page.getByRole('button', { name: /^Menu/ }).click();
  await page.getByRole('dialog', { name: 'Menu' }).getByRole('link', { name }).click();
}

async function signIn(page: Page, email: string, password: string) {
  await page.goto(`${suite.app.url}/`);
  await page.waitForURL(/\/sign-in/);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

describe('the demo lead on a phone', () => {
  it('signs in, opens People, invites someone, sees the mail, and signs out', async () => {
    const page = await phonePage();
    await signIn(page, 'lead@example.org', DEMO_PASSWORD);
    await page.getByRole('heading', { name: 'Hello, Dana' }).waitFor();
    expect(await page.getByText('Chapter lead').first().isVisible()).toBe(true);

    await openFromMenu(page, 'People');
    await page.getByRole('heading', { name: 'People', exact: true }).waitFor();
    expect(await page.getByRole('cell', { name: /Ruth Lindqvist quartermaster@example.org/ }).isVisible()).toBe(true);
    expect(await page.getByText('Showing 6 of 6 people').isVisible()).toBe(true);

    await page.getByLabel('E-mail', { exact: true }).fill('new.builder@example.org');
    await page.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByText('new.builder@example.org').first().waitFor();
    await page.screenshot({ path: `${SHOTS}/people-phone.png`, fullPage: true });

    await openFromMenu(page, 'Sent mail');
    await page.getByText(/invited you to the chapter's tool crib/).waitFor();
    const link = await page.getByRole('link', { name: 'Open the invitation link' }).getAttribute('href');
    expect(link).toMatch(/\/invite\/[A-Za-z0-9_-]{43}$/);
    // The server's outbox worker sends it in the background; the page catches up on its next refresh.
    await page.getByText('Sent', { exact: true }).first().waitFor({ timeout: 15_000 });
    await page.screenshot({ path: `${SHOTS}/sent-mail-phone.png`, fullPage: true });

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(/\/sign-in/);
    await page.goto(`${suite.app.url}/people`);
    await page.waitForURL(/\/sign-in\?next=%2Fpeople/);
    await page.context().close();

    // The invitee follows the link in another browser, joins, and lands signed in.
    const invitee = await phonePage();
    await invitee.goto(link!);
    await invitee.getByLabel('Your name, as the chapter knows you').fill('Noor Haddad');
    await invitee.getByLabel('Choose a password').fill('rivet lines all day');
    await invitee.getByRole('button', { name: 'Join and sign in' }).click();
    await invitee.getByRole('heading', { name: 'Hello, Noor' }).waitFor();
    expect(await invitee.getByRole('link', { name: 'Scan', exact: true }).isVisible()).toBe(true);
    // A member's Menu holds the bins and their tab, and none of the lead's pages.
    await invitee.getByRole('button', { name: 'Menu' }).click();
    const menu = invitee.getByRole('dialog', { name: 'Menu' });
    expect(await menu.getByRole('link', { name: 'Bins' }).isVisible()).toBe(true);
    expect(await menu.getByRole('link', { name: 'My tab' }).isVisible()).toBe(true);
    expect(await invitee.getByRole('link', { name: 'People' }).count()).toBe(0);
    await invitee.keyboard.press('Escape');
    await menu.waitFor({ state: 'hidden' });
    await invitee.screenshot({ path: `${SHOTS}/member-home-phone.png`, fullPage: true });
    await invitee.context().close();
  });

  it('refuses a wrong password with a message a person can act on', async () => {
    const page = await phonePage();
    await signIn(page, 'lead@example.org', 'not the password');
    const alert = page.getByRole('alert').filter({ hasText: 'do not match' });
    await alert.waitFor();
    expect(page.url()).toMatch(/\/sign-in/);
    await page.context().close();
  });
});
