import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { demoToolCode, signedInPhone } from '../helpers/browser';
import { builtAppWithChromium } from '../helpers/browser-suite';

const suite = builtAppWithChromium();

describe('a member borrowing a rivet puller with its nosepieces', () => {
  it('ticks the nosepiece taken, sees it under My loans, returns without it, and the tool page shows it missing', async () => {
    const code = demoToolCode(suite.app, 'Hand rivet puller, short handle');
    const page = await signedInPhone(suite.browser, suite.app.url, 'member@example.org', DEMO_PASSWORD);
    await page.goto(`${suite.app.url}/tools/${code}`);
    await page.getByRole('group', { name: 'Tick what you take with it' }).getByLabel('Nosepiece 1/8').check();
    await page.getByRole('button', { name: `Check out ${code}` }).click();

    const back = page.getByRole('group', { name: 'Tick what came back with it' });
    await back.waitFor({ timeout: 10_000 });
    expect(await back.getByRole('checkbox').count()).toBe(1);
    await page.screenshot({ path: 'test-results/return-accessories-phone.png', fullPage: true });

    await page.getByRole('link', { name: 'My loans' }).click();
    await page.getByText('With: Nosepiece 1/8').waitFor();
    expect(await page.getByText(/Nosepiece 3\/32/).count()).toBe(0);

    await page.goto(`${suite.app.url}/tools/${code}`);
    await page.getByRole('button', { name: `Return ${code}` }).click();
    await page.getByRole('heading', { name: 'Missing accessories' }).waitFor({ timeout: 10_000 });
    expect(await page.getByText(/Nosepiece 1\/8 did not come back from Marco Bellweather/).isVisible()).toBe(true);
    await page.screenshot({ path: 'test-results/tool-missing-accessory-phone.png', fullPage: true });
    await page.context().close();
  });
});
