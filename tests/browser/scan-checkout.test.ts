import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { addBarcodeDetectorShim } from '../helpers/barcode-detector-shim';
import { demoToolCode, launchWithCameraOn, signedInPhone, startBuiltApp } from '../helpers/browser';
import { firstDecode, hasNativeQrReader, type FirstDecode } from '../helpers/first-decode';

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

/** The scripts a page fetched: the decoder library has a chunk of its own. */
function scriptsFetched(page: Page): string[] {
  const urls: string[] = [];
  page.on('request', (request) => {
    if (request.resourceType() === 'script') urls.push(request.url());
  });
  return urls;
}

function report(decoded: FirstDecode, note = '') {
  console.log(`scanner: first code read ${decoded.ms} ms after the camera started, ${decoded.path} path${note} (target < 500 ms)`);
}

describe('a member scanning a tool label with the phone camera', () => {
  it('sees the tool recognised, checks it out, and finds it under My loans', async () => {
    const page = await signedInPhone(browser, app.url, 'member@example.org', DEMO_PASSWORD);
    const decoded = firstDecode(page);
    const scripts = scriptsFetched(page);

    await page.getByRole('link', { name: 'Scan', exact: true }).click();
    await page.waitForURL(new RegExp(`/tools/${code}$`), { timeout: 15_000 });
    await page.getByRole('heading', { name: 'Rivet spacing fan, 10 hole' }).waitFor();
    expect(await page.getByText('Wall rack').isVisible()).toBe(true);

    const native = await hasNativeQrReader(page);
    const { path, ms } = await decoded;
    expect(path).toBe(native ? 'native' : 'zxing');
    expect(scripts.some((url) => url.includes('zxing'))).toBe(!native);
    expect(ms).toBeGreaterThanOrEqual(0);
    report({ path, ms });

    await page.getByRole('button', { name: `Check out ${code}` }).click();
    await page.getByRole('button', { name: `Return ${code}` }).waitFor();
    await page.screenshot({ path: 'test-results/scan-checked-out-phone.png', fullPage: true });

    await page.getByRole('link', { name: 'My loans' }).click();
    const mine = page.getByRole('link', { name: new RegExp(`${code}.*Rivet spacing fan, 10 hole`) });
    await mine.waitFor();
    expect(await mine.isVisible()).toBe(true);
    await page.context().close();
  });

  it("reads the label with the browser's own detector where there is one, without fetching the decoder library", async () => {
    const page = await signedInPhone(browser, app.url, 'kelechi.obi@example.org', DEMO_PASSWORD, { prepare: addBarcodeDetectorShim });
    const decoded = firstDecode(page);
    const scripts = scriptsFetched(page);

    await page.getByRole('link', { name: 'Scan', exact: true }).click();
    await page.waitForURL(new RegExp(`/tools/${code}$`), { timeout: 15_000 });
    await page.getByRole('heading', { name: 'Rivet spacing fan, 10 hole' }).waitFor();

    const { path, ms } = await decoded;
    expect(path).toBe('native');
    expect(await page.evaluate(() => (window as unknown as { __barcodeDetections: number }).__barcodeDetections)).toBeGreaterThan(0);
    expect(scripts.filter((url) => url.includes('zxing'))).toEqual([]);
    report({ path, ms }, ' (a jsQR stand-in for the detector)');
    await page.context().close();
  });
});
