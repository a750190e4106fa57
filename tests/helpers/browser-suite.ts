import type { Browser } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';
import { launchChromium, startBuiltApp, type BuiltApp } from './browser';

export interface BrowserSuite {
  readonly app: BuiltApp;
  readonly browser: Browser;
}

/**
 * The built app and Chromium for one test file: started before its tests, closed after them
 * (the browser first, then the app). Read `app` and `browser` inside hooks and tests.
 */
export function builtAppWithChromium(): BrowserSuite {
  let app: BuiltApp | undefined;
  let browser: Browser | undefined;
  beforeAll(async () => {
    app = await startBuiltApp();
    browser = await launchChromium();
  });
  afterAll(async () => {
    await browser?.close();
    await app?.close();
  });
  return {
    get app() {
      if (!app) throw new Error('The built app is not started: read it inside a test or hook.');
      return app;
    },
    get browser() {
      if (!browser) throw new Error('Chromium is not launched: read it inside a test or hook.');
      return browser;
    },
  };
}
