import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { demoToolCode, launchWithCameraOn, signedInPhone, startBuiltApp } from '../helpers/browser';

let app: Awaited<ReturnType<typeof startBuiltApp>>;
let browser: Browser;
let code: string;

beforeAll(async () => {
  app = await startBuiltApp();
  code = demoToolCode(app, 'Rivet spacing fan, 10 hole');
  browser = await launchWithCameraOn(app.dir, code);
});
afterAll(async () => {
  await browser?.close();
  await app?.close();
});

describe('a member scanning a tool label with the phone camera', () => {
  it('sees the tool recognised, checks it out, and finds it under My loans', async () => {
    const page = await signedInPhone(browser, app.url, 'member@example.org', DEMO_PASSWORD);

    await page.getByRole('link', { name: 'Scan' }).click();
    await page.waitForURL(new RegExp(`/tools/${code}$`), { timeout: 15_000 });
    await page.getByRole('heading', { name: 'Rivet spacing fan, 10 hole' }).waitFor();
    expect(await page.getByText('Wall rack').isVisible()).toBe(true);

    await page.getByRole('button', { name: `Check out ${code}` }).click();
    await page.getByRole('button', { name: `Return ${code}` }).waitFor();
    await page.screenshot({ path: 'test-results/scan-checked-out-phone.png', fullPage: true });

    await page.getByRole('link', { name: 'My loans' }).click();
    const mine = page.getByRole('link', { name: new RegExp(`${code}.*Rivet spacing fan, 10 hole`) });
    await mine.waitFor();
    expect(await mine.isVisible()).toBe(true);
    await page.context().close();
  });
});
