import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { signedInPhone } from '../helpers/browser';
import { builtAppWithChromium } from '../helpers/browser-suite';

const suite = builtAppWithChromium();

describe('the quartermaster’s home on a phone', () => {
  it('shows what needs them today, each list under its own heading, and a line opens the place it is dealt with', async () => {
    const page = await signedInPhone(suite.browser, suite.app.url, 'quartermaster@example.org', DEMO_PASSWORD);
    const panel = page.getByTestId('quartermaster-today');
    await panel.waitFor({ timeout: 10_000 });
    const headings = await panel.getByRole('heading', { level: 2 }).allTextContents();
    expect(headings).toEqual(['What to order', 'Deliveries this week', 'Returns needing attention', 'Service and calibration due', 'Bins to count today', 'Recent write-offs']);
    await panel.getByText(/bins? to order, about \$/).waitFor();
    expect(await panel.getByText(/1 day late/).isVisible()).toBe(true);
    expect(await panel.getByText(/Throttle valve leaks air/).isVisible()).toBe(true);
    expect(await panel.getByText(/1 can by Ruth Lindqvist/).isVisible()).toBe(true);
    // Nothing runs off the side of a 360 px screen.
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(360);
    await page.screenshot({ path: 'test-results/home-quartermaster-phone.png', fullPage: true });

    const writeOff = panel.getByRole('link', { name: /Self-etching primer.*1 can by Ruth Lindqvist/ });
    const box = await writeOff.boundingBox();
    expect(box!.height).toBeGreaterThanOrEqual(44);
    await writeOff.click();
    await page.waitForURL(/\/bins\/B-\d+$/);
    await page.getByRole('heading', { level: 1, name: /Self-etching primer/ }).waitFor({ timeout: 10_000 });
    await page.context().close();
  });
});
