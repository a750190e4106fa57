import { createHash, X509Certificate } from 'node:crypto';
import { once } from 'node:events';
import { readFileSync } from 'node:fs';
import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CLIENT_DIR } from '../../server/main';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { demoToolCode, launchChromium, launchWithCameraOn, signedInPhone, startBuiltApp, type BuiltApp } from '../helpers/browser';
import { buildTestApp } from '../helpers/test-app';

/** A name that is neither localhost nor 127.0.0.1, as a phone on the hangar network sees the laptop. */
const HOST = 'gripline.test';
const TOOL = 'Rivet spacing fan, 10 hole';

let app: BuiltApp;
let browser: Browser;
let code: string;

beforeAll(async () => {
  app = await startBuiltApp({ lanHostNames: [HOST] });
  code = demoToolCode(app, TOOL);
  browser = await launchWithCameraOn(app.dir, code, [`--host-resolver-rules=MAP ${HOST} 127.0.0.1`]);
});
afterAll(async () => {
  await browser?.close();
  await app?.close();
});

const cameraContext = (page: Page) =>
  page.evaluate(() => ({ secure: window.isSecureContext, camera: typeof navigator.mediaDevices?.getUserMedia === 'function' }));

describe('Gripline on a certificate made by npm run start:lan, opened by name on the network', () => {
  it('is served at https://gripline.test with the port it listens on', () => {
    expect(app.url).toBe(`https://${HOST}:${app.port}`);
  });

  it('over plain HTTP the same page is no secure context, so the camera is out of reach', async () => {
    // The same app and client over plain HTTP (createApp on a fresh database, no second scheduler).
    const plain = await buildTestApp({ clientDir: CLIENT_DIR });
    const server = createServer(plain.app).listen(0, '127.0.0.1');
    await once(server, 'listening');
    const context = await browser.newContext();
    try {
      const page = await context.newPage();
      await page.goto(`http://${HOST}:${(server.address() as AddressInfo).port}/sign-in`);
      await page.getByRole('button', { name: 'Sign in' }).waitFor();
      expect(await cameraContext(page)).toEqual({ secure: false, camera: false });
    } finally {
      await context.close();
      server.closeAllConnections();
      server.close();
      await plain.close();
    }
  });

  it('before the certificate is accepted, Chromium calls its authority unknown (a warning one can pass), not the certificate malformed', async () => {
    const context = await browser.newContext();
    try {
      const page = await context.newPage();
      await expect(page.goto(`${app.url}/sign-in`)).rejects.toThrow(/ERR_CERT_AUTHORITY_INVALID/);
    } finally {
      await context.close();
    }
  });

  it('once accepted, the page is a secure context: a member signs in and the fake camera scan opens the tool', async () => {
    const page = await signedInPhone(browser, app.url, 'member@example.org', DEMO_PASSWORD, { context: { ignoreHTTPSErrors: true } });
    expect(await cameraContext(page)).toEqual({ secure: true, camera: true });
    const session = (await page.context().cookies()).find((c) => c.name === 'gripline.sid');
    expect(session?.secure).toBe(true);

    await page.getByRole('link', { name: 'Scan', exact: true }).click();
    await page.waitForURL(new RegExp(`/tools/${code}$`), { timeout: 15_000 });
    await page.getByRole('heading', { name: TOOL }).waitFor();
    expect(await page.getByRole('button', { name: `Check out ${code}` }).isVisible()).toBe(true);
    await page.context().close();
  });

  it('offers the hangar certificate for download at /certificate, without signing in', async () => {
    const context = await browser.newContext({ ignoreHTTPSErrors: true, acceptDownloads: true });
    try {
      const page = await context.newPage();
      await page.goto(`${app.url}/sign-in`);
      const [download] = await Promise.all([
        page.waitForEvent('download'),
        page.evaluate(() => {
          const link = document.createElement('a');
          link.href = '/certificate';
          document.body.append(link);
          link.click();
        }),
      ]);
      expect(download.suggestedFilename()).toBe('gripline-gripline.crt');
      const pem = readFileSync(await download.path(), 'utf8');
      expect(pem).toMatch(/^-----BEGIN CERTIFICATE-----\n/);
      expect(pem).toBe(app.lanCertificate?.authority);
    } finally {
      await context.close();
    }
  });

  it('on a phone that trusts the certificate, the service worker installs and the app opens again with no network', async () => {
    // Trusting the hangar's certificate, as a phone does once it is installed: Chromium is told the
    // server key's fingerprint instead of being given the authority (no system store to change here).
    const serverCert = new X509Certificate(app.lanCertificate!.cert);
    const spki = createHash('sha256').update(serverCert.publicKey.export({ type: 'spki', format: 'der' })).digest('base64');
    const trusting = await launchChromium([`--host-resolver-rules=MAP ${HOST} 127.0.0.1`, `--ignore-certificate-errors-spki-list=${spki}`]);
    try {
      const page = await signedInPhone(trusting, app.url, 'member@example.org', DEMO_PASSWORD);
      await page.evaluate(() => navigator.serviceWorker.ready.then(() => undefined));
      await page.waitForFunction(() => navigator.serviceWorker.controller !== null);
      await page.getByRole('link', { name: 'Scan', exact: true }).click();
      await page.getByText(/^Offline copy on this phone, from just now/).waitFor({ timeout: 15_000 });

      await page.context().setOffline(true);
      await page.reload();
      await page.getByRole('heading', { name: 'Scan' }).waitFor();
      // The shell comes from the service worker's cache, the banner from the copy on the phone.
      await page.getByText(/^Offline — scans use the copy from/).waitFor();
      expect(await page.getByText(/^Offline copy on this phone/).isVisible()).toBe(true);
    } finally {
      await trusting.close();
    }
  });
});
