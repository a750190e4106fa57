/**
 * `npm run bench:load`: how the built app loads on a slow hangar link. Chromium's network is
 * emulated at 1.6 Mbps down, 750 kbps up and 150 ms round trip (CDP
 * Network.emulateNetworkConditions). Each figure is measured against the same page served
 * uncompressed in the same run: a loopback relay in front of the same server drops the browser's
 * Accept-Encoding, so only the encoding differs. Not a Vitest test; figures are medians of a few
 * rounds, the two sides taking turns within each round.
 *
 * - sign-in, first content: navigation start to first contentful paint of /sign-in.
 * - home, first content: the member's home page, signed in.
 * - Scan ready, tap from home: the tap on Scan in the bottom bar to the Scan screen's ready mark.
 * - Scan ready, opened directly: navigation start of /scan to the ready mark.
 * The ready mark (`performance.mark('scan-ready')`, with `data-scan-ready` on the screen) is set
 * when the code entry is mounted: a USB scanner or typing works from then on, while the camera starts.
 * Cold is a new browser context (empty cache); warm is a second visit in the same context.
 */
import { createServer, request, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { Browser, BrowserContext, CDPSession, Page } from 'playwright-core';
import { launchChromium, startBuiltApp } from '../helpers/browser';
import { median } from './median';

const ROUNDS = Number(process.env.LOAD_BENCH_ROUNDS ?? 5);
const SLOW_LINK = { offline: false, latency: 150, downloadThroughput: 1_600_000 / 8, uploadThroughput: 750_000 / 8 };
const MEMBER = { email: 'member@example.org', password: 'gripline-demo' };
const TARGETS = { signInColdMs: 2000, scanWarmMs: 1000 };

type Side = 'brotli' | 'uncompressed';
type Measure = 'sign-in, first content' | 'home, first content' | 'Scan ready, tap from home' | 'Scan ready, opened directly';
type Visit = 'cold' | 'warm';
const MEASURES: Measure[] = ['sign-in, first content', 'home, first content', 'Scan ready, tap from home', 'Scan ready, opened directly'];

const samples = new Map<string, number[]>();
const bytes = new Map<string, number[]>();
const keyOf = (side: Side, measure: Measure, visit: Visit) => `${side}|${measure}|${visit}`;
function record(into: Map<string, number[]>, key: string, value: number) {
  into.set(key, [...(into.get(key) ?? []), value]);
}

/** The same server without compression: the relay forwards every request with Accept-Encoding removed. */
async function uncompressedRelay(port: number): Promise<{ url: string; server: Server }> {
  const server = createServer((req, res) => {
    const headers = { ...req.headers };
    delete headers['accept-encoding'];
    const upstream = request({ host: '127.0.0.1', port, method: req.method, path: req.url, headers }, (answer) => {
      res.writeHead(answer.statusCode!, answer.headers);
      answer.pipe(res);
    });
    upstream.on('error', () => res.destroy());
    req.pipe(upstream);
  });
  await new Promise<void>((ok) => server.listen(0, '127.0.0.1', ok));
  return { url: `http://localhost:${(server.address() as AddressInfo).port}`, server };
}

/** A phone-sized page on the slow link; counts the bytes that cross it. */
async function slowPage(context: BrowserContext): Promise<{ page: Page; transferred: () => number; reset: () => void }> {
  const page = await context.newPage();
  const cdp: CDPSession = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.emulateNetworkConditions', SLOW_LINK);
  let total = 0;
  cdp.on('Network.loadingFinished', (event: { encodedDataLength: number }) => {
    total += event.encodedDataLength;
  });
  return { page, transferred: () => total, reset: () => (total = 0) };
}

async function firstContentMs(page: Page): Promise<number> {
  await page.waitForFunction(() => performance.getEntriesByName('first-contentful-paint').length > 0, undefined, { timeout: 30_000 });
  return page.evaluate(() => performance.getEntriesByName('first-contentful-paint')[0]!.startTime);
}

async function scanReadyMs(page: Page, from: 'navigation' | 'tap'): Promise<number> {
  await page.locator('[data-scan-ready]').waitFor({ timeout: 30_000 });
  return page.evaluate((start) => {
    const ready = performance.getEntriesByName('scan-ready').at(-1)!.startTime;
    return start === 'tap' ? ready - performance.getEntriesByName('tap').at(-1)!.startTime : ready;
  }, from);
}

async function signInPage(browser: Browser, side: Side, base: string) {
  const context = await browser.newContext({ viewport: { width: 360, height: 780 } });
  const { page, transferred, reset } = await slowPage(context);
  for (const visit of ['cold', 'warm'] as const) {
    reset();
    await page.goto(`${base}/sign-in`);
    record(samples, keyOf(side, 'sign-in, first content', visit), await firstContentMs(page));
    await page.getByLabel('E-mail').waitFor();
    await page.waitForLoadState('networkidle');
    record(bytes, keyOf(side, 'sign-in, first content', visit), transferred());
  }
  await context.close();
}

/** A context already signed in (through the API, so no page asset is cached on the way). */
async function memberContext(browser: Browser, base: string): Promise<BrowserContext> {
  const context = await browser.newContext({ viewport: { width: 360, height: 780 } });
  const { token } = (await (await context.request.get(`${base}/api/auth/csrf`)).json()) as { token: string };
  const login = await context.request.post(`${base}/api/auth/login`, { data: MEMBER, headers: { 'X-CSRF-Token': token } });
  if (!login.ok()) throw new Error(`the demo member could not sign in: ${login.status()}`);
  return context;
}

async function homeThenScan(browser: Browser, side: Side, base: string) {
  const context = await memberContext(browser, base);
  const { page, transferred, reset } = await slowPage(context);
  for (const visit of ['cold', 'warm'] as const) {
    reset();
    await page.goto(`${base}/`);
    record(samples, keyOf(side, 'home, first content', visit), await firstContentMs(page));
    await page.getByRole('heading', { name: /Hello/ }).waitFor();
    await page.waitForLoadState('networkidle');
    record(bytes, keyOf(side, 'home, first content', visit), transferred());
    await page.evaluate(() => document.addEventListener('click', () => performance.mark('tap'), { capture: true, once: true }));
    await page.getByRole('link', { name: 'Scan', exact: true }).click();
    record(samples, keyOf(side, 'Scan ready, tap from home', visit), await scanReadyMs(page, 'tap'));
  }
  await context.close();
}

async function scanDirect(browser: Browser, side: Side, base: string) {
  const context = await memberContext(browser, base);
  const { page } = await slowPage(context);
  for (const visit of ['cold', 'warm'] as const) {
    await page.goto(`${base}/scan`);
    record(samples, keyOf(side, 'Scan ready, opened directly', visit), await scanReadyMs(page, 'navigation'));
  }
  await context.close();
}

const ms = (n: number) => `${(n / 1000).toFixed(2)} s`;

function report() {
  const rows: string[][] = [['measure', 'visit', 'brotli', 'uncompressed', 'ratio', 'bytes on the wire (br / plain)']];
  for (const measure of MEASURES) {
    for (const visit of ['cold', 'warm'] as const) {
      const a = median(samples.get(keyOf('brotli', measure, visit))!);
      const b = median(samples.get(keyOf('uncompressed', measure, visit))!);
      const ba = bytes.get(keyOf('brotli', measure, visit));
      const bb = bytes.get(keyOf('uncompressed', measure, visit));
      const sent = ba && bb ? `${(median(ba) / 1000).toFixed(0)} KB / ${(median(bb) / 1000).toFixed(0)} KB` : '';
      rows.push([measure, visit, ms(a), ms(b), `${(a / b).toFixed(2)}x`, sent]);
    }
  }
  const widths = rows[0]!.map((_, i) => Math.max(...rows.map((r) => r[i]!.length)));
  const line = (r: string[]) => r.map((cell, i) => (i >= 2 ? cell.padStart(widths[i]!) : cell.padEnd(widths[i]!))).join('  ');
  console.log(`\nLoad on an emulated slow link (1.6 Mbps down, 750 kbps up, 150 ms), median of ${ROUNDS} rounds:\n`);
  console.log(line(rows[0]!));
  console.log(widths.map((w) => '-'.repeat(w)).join('  '));
  for (const r of rows.slice(1)) console.log(line(r));

  const signIn = median(samples.get(keyOf('brotli', 'sign-in, first content', 'cold'))!);
  const scan = median(samples.get(keyOf('brotli', 'Scan ready, opened directly', 'warm'))!);
  const tap = median(samples.get(keyOf('brotli', 'Scan ready, tap from home', 'warm'))!);
  console.log(`\nTargets: sign-in first content cold ${ms(signIn)} (goal <= ${ms(TARGETS.signInColdMs)}): ${signIn <= TARGETS.signInColdMs ? 'met' : 'MISSED'}`);
  console.log(
    `         Scan ready warm ${ms(scan)} opened directly, ${ms(tap)} from a tap on home (goal <= ${ms(TARGETS.scanWarmMs)}): ${Math.max(scan, tap) <= TARGETS.scanWarmMs ? 'met' : 'MISSED'}`,
  );
}

async function main() {
  const app = await startBuiltApp();
  const relay = await uncompressedRelay(app.port);
  const browser = await launchChromium();
  try {
    const sides: [Side, string][] = [
      ['brotli', app.url],
      ['uncompressed', relay.url],
    ];
    for (let round = 0; round < ROUNDS; round++) {
      // Take turns so both sides see the same load from the rest of the machine.
      const order = round % 2 ? [...sides].reverse() : sides;
      for (const [side, base] of order) {
        await signInPage(browser, side, base);
        await homeThenScan(browser, side, base);
        await scanDirect(browser, side, base);
      }
      process.stdout.write(`round ${round + 1} of ${ROUNDS} done\n`);
    }
    report();
  } finally {
    await browser.close();
    await new Promise((ok) => relay.server.close(ok));
    await app.close();
  }
}

await main();
