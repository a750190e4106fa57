import type { Locator } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { signedInPhone } from '../helpers/browser';
import { builtAppWithChromium } from '../helpers/browser-suite';

const suite = builtAppWithChromium();

async function fillLine(line: Locator, v: { length: string; pitch: string; sheets: string[]; kind: string; diameter: string }) {
  await line.getByLabel('Length (in)').fill(v.length);
  await line.getByLabel('Target pitch (in)').fill(v.pitch);
  for (const [i, t] of v.sheets.entries()) {
    if (i > 0) await line.getByRole('button', { name: 'Add a sheet' }).click();
    await line.getByLabel(`Sheet ${i + 1} thickness (in)`).fill(t);
  }
  await line.getByLabel('Rivet kind').selectOption({ label: v.kind });
  await line.getByLabel('Diameter').selectOption({ label: v.diameter });
}

describe('a member planning an assembly on a phone', () => {
  it('enters two rivet lines, sees the live estimate, saves, and holds the kit', async () => {
    const page = await signedInPhone(suite.browser, suite.app.url, 'member@example.org', DEMO_PASSWORD);
    await page.goto(`${suite.app.url}/builds`);
    await page.getByRole('button', { name: 'New build' }).click();
    await page.getByLabel('Build name').fill('Baggage door');
    await page.getByRole('button', { name: 'Start the build' }).click();
    await page.getByRole('link', { name: 'Add assembly to Baggage door' }).click();

    await page.getByLabel('Assembly name').fill('Door skin');
    const first = page.getByRole('group', { name: 'Rivet line 1' });
    await fillLine(first, { length: '20', pitch: '1', sheets: ['0.032', '0.032'], kind: 'Structural blind rivet', diameter: '5/32 in (−5)' });
    await first.getByLabel('Edge distance (in, optional)').fill('0.375');
    // Worked check (our own arithmetic): 20 in, e 0.375 in, p 1 in → 21 holes at 0.9625 in; 5/32 blind steps #40 → #30 → #20.
    const firstEstimate = page.getByRole('region', { name: 'Estimate for rivet line 1' });
    // The live estimate follows the typing: wait for the figures of the finished line, not an earlier one
    // (20 in at the default 1/8 in and 2D edge also makes 21 holes, at 0.975 in).
    await expect.poll(async () => firstEstimate.textContent(), { timeout: 5000 }).toContain('0.9625');
    expect(await firstEstimate.textContent()).toContain('Holes21');
    expect(await firstEstimate.textContent()).toMatch(/#40.*#30.*#20/);

    await page.getByRole('button', { name: 'Add a rivet line' }).click();
    const second = page.getByRole('group', { name: 'Rivet line 2' });
    await fillLine(second, { length: '12', pitch: '1', sheets: ['0.025', '0.025'], kind: 'Structural blind rivet', diameter: '1/8 in (−4)' });
    const totals = page.getByTestId('live-totals');
    await expect.poll(async () => totals.textContent(), { timeout: 5000 }).toMatch(/\d+ rivets/);
    await page.screenshot({ path: 'test-results/assembly-editor-phone.png', fullPage: true });

    await page.getByRole('button', { name: 'Save the assembly' }).click();
    await page.getByRole('heading', { name: 'Door skin', level: 1 }).waitFor({ timeout: 15_000 });
    await page.getByRole('button', { name: 'Hold the kit' }).click();
    const outcome = page.getByRole('status').filter({ hasText: /Holds placed/ });
    await outcome.waitFor({ timeout: 10_000 });
    await page.screenshot({ path: 'test-results/assembly-kit-held-phone.png', fullPage: true });
    await page.context().close();
  });
});
