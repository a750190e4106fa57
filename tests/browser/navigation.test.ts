import type { Locator, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import type { Role } from '../../shared/roles';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { signedInPhone } from '../helpers/browser';
import { builtAppWithChromium } from '../helpers/browser-suite';

const suite = builtAppWithChromium();
const SHOTS = 'test-results';

const ERROR_HEADINGS = /^(Page not found|Something went wrong|Not for your role|Error \d+)$/;

/** What each role finds in the navigation, by group: written out here, not read from the app's table. */
const MEMBER = { '': ['Home'], Crib: ['Scan', 'Tools'], Stock: ['Bins'], Builds: ['My builds'], Chapter: ['Settings'], Mine: ['My loans', 'My tab', 'My mail'] };
const QUARTERMASTER = {
  '': ['Home'],
  Crib: ['Scan', 'Tools', 'Service', 'Labels', 'Stations'],
  Stock: ['Bins', 'Restock', 'Reorder alerts', 'Forecast', 'Payments'],
  Builds: ['My builds'],
  Chapter: ['Settings'],
  Mine: ['My loans', 'My tab', 'My mail'],
};
const LEAD = {
  '': ['Home'],
  Crib: ['Scan', 'Tools', 'Overdue', 'Service', 'Labels', 'Stations'],
  Stock: ['Bins', 'Restock', 'Reorder alerts', 'Forecast', 'Consumables', 'Payments'],
  Builds: ['My builds'],
  Chapter: ['Overview', 'People', 'Sign-offs', 'Sent mail', 'Settings'],
  Mine: ['My loans', 'My tab', 'My mail'],
};
const SEES: Record<Role, Record<string, string[]>> = { member: MEMBER, quartermaster: QUARTERMASTER, lead: LEAD };
const ROLES = Object.keys(SEES) as Role[];
/** The phone's bottom bar, left to right; everything else is in the Menu. */
const BAR = ['Home', 'My loans', 'Scan', 'Tools', 'Menu'];
const groupsOf = (role: Role) => Object.keys(SEES[role]).filter((g) => g !== '');

/** Signed in as the demo `role`, phone-sized or laptop-sized. */
const signedIn = (role: Role, width: number) =>
  signedInPhone(suite.browser, suite.app.url, `${role}@example.org`, DEMO_PASSWORD, { context: { viewport: { width, height: width < 600 ? 780 : 900 } } });

const names = (items: Locator) => items.evaluateAll((els) => els.map((el) => (el.textContent ?? '').trim()));

/** Waits for the page that `label` leads to and answers its heading; an error page fails. */
async function landedOn(page: Page, label: string): Promise<string> {
  const heading = page.locator('h1:not([data-left])');
  await heading.waitFor();
  const text = (await heading.textContent())?.trim() ?? '';
  expect(text, `${label} opens its page at ${page.url()}`).not.toMatch(ERROR_HEADINGS);
  return text;
}

/** Marks the page being left, unless the link leads where we are (Home, just after signing in). */
const markLeft = (link: Locator) =>
  link.evaluate((a) => {
    if (a.getAttribute('aria-current') !== 'page') document.querySelector('h1')?.setAttribute('data-left', '');
  });

describe.each(ROLES)('the navigation of a %s on a laptop (1280 px)', (role) => {
  it('is one column down the side, grouped by job; every link opens its page and is marked as the current place', async () => {
    const page = await signedIn(role, 1280);
    const nav = page.getByRole('navigation', { name: 'Main' });
    expect(await nav.count()).toBe(1);
    const links = nav.getByRole('link');
    expect(await names(links)).toEqual(Object.values(SEES[role]).flat());
    const groups = nav.getByRole('group');
    expect(await names(groups.locator('p'))).toEqual(groupsOf(role));
    for (const group of groupsOf(role)) {
      expect(await names(nav.getByRole('group', { name: new RegExp(`^${group}`) }).getByRole('link'))).toEqual(SEES[role][group]);
    }
    // No wall of tabs: one column of links, each under the one before.
    const boxes = await links.evaluateAll((els) => els.map((el) => el.getBoundingClientRect()).map((r) => ({ x: r.x, y: r.y, height: r.height })));
    expect(new Set(boxes.map((b) => Math.round(b.x))).size).toBe(1);
    for (let i = 1; i < boxes.length; i++) expect(boxes[i]!.y).toBeGreaterThan(boxes[i - 1]!.y);
    // WCAG 2.2 target size (minimum) is 24 px; the rows are denser than on a phone.
    expect(Math.min(...boxes.map((b) => b.height))).toBeGreaterThanOrEqual(32);
    // The phone's bar is not shown.
    expect(await page.getByRole('button', { name: /^Menu/ }).count()).toBe(0);

    for (const [group, labels] of Object.entries(SEES[role])) {
      for (const label of labels) {
        const link = nav.getByRole('link', { name: label, exact: true });
        await markLeft(link);
        await link.click();
        await landedOn(page, label);
        expect(await nav.locator('[aria-current="page"]').allTextContents()).toEqual([label]);
        const here = await nav.getByRole('group', { name: /\(you are here\)$/ }).locator('p').allTextContents();
        expect(here).toEqual(group === '' ? [] : [`${group} (you are here)`]);
      }
    }
    if (role === 'lead') await page.screenshot({ path: `${SHOTS}/navigation-lead-1280.png` });
    await page.context().close();
  });
});

describe.each(ROLES)('the navigation of a %s on a phone (360 px)', (role) => {
  it('has Scan in the middle of the bottom bar and the rest in a Menu that the keyboard opens and closes', async () => {
    const page = await signedIn(role, 360);
    const nav = page.getByRole('navigation', { name: 'Main' });
    expect(await nav.count()).toBe(1);
    const slots = nav.locator(':scope > ul > li');
    expect(await names(slots)).toEqual(BAR);
    const boxes = await slots.evaluateAll((els) => els.map((el) => el.getBoundingClientRect()).map((r) => ({ x: r.x, width: r.width, bottom: r.bottom })));
    const scanBox = await nav.getByRole('link', { name: 'Scan' }).boundingBox();
    expect(Math.abs(scanBox!.x + scanBox!.width / 2 - 180)).toBeLessThan(4);
    expect(Math.min(...boxes.map((b) => b.width))).toBeGreaterThanOrEqual(44);
    expect(Math.round(boxes[0]!.bottom)).toBe(780);
    // Scan stands out: the one filled slot.
    const fills = await nav.getByRole('link').evaluateAll((els) => els.map((el) => getComputedStyle(el).backgroundColor));
    expect(fills.filter((c) => c !== 'rgba(0, 0, 0, 0)')).toHaveLength(1);
    expect(fills[BAR.indexOf('Scan')]).not.toBe('rgba(0, 0, 0, 0)');

    // The Menu opens from the keyboard, takes focus, lists the rest by group, and Escape closes it.
    const menuButton = nav.getByRole('button', { name: /^Menu/ });
    const dialog = page.getByRole('dialog', { name: 'Menu' });
    await menuButton.focus();
    await page.keyboard.press('Enter');
    await dialog.waitFor();
    await expect.poll(() => menuButton.getAttribute('aria-expanded')).toBe('true');
    expect(await page.evaluate(() => !!document.activeElement?.closest('dialog[open]'))).toBe(true);
    const inMenu = Object.values(SEES[role]).flat().filter((label) => !BAR.includes(label));
    expect(await names(dialog.getByRole('link'))).toEqual(inMenu);
    const menuGroups = groupsOf(role).filter((g) => SEES[role][g]!.some((label) => !BAR.includes(label)));
    expect(await names(dialog.getByRole('group').locator('p'))).toEqual(menuGroups);
    const heights = await dialog.getByRole('link').evaluateAll((els) => els.map((el) => el.getBoundingClientRect().height));
    expect(Math.min(...heights)).toBeGreaterThanOrEqual(44);
    if (role === 'lead') await page.screenshot({ path: `${SHOTS}/navigation-lead-menu-360.png` });
    await page.keyboard.press('Escape');
    await dialog.waitFor({ state: 'hidden' });
    await expect.poll(() => menuButton.getAttribute('aria-expanded')).toBe('false');
    expect(await page.evaluate(() => document.activeElement?.textContent?.trim())).toBe('Menu');

    // Into a page of the Menu with the keyboard: the Menu button then says where you are.
    const target = inMenu[inMenu.length - 1]!;
    const group = groupsOf(role).find((g) => SEES[role][g]!.includes(target))!;
    await page.keyboard.press('Enter');
    await dialog.waitFor();
    await dialog.getByRole('link', { name: target, exact: true }).focus();
    await markLeft(dialog.getByRole('link', { name: target, exact: true }));
    await page.keyboard.press('Enter');
    expect(await landedOn(page, target)).toBeTruthy();
    await dialog.waitFor({ state: 'hidden' });
    expect(await menuButton.evaluate((el) => el.textContent?.replace(/\s+/g, ' ').trim())).toBe(`Menu, you are on ${target}`);
    expect(await menuButton.isVisible()).toBe(true);
    if (role === 'lead') await page.screenshot({ path: `${SHOTS}/navigation-lead-bar-360.png` });
    await menuButton.click();
    await dialog.waitFor();
    expect(await dialog.locator('[aria-current="page"]').allTextContents()).toEqual([target]);
    expect(await dialog.getByText(`You are on ${group} · ${target}.`).isVisible()).toBe(true);
    expect(await dialog.getByRole('group', { name: `${group} (you are here)` }).count()).toBe(1);
    if (role === 'lead') await page.screenshot({ path: `${SHOTS}/navigation-lead-menu-here-360.png` });
    await page.keyboard.press('Escape');

    // Every page of the Menu opens for this role; a bar page shows as current in the bar.
    for (const label of inMenu) {
      await menuButton.click();
      const link = dialog.getByRole('link', { name: label, exact: true });
      await markLeft(link);
      await link.click();
      await landedOn(page, label);
      await dialog.waitFor({ state: 'hidden' });
      expect(await menuButton.textContent()).toContain(label);
    }
    for (const label of BAR.slice(0, -1)) {
      const link = nav.getByRole('link', { name: label, exact: true });
      await markLeft(link);
      await link.click();
      await landedOn(page, label);
      expect(await nav.locator('[aria-current="page"]').allTextContents()).toEqual([label]);
      expect(await menuButton.textContent()).toBe('Menu');
    }
    await page.context().close();
  });
});
