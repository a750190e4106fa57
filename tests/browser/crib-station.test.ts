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

/** One row from the running app's database, read-only: what reached the server. */
function row<T>(sql: string, ...params: unknown[]): T {
  const db = new BetterSqlite3(join(app.dir, 'gripline.db'), { readonly: true });
  try {
    return db.prepare(sql).get(...params) as T;
  } finally {
    db.close();
  }
}

const memberId = (email: string): number => row<{ id: number }>('select id from users where email = ?', email).id;

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
    // The large type says what the toast says: whose it is and until when, so the member can read it from a step away.
    const said = tablet.locator('main').getByRole('status').filter({ hasText: `${code} is yours until ` });
    await said.waitFor();
    expect(await said.innerText()).toMatch(new RegExp(`^${code} is yours until \\w+day, \\w+ \\d{1,2}\\. Scan the next tool or bin, or tap Done\\.$`));
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

  it('goes on without the network from its copy: badge and PIN checked there, a checkout and a draw queued, both sent for each person once it is back', async () => {
    const tool = row<{ code: string; name: string }>(
      "select code, name from tools where status = 'available' and required_signoff_id is null and category <> 'temporary_fastener_tray' and name <> ? order by code limit 1",
      TOOL,
    );
    const bin = row<{ code: string; onHand: number }>('select code, on_hand as onHand from bins where on_hand >= 50 order by code limit 1');
    const people = [
      { email: 'member@example.org', name: 'Marco Bellweather' },
      { email: 'ines.parra@example.org', name: row<{ name: string }>("select name from users where email = 'ines.parra@example.org'").name },
    ];

    // Both set a PIN on their own phone; a quartermaster prints both badges and enrols a second tablet.
    for (const person of people) {
      const phone = await signedInPhone(browser, app.url, person.email, DEMO_PASSWORD);
      expect((await send(phone, 'PUT', '/api/me/pin', { pin: PIN })).status()).toBe(204);
      await phone.context().close();
    }
    const tablet = await signedInPhone(browser, app.url, 'quartermaster@example.org', DEMO_PASSWORD, {
      context: { viewport: { width: 800, height: 1100 } },
    });
    const sheet = await send(tablet, 'POST', '/api/labels/sheet', { layoutId: LAYOUT, people: people.map((p) => memberId(p.email)) });
    const [marcoBadge, inesBadge] = qrTextsOnSheet(await sheet.body(), LAYOUT);
    await tablet.goto(`${app.url}/stations`);
    await tablet.getByLabel('Station name').fill('Hangar B tablet');
    await tablet.getByRole('button', { name: 'Use this device as a station' }).click();
    await tablet.getByText(/^Ready without the network: copy from/).waitFor({ timeout: 15_000 });

    const scanner = (label: RegExp, code: string) => tablet.getByLabel(label).fill(code).then(() => tablet.getByLabel(label).press('Enter'));
    const pin = async (digits: string) => {
      for (const digit of digits) await tablet.getByRole('button', { name: digit, exact: true }).click();
      await tablet.getByRole('button', { name: 'OK' }).click();
    };

    // The Wi-Fi drops. A stranger's QR is refused at once; Marco's badge and PIN are checked against the copy.
    await tablet.context().setOffline(true);
    await tablet.getByText(/^No connection: badges and PINs are checked against the copy/).waitFor();
    await scanner(/badge scanner/i, 'https://example.com/not-a-badge');
    await tablet.getByText(/not a Gripline badge/).waitFor();
    expect(await tablet.locator('main').getAttribute('data-station-step')).toBe('badge');
    await scanner(/badge scanner/i, marcoBadge!);
    await tablet.locator('main[data-station-step="pin"]').waitFor();
    await pin('1357');
    await tablet.getByText(/That PIN is not right: 4 tries left/).waitFor();
    await pin(PIN);
    await tablet.getByRole('heading', { name: 'Hello, Marco Bellweather' }).waitFor();
    await tablet.getByText('No connection: what you do here is sent when it is back.').waitFor();
    await scanner(/scanner, or type a tool or bin code/i, tool.code);
    await tablet.getByRole('button', { name: `Check out ${tool.code}` }).click();
    await tablet.getByRole('status').filter({ hasText: `Waiting to send: ${tool.code}.` }).waitFor();
    await tablet.getByRole('button', { name: 'Done', exact: true }).click();

    // Ines next: she draws five from a bin.
    await tablet.locator('main[data-station-step="badge"]').waitFor();
    await scanner(/badge scanner/i, inesBadge!);
    await pin(PIN);
    await tablet.getByRole('heading', { name: `Hello, ${people[1]!.name}` }).waitFor();
    await scanner(/scanner, or type a tool or bin code/i, bin.code);
    await tablet.getByLabel('Quantity to draw').fill('5');
    await tablet.getByRole('button', { name: `Draw from ${bin.code}` }).click();
    await tablet.getByRole('status').filter({ hasText: `Waiting to send: ${bin.code}.` }).waitFor();
    await tablet.getByRole('button', { name: 'Done', exact: true }).click();
    await tablet.getByText('2 actions wait to be sent.').waitFor();
    await tablet.screenshot({ path: 'test-results/crib-station-offline-waiting.png', fullPage: true });
    expect(row<{ n: number }>("select count(*) as n from loans where returned_at is null and tool_id = (select id from tools where code = ?)", tool.code).n).toBe(0);

    // The Wi-Fi is back: each person's action reaches the server as theirs, made at this station.
    await tablet.context().setOffline(false);
    await tablet.getByText(/waits? to be sent./).waitFor({ state: 'detached', timeout: 30_000 });
    const loan = row<{ holder: string }>(
      'select u.email as holder from loans l join users u on u.id = l.user_id where l.returned_at is null and l.tool_id = (select id from tools where code = ?)',
      tool.code,
    );
    expect(loan.holder).toBe('member@example.org');
    const draw = row<{ who: string; station: string; quantity: number }>(
      "select u.email as who, s.name as station, abs(m.quantity) as quantity from stock_movements m join users u on u.id = m.member_id join stations s on s.id = m.station_id where m.kind = 'draw' and m.bin_id = (select id from bins where code = ?) order by m.id desc limit 1",
      bin.code,
    );
    expect(draw).toEqual({ who: 'ines.parra@example.org', station: 'Hangar B tablet', quantity: 5 });
    const event = row<{ station: string }>(
      'select s.name as station from tool_events e join stations s on s.id = e.station_id where e.tool_id = (select id from tools where code = ?) order by e.id desc limit 1',
      tool.code,
    );
    expect(event.station).toBe('Hangar B tablet');
    expect(row<{ onHand: number }>('select on_hand as onHand from bins where code = ?', bin.code).onHand).toBe(bin.onHand - 5);
    await tablet.context().close();
  }, 90_000);
});
