import type { Page } from 'playwright-core';

/** Waits until this page's service worker has finished installing (precache filled) and is active. */
export async function serviceWorkerActive(page: Page): Promise<string> {
  return page.evaluate(async () => {
    const registration = await navigator.serviceWorker.ready;
    const worker = registration.active!;
    if (worker.state !== 'activated') {
      await new Promise<void>((resolve) => worker.addEventListener('statechange', () => worker.state === 'activated' && resolve()));
    }
    return registration.scope;
  });
}
