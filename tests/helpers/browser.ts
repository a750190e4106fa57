import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type Browser } from 'playwright-core';
import { readEnv } from '../../server/env';
import { CLIENT_DIR, startGripline, type RunningGripline } from '../../server/main';

export const CHROMIUM = '/usr/bin/chromium';
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
