import { mkdirSync } from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { signedInPhone } from '../helpers/browser';
import { builtAppWithChromium } from '../helpers/browser-suite';

const SHOTS = 'test-results';
const suite = builtAppWithChromium();

beforeAll(() => {
  mkdirSync(SHOTS, { recursive: true });
});

describe('a password reset link in the demo', () => {
  it('is hidden on the lead’s Sent mail and whole on the member’s My mail', async () => {
    const context = await suite.browser.newContext({ viewport: { width: 360, height: 780 } });
    const asker = await context.newPage();
    await asker.goto(`${suite.app.url}/reset-password`);
    await asker.getByLabel('E-mail of your account').fill('member@example.org');
    await asker.getByRole('button', { name: 'Send me a reset link' }).click();
    await asker.getByText(/a reset link is on its way/).waitFor();
    await context.close();

    const lead = await signedInPhone(suite.browser, suite.app.url, 'lead@example.org', DEMO_PASSWORD);
    await lead.goto(`${suite.app.url}/mail`);
    await lead.getByText('Reset your Gripline password').waitFor();
    expect(await lead.getByText('The reset link is hidden: only member@example.org may open it.').isVisible()).toBe(true);
    expect(await lead.getByRole('link', { name: 'Open the password reset link' }).count()).toBe(0);
    await lead.screenshot({ path: `${SHOTS}/sent-mail-reset-phone.png`, fullPage: true });
    await lead.context().close();

    const member = await signedInPhone(suite.browser, suite.app.url, 'member@example.org', DEMO_PASSWORD);
    await member.getByRole('button', { name: 'Menu' }).click();
    await member.getByRole('dialog', { name: 'Menu' }).getByRole('link', { name: 'My mail' }).click();
    await member.getByRole('heading', { name: 'My mail' }).waitFor();
    // The outbox worker hands it to the mail catcher within a second or so; the page refreshes every 10 s.
    const link = member.getByRole('link', { name: 'Open the password reset link' });
    await link.waitFor({ timeout: 15_000 });
    expect(await link.getAttribute('href')).toMatch(/\/reset-password\/[A-Za-z0-9_-]{43}$/);
    expect(await member.title()).toBe('My mail · Gripline');
    await member.context().close();
  });
});
