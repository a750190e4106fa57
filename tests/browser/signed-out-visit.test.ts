import { describe, expect, it } from 'vitest';
import { builtAppWithChromium } from '../helpers/browser-suite';

const suite = builtAppWithChromium();

describe('a signed-out visitor', () => {
  it('opens the sign-in page with no error in the console: asking who is signed in is not a failure', async () => {
    const context = await suite.browser.newContext({ viewport: { width: 360, height: 780 } });
    const page = await context.newPage();
    const errors: string[] = [];
    page.on('console', (m) => {
      if (m.type() === 'error') errors.push(m.text());
    });
    const me = page.waitForResponse((r) => r.url().endsWith('/api/auth/me'));
    await page.goto(`${suite.app.url}/`);
    expect((await me).status()).toBe(200);
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    expect(errors).toEqual([]);
    await context.close();
  });
});
