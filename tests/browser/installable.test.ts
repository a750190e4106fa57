import type { Response } from 'playwright-core';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { builtAppWithChromium } from '../helpers/browser-suite';
import { serviceWorkerActive } from '../helpers/service-worker';

const suite = builtAppWithChromium();

interface ManifestIcon {
  src: string;
  sizes: string;
  type: string;
  purpose?: string;
}

async function fetchOk(path: string): Promise<globalThis.Response> {
  const res = await fetch(new URL(path, suite.app.url));
  expect(res.status, path).toBe(200);
  return res;
}

/** Width, height and the alpha of the top-left pixel (0 where the rounded corner is cut away). */
async function pngLook(path: string) {
  const res = await fetchOk(path);
  expect(res.headers.get('content-type')).toBe('image/png');
  const image = sharp(Buffer.from(await res.arrayBuffer()));
  const { width, height } = await image.metadata();
  const { data } = await image.ensureAlpha().raw().toBuffer({ resolveWithObject: true });
  return { size: `${width}x${height}`, cornerAlpha: data[3] };
}

describe('Gripline as an installable app', () => {
  it('links a web app manifest with our name, colours and icons at the usual sizes', async () => {
    const page = await suite.browser.newPage();
    await page.goto(`${suite.app.url}/sign-in`);
    const href = await page.locator('link[rel="manifest"]').getAttribute('href');
    const appleIcon = await page.locator('link[rel="apple-touch-icon"]').getAttribute('href');
    await page.close();

    const res = await fetchOk(href!);
    expect(res.headers.get('content-type')).toMatch(/^application\/manifest\+json/);
    const manifest = (await res.json()) as Record<string, unknown> & { icons: ManifestIcon[] };
    expect(manifest).toMatchObject({
      name: 'Gripline',
      short_name: 'Gripline',
      start_url: '/',
      scope: '/',
      display: 'standalone',
      theme_color: '#1d2b36',
    });
    expect(manifest.description).toEqual(expect.any(String));
    expect(manifest.background_color).toMatch(/^#[0-9a-f]{6}$/);

    const pngs = manifest.icons.filter((icon) => icon.type === 'image/png');
    for (const icon of pngs) {
      const look = await pngLook(icon.src);
      expect(look.size, icon.src).toBe(icon.sizes);
      // A maskable icon is filled to its edges (the system cuts its shape); the others keep the mark's round corners.
      expect(look.cornerAlpha, icon.src).toBe(icon.purpose === 'maskable' ? 255 : 0);
    }
    expect(pngs.map((icon) => `${icon.sizes} ${icon.purpose}`).sort()).toEqual(['192x192 any', '512x512 any', '512x512 maskable']);

    const svg = manifest.icons.find((icon) => icon.type === 'image/svg+xml')!;
    expect(await (await fetchOk(svg.src)).text()).toContain('<svg');
    expect(await pngLook(appleIcon!)).toEqual({ size: '180x180', cornerAlpha: 255 });
  });

  it('serves the service worker and the manifest for revalidation, never from a long-lived cache', async () => {
    for (const path of ['/sw.js', '/manifest.webmanifest']) {
      const cacheControl = (await fetchOk(path)).headers.get('cache-control') ?? '';
      expect(cacheControl, path).toMatch(/no-cache|max-age=0\b/);
      expect(cacheControl, path).not.toMatch(/immutable/);
    }
  });

  it('opens with no network once visited: the app shell, the fonts and the scanner come from its own cache', async () => {
    const context = await suite.browser.newContext({ serviceWorkers: 'allow', viewport: { width: 360, height: 780 } });
    const page = await context.newPage();
    await page.goto(`${suite.app.url}/sign-in`);
    expect(await serviceWorkerActive(page)).toBe(`${suite.app.url}/`);
    await page.reload();
    expect(await page.evaluate(() => navigator.serviceWorker.controller?.scriptURL)).toBe(`${suite.app.url}/sw.js`);

    const cached = await page.evaluate(async () => {
      const urls: string[] = [];
      for (const name of await caches.keys()) for (const request of await (await caches.open(name)).keys()) urls.push(new URL(request.url).pathname);
      return urls;
    });
    expect(cached).toContain('/index.html');
    expect(cached.some((url) => /\/assets\/zxing-qr-decoder-.*\.js$/.test(url))).toBe(true);
    expect(cached.filter((url) => url.endsWith('.woff2')).length).toBeGreaterThan(0);
    expect(cached.some((url) => url.startsWith('/api/'))).toBe(false);

    await context.setOffline(true);
    const failed: string[] = [];
    const errors: string[] = [];
    page.on('requestfailed', (request) => failed.push(new URL(request.url()).pathname));
    page.on('pageerror', (error) => errors.push(error.message));
    for (const path of ['/', '/scan', '/sign-in']) {
      const response: Response | null = await page.goto(`${suite.app.url}${path}`);
      expect(response?.status(), path).toBe(200);
      expect(response?.fromServiceWorker(), path).toBe(true);
      expect(page.url()).toMatch(new RegExp(`^${suite.app.url}`));
      // Signed out and offline, the shell shows while the sign-in check waits for the network.
      await page.getByText('Gripline', { exact: true }).first().waitFor();
      await page.screenshot({ path: `test-results/offline${path === '/' ? '-home' : path.replace('/', '-')}.png` });
    }
    expect(failed.filter((path) => !path.startsWith('/api/'))).toEqual([]);
    expect(errors).toEqual([]);

    // The scanner's decoder library is there to load without a network.
    const decoderChunk = cached.find((url) => url.includes('zxing-qr-decoder'))!;
    expect(await page.evaluate(async (url) => (await fetch(url)).ok, decoderChunk)).toBe(true);
    await context.close();
  });
});
