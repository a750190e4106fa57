import { join } from 'node:path';
import BetterSqlite3 from 'better-sqlite3';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { demoToolCode, launchWithCameraFile, signedInPhone, startBuiltApp, type BuiltApp } from '../helpers/browser';
import { writeBlankVideo, writeQrVideo } from '../helpers/fake-camera';
import { qrTextsOnSheet } from '../helpers/label-sheet';

const LAYOUT = 'thermal-1x1-2x1in';
const PIN = '2468';
const TOOL = 'Rivet spacing fan, 10 hole';

let app: BuiltApp;
let browser: Browser;
/** What the tablet's fake camera shows: rewritten while no page has the camera running. */
let video: string;

beforeAll(async () => {
  app = await startBuiltApp();
  video = join(app.dir, 'camera.y4m');
  writeBlankVideo(video);
  browser = await launchWithCameraFile(video);
});
afterAll(async () => {
  await browser?.close();
  await app?.close();
});

function memberId(email: string): number {
  const db = new BetterSqlite3(join(app.dir, 'gripline.db'), { readonly: true });
  try {
    return (db.prepare('select id from users where email = ?').get(email) as { id: number }).id;
  } finally {
    db.close();
  }
}

/** A JSON-or-PDF call on the page's own session, with its CSRF token. */
async function send(page: Page, method: 'PUT' | 'POST', path: string, data: unknown) {
  const csrf = await page.request.get(`${app.url}/api/auth/csrf`);
  const { token } = (await csrf.json()) as { token: string };
  return page.request.fetch(`${app.url}${path}`, { method, data, headers: { 'X-CSRF-Token': token } });
}

describe('the crib station', () => {
  it('signs a member in by the printed badge and PIN, checks a tool out by camera, and clears after Done', async () => {
    const code = demoToolCode(app, TOOL);

    // The member sets a PIN on their own phone.
    const phone = await signedInPhone(browser, app.url, 'member@example.org', DEMO_PASSWORD);
    expect((await send(phone, 'PUT', '/api/me/pin', { pin: PIN })).status()).toBe(204);

    // A quartermaster prints the member's badge on the tablet, and the camera is pointed at it.
    const tablet = await signedInPhone(browser, app.url, 'quartermaster@example.org', DEMO_PASSWORD, {
      context: { viewport: { width: 800, height: 1100 } },
    });
    const sheet = await send(tablet, 'POST', '/api/labels/sheet', { layoutId: LAYOUT, people: [memberId('member@example.org')] });
    expect(sheet.status()).toBe(200);
    expect(sheet.headers()['content-type']).toBe('application/pdf');
    const [badge] = qrTextsOnSheet(await sheet.body(), LAYOUT);
    expect(badge).toMatch(/^\S{20,}$/);
    writeQrVideo(video, badge!);

    // The quartermaster makes the tablet a station; it opens on the badge screen with the camera running.
    await tablet.goto(`${app.url}/stations`);
    await tablet.getByLabel('Station name').fill('Crib door tablet');
    await tablet.getByRole('button', { name: 'Use this device as a station' }).click();
    await tablet.getByRole('heading', { name: 'Scan your badge' }).waitFor();

    // The camera reads the badge; while the PIN pad is up (no camera), the tool's label goes in front of it.
    await tablet.getByRole('heading', { name: 'Type your PIN' }).waitFor({ timeout: 15_000 });
    writeQrVideo(video, code);
    for (const digit of PIN) await tablet.getByRole('button', { name: digit, exact: true }).click();
    await tablet.getByRole('button', { name: 'OK' }).click();
    await tablet.getByRole('heading', { name: 'Hello, Marco Bellweather' }).waitFor();

    // The camera reads the tool; while its panel is up (no camera), the label is taken away; the member checks it out.
    await tablet.getByRole('heading', { name: `${code} · ${TOOL}` }).waitFor({ timeout: 15_000 });
    writeBlankVideo(video);
    await tablet.getByRole('button', { name: `Check out ${code}` }).click();
    await tablet.getByRole('status').filter({ hasText: `Done: ${code}.` }).waitFor();
    await tablet.screenshot({ path: 'test-results/crib-station-checked-out.png', fullPage: true });

    // Done: back to the badge screen, nothing of the member left on it.
    await tablet.getByRole('button', { name: 'Done', exact: true }).click();
    await tablet.getByRole('heading', { name: 'Scan your badge' }).waitFor();
    const left = await tablet.locator('main').innerText();
    expect(left).not.toContain('Marco');
    expect(left).not.toContain(code);

    // The loan is the member's, on their own phone.
    await phone.getByRole('link', { name: 'My loans' }).click();
    const mine = phone.getByRole('link', { name: new RegExp(`${code}.*${TOOL}`) });
    await mine.waitFor();
    expect(await mine.isVisible()).toBe(true);
  }, 60_000);
});
