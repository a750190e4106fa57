import { mkdirSync } from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { demoToolCode, signedInPhone } from '../helpers/browser';
import { builtAppWithChromium } from '../helpers/browser-suite';

const SHOTS = 'test-results';
const suite = builtAppWithChromium();

beforeAll(() => {
  mkdirSync(SHOTS, { recursive: true });
});

describe('the lead’s home on a phone', () => {
  it('shows the day’s work, sends a reminder and answers a sign-off request in place, and leads to the Overdue page', async () => {
    const page = await signedInPhone(suite.browser, suite.app.url, 'lead@example.org', DEMO_PASSWORD);
    const panel = page.getByTestId('lead-today');
    await panel.getByRole('heading', { name: 'Overdue (2)' }).waitFor();
    for (const heading of ['Sign-off requests', 'Out on loan', 'Who holds what', 'Reorder alerts', 'Consumables spend']) {
      expect(await panel.getByRole('heading', { name: heading, exact: true }).count()).toBe(1);
    }
    await page.screenshot({ path: `${SHOTS}/home-lead-360.png`, fullPage: true });

    // Send reminder in place: the row then says it went today.
    const firstLate = panel.getByRole('listitem').filter({ has: page.getByRole('button', { name: 'Send reminder' }) }).first();
    await firstLate.getByRole('button', { name: 'Send reminder' }).click();
    await page.getByText(/^Reminder sent to /).waitFor();
    await panel.getByText('Already reminded today; the next one can go tomorrow.').first().waitFor();

    // Sign Kelechi off from home: the request leaves the list.
    await panel.getByRole('button', { name: 'Sign off Kelechi Obi for Air tools' }).click();
    await page.getByText('Kelechi Obi is signed off for Air tools.').waitFor();
    await panel.getByRole('button', { name: 'Sign off Kelechi Obi for Air tools' }).waitFor({ state: 'detached' });
    expect(await panel.getByText('Marco Bellweather asks for Rivet gun and bucking').count()).toBe(1);

    await panel.getByRole('link', { name: 'All 2 overdue loans' }).click();
    await page.waitForURL(/\/overdue$/);
    await page.getByRole('heading', { name: 'Overdue', level: 1 }).waitFor();
    expect(await page.title()).toBe('Overdue · Gripline');
    await page.context().close();
  });

  it('lets a member ask for a sign-off from a tool’s page, and the lead sees it', async () => {
    const gun = demoToolCode(suite.app, 'Rivet gun, 3X');
    const member = await signedInPhone(suite.browser, suite.app.url, 'ines.parra@example.org', DEMO_PASSWORD);
    await member.goto(`${suite.app.url}/tools/${gun}`);
    await member.getByRole('button', { name: 'Ask for a sign-off' }).click();
    await member.getByLabel('Note for the lead (optional)').fill('Bucked rivets on my last kit.');
    await member.screenshot({ path: `${SHOTS}/tool-ask-signoff-360.png`, fullPage: true });
    await member.getByRole('button', { name: 'Send the request' }).click();
    await member.getByRole('heading', { name: 'Sign-off asked for' }).waitFor();
    await member.context().close();

    const lead = await signedInPhone(suite.browser, suite.app.url, 'lead@example.org', DEMO_PASSWORD);
    const panel = lead.getByTestId('lead-today');
    await panel.getByText('Ines Parra asks for Rivet gun and bucking').waitFor();
    await panel.getByRole('button', { name: "Decline Ines Parra's request" }).click();
    await panel.getByLabel('Why not Ines Parra, yet?').fill('Come to Saturday’s bucking session first.');
    await panel.getByRole('button', { name: 'Decline', exact: true }).click();
    await lead.getByText('Ines Parra has been told why.').waitFor();
    await panel.getByText('Ines Parra asks for Rivet gun and bucking').waitFor({ state: 'detached' });
    await lead.setViewportSize({ width: 1280, height: 900 });
    await lead.screenshot({ path: `${SHOTS}/home-lead-1280.png`, fullPage: true });
    await lead.context().close();
  });
});
