import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { readEnv } from '../../server/env';
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

/** The built app (npm test builds it first) on a free port with a temporary database and the demo chapter. */
export async function startBuiltApp(): Promise<RunningGripline & { dir: string }> {
  if (!existsSync(join(CLIENT_DIR, 'index.html'))) {
    throw new Error('The client is not built: run `npm run build` (npm test does it first).');
  }
  const dir = mkdtempSync(join(tmpdir(), 'gripline-browser-'));
  const running = await startGripline(
    readEnv({ PORT: '0', HOST: '127.0.0.1', DATABASE_PATH: join(dir, 'gripline.db'), LOG_LEVEL: 'silent', NODE_ENV: 'test' }),
  );
  return {
    ...running,
    dir,
    async close() {
      await running.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

/**
 * Chromium whose fake camera shows a QR label of `code` (the video file is fixed per browser
 * process: one launch per code).
 */
export async function launchWithCameraOn(dir: string, code: string): Promise<Browser> {
  const video = join(dir, `${code}.y4m`);
  writeQrVideo(video, code);
  return launchChromium(['--use-fake-ui-for-media-stream', '--use-fake-device-for-media-stream', `--use-file-for-fake-video-capture=${video}`]);
}

/** A phone-sized page with the camera allowed, signed in as `email`, on its home page. */
export async function signedInPhone(browser: Browser, url: string, email: string, password: string): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 360, height: 780 } });
  await context.grantPermissions(['camera'], { origin: url });
  const page = await context.newPage();
  await page.goto(`${url}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { name: /Hello/ }).waitFor();
  return page;
}
