import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import BetterSqlite3 from 'better-sqlite3';
import { chromium, type Browser, type BrowserContext, type BrowserContextOptions, type Page } from 'playwright-core';
import { readEnv } from '../../server/env';
import { ensureLanCertificate, type LanCertificate } from '../../server/lan/lan-certificate';
import { CLIENT_DIR, startGripline, type RunningGripline } from '../../server/main';
import { CHROMIUM } from './chromium-check';
import { writeQrVideo } from './fake-camera';

export const CHROMIUM_FLAGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** Debian's Chromium; a missing browser fails loudly, never skips. */
export function launchChromium(extraArgs: string[] = []): Promise<Browser> {
  if (!existsSync(CHROMIUM)) {
    throw new Error(`Chromium is not installed at ${CHROMIUM}. Install it with: apt-get install -y chromium`);
  }
  return chromium.launch({ executablePath: CHROMIUM, args: [...CHROMIUM_FLAGS, ...extraArgs] });
}

export interface BuiltAppOptions {
  /** Extra environment, e.g. `{ SEED_DEMO: 'false' }`. */
  env?: Record<string, string>;
  /** Serve HTTPS on a certificate made by start:lan's code for these names (the first is the URL's host). */
  lanHostNames?: string[];
}

export type BuiltApp = RunningGripline & { dir: string; lanCertificate?: LanCertificate };

/** The built app (npm test builds it first) on a free port with a temporary database and the demo chapter. */
export async function startBuiltApp(options: BuiltAppOptions = {}): Promise<BuiltApp> {
  if (!existsSync(join(CLIENT_DIR, 'index.html'))) {
    throw new Error('The client is not built: run `npm run build` (npm test does it first).');
  }
  const dir = mkdtempSync(join(tmpdir(), 'gripline-browser-'));
  const lanCertificate = options.lanHostNames && (await ensureLanCertificate({ dir, hostNames: options.lanHostNames, ipv4: [] }));
  const running = await startGripline(
    readEnv({
      PORT: '0',
      HOST: '127.0.0.1',
      DATABASE_PATH: join(dir, 'gripline.db'),
      LOG_LEVEL: 'silent',
      NODE_ENV: 'test',
      ...options.env,
    }),
    { lanCertificate, urlHost: options.lanHostNames?.[0] },
  );
  return {
    ...running,
    dir,
    lanCertificate,
    async close() {
      await running.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

/** The code of a demo tool, read from the running app's database. */
export function demoToolCode(app: BuiltApp, name: string): string {
  const db = new BetterSqlite3(join(app.dir, 'gripline.db'), { readonly: true });
  try {
    return (db.prepare('select code from tools where name = ?').get(name) as { code: string }).code;
  } finally {
    db.close();
  }
}

/**
 * Chromium whose fake camera shows a QR label of `code` (the video file is fixed per browser
 * process: one launch per code).
 */
export async function launchWithCameraOn(dir: string, code: string, extraArgs: string[] = []): Promise<Browser> {
  const video = join(dir, `${code}.y4m`);
  writeQrVideo(video, code);
  return launchWithCameraFile(video, extraArgs);
}

/**
 * Chromium whose fake camera plays `video`. Chromium opens the file each time a page starts the
 * camera, so a test may write another picture there while no page has the camera running.
 */
export function launchWithCameraFile(video: string, extraArgs: string[] = []): Promise<Browser> {
  return launchChromium([
    '--use-fake-ui-for-media-stream',
    '--use-fake-device-for-media-stream',
    `--use-file-for-fake-video-capture=${video}`,
    ...extraArgs,
  ]);
}

/**
 * A phone-sized page with the camera allowed, signed in as `email`, on its home page. `prepare`
 * may set up the context first (init scripts, listeners).
 */
export async function signedInPhone(
  browser: Browser,
  url: string,
  email: string,
  password: string,
  options: { context?: BrowserContextOptions; prepare?: (context: BrowserContext) => Promise<void> } = {},
): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 360, height: 780 }, ...options.context });
  await context.grantPermissions(['camera'], { origin: url });
  await options.prepare?.(context);
  const page = await context.newPage();
  await page.goto(`${url}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { name: /Hello/ }).waitFor();
  return page;
}
