import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { demoToolCode, signedInPhone } from '../helpers/browser';
import { builtAppWithChromium } from '../helpers/browser-suite';

const suite = builtAppWithChromium();

describe("the member's home on a phone", () => {
  it('puts a large Scan button first, then the day: loans, a tool set aside, an assembly short of kit; a tool opens from there', async () => {
    const page = await signedInPhone(suite.browser, suite.app.url, 'member@example.org', DEMO_PASSWORD);

    const scan = page.getByRole('link', { name: 'Scan a label' });
    const box = (await scan.boundingBox())!;
    expect(box.height).toBeGreaterThanOrEqual(56);
    expect(box.width).toBeGreaterThan(360 * 0.8);
    const outWithYou = page.getByRole('heading', { name: 'Out with you', level: 2 });
    await outWithYou.waitFor({ timeout: 10_000 });
    expect(box.y).toBeLessThan((await outWithYou.boundingBox())!.y);

    await page.getByText('Drill bit #30, jobber').waitFor();
    await page.getByRole('heading', { name: 'Your assemblies in progress' }).waitFor();
    expect(await page.getByRole('link', { name: /Right flap/ }).isVisible()).toBe(true);
    expect(await page.getByRole('link', { name: /^You owe \$[\d,.]+ on your tab\.$/ }).isVisible()).toBe(true);
    await page.screenshot({ path: 'test-results/home-member-phone.png', fullPage: true });

    const squeezer = demoToolCode(suite.app, 'Hand rivet squeezer');
    const setAside = page.locator('section', { has: page.getByRole('heading', { name: 'Set aside for you', level: 2 }) });
    await setAside.getByText(/^Set aside for you until /).waitFor();
    await setAside.getByRole('link', { name: /Hand rivet squeezer/ }).click();
    await page.waitForURL(`**/tools/${squeezer}`);
    await page.getByRole('heading', { name: 'Hand rivet squeezer', level: 1 }).waitFor();
    await page.context().close();
  });

  it('keeps each tool code on one line in My loans’ long Returned list at 360 px', async () => {
    const page = await signedInPhone(suite.browser, suite.app.url, 'member@example.org', DEMO_PASSWORD);
    await page.goto(`${suite.app.url}/loans`);
    const returned = page.locator('section, div').filter({ has: page.getByRole('heading', { name: 'Returned', level: 2 }) }).last();
    await returned.getByRole('link').first().waitFor();
    // A code broken at its hyphen ("T-" above "0051") is two lines tall; one line is at most its line height.
    const codes = await returned.getByRole('link').evaluateAll((links) =>
      links.map((link) => {
        const code = link.querySelector('.font-mono')!;
        return { code: code.textContent, height: code.getBoundingClientRect().height, line: parseFloat(getComputedStyle(code).lineHeight) };
      }),
    );
    expect(codes.length).toBeGreaterThan(5);
    expect(codes.filter((c) => c.height > c.line * 1.5)).toEqual([]);
    await page.context().close();
  });
});
