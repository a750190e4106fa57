/**
 * `npm run bench:station`: how long the app keeps a member waiting through a checkout at the crib
 * station (badge, PIN, tool, Check out, Done), against the same checkout on their own phone, already
 * signed in, in the same run. Not a Vitest test; the figure that matters is the ratio, and the
 * count of the member's own inputs, never an absolute promise.
 *
 * Headless Chromium on the built app with the demo chapter. Codes go in through the USB scanner
 * field on both sides (a keyboard-mode scanner types the whole code and Enter at once), so the camera's
 * decode time, which is the same on both, is left out: `tests/browser/scan-checkout.test.ts` prints it.
 * Each round checks a different tool out at the station and another on the phone, in alternating
 * order, then returns both through the API.
 */
import { join } from 'node:path';
import BetterSqlite3 from 'better-sqlite3';
import type { Page } from 'playwright-core';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { launchChromium, signedInPhone, startBuiltApp, type BuiltApp } from '../helpers/browser';
import { qrTextsOnSheet } from '../helpers/label-sheet';
import { median } from './median';

const ROUNDS = 7;
const PIN = '2468';
const MEMBER = 'member@example.org';
const LAYOUT = 'thermal-1x1-2x1in';
/** Inputs the member makes at the station: the badge, four digits and OK, the tool, Check out, Done. */
const STATION_INPUTS = 1 + PIN.length + 1 + 1 + 1 + 1;
/** On the phone, already signed in and on Scan: the tool, Check out. */
const PHONE_INPUTS = 2;

const STEPS = ['badge read', 'PIN checked', 'tool opened', 'checked out', 'cleared (Done)'] as const;
type Step = (typeof STEPS)[number];

function readDb<T>(app: BuiltApp, read: (db: BetterSqlite3.Database) => T): T {
  const db = new BetterSqlite3(join(app.dir, 'gripline.db'), { readonly: true });
  try {
    return read(db);
  } finally {
    db.close();
  }
}

/** Tools the member may check out: on the shelf, no tray count to give, no sign-off they lack. */
function checkoutCodes(app: BuiltApp, count: number): string[] {
  const codes = readDb(app, (db) =>
    (
      db
        .prepare(
          `select code from tools t where status = 'available' and category <> 'temporary_fastener_tray'
             and (required_signoff_id is null or exists (select 1 from member_signoffs ms join users u on u.id = ms.user_id
                  where ms.signoff_id = t.required_signoff_id and u.email = ? and ms.revoked_at is null))
           order by code limit ?`,
        )
        .all(MEMBER, count) as { code: string }[]
    ).map((r) => r.code),
  );
  if (codes.length < count) throw new Error(`The demo crib has ${codes.length} tools the member may check out; ${count} are needed.`);
  return codes;
}

async function send(page: Page, url: string, method: 'PUT' | 'POST', path: string, data?: unknown) {
  const { token } = (await (await page.request.get(`${url}/api/auth/csrf`)).json()) as { token: string };
  const res = await page.request.fetch(`${url}${path}`, { method, data, headers: { 'X-CSRF-Token': token } });
  if (res.status() >= 300) throw new Error(`${method} ${path} answered ${res.status()}: ${await res.text()}`);
  return res;
}

const stepIs = (page: Page, step: string) => page.locator(`main[data-station-step="${step}"]`).waitFor();

/** Milliseconds from the input to the screen that follows it. */
async function timed(input: () => Promise<unknown>, answered: () => Promise<unknown>): Promise<number> {
  const started = performance.now();
  await input();
  await answered();
  return performance.now() - started;
}

async function stationCheckout(tablet: Page, badge: string, code: string): Promise<Record<Step, number>> {
  const scanner = (label: RegExp) => tablet.getByLabel(label);
  const times = {} as Record<Step, number>;
  times['badge read'] = await timed(
    () => scanner(/badge scanner/i).fill(badge).then(() => scanner(/badge scanner/i).press('Enter')),
    () => stepIs(tablet, 'pin'),
  );
  times['PIN checked'] = await timed(
    async () => {
      for (const digit of PIN) await tablet.getByRole('button', { name: digit, exact: true }).click();
      await tablet.getByRole('button', { name: 'OK' }).click();
    },
    () => stepIs(tablet, 'signed-in'),
  );
  const field = scanner(/scanner, or type a tool or bin code/i);
  times['tool opened'] = await timed(
    () => field.fill(code).then(() => field.press('Enter')),
    () => tablet.getByRole('button', { name: `Check out ${code}` }).waitFor(),
  );
  times['checked out'] = await timed(
    () => tablet.getByRole('button', { name: `Check out ${code}` }).click(),
    () => tablet.locator('main').getByRole('status').filter({ hasText: `${code} is yours until ` }).waitFor(),
  );
  times['cleared (Done)'] = await timed(
    () => tablet.getByRole('button', { name: 'Done', exact: true }).click(),
    () => stepIs(tablet, 'badge'),
  );
  return times;
}

async function phoneCheckout(phone: Page, url: string, code: string): Promise<number> {
  await phone.goto(`${url}/scan`);
  const field = phone.getByLabel('Or type the code on the label');
  await field.waitFor();
  return timed(
    async () => {
      await field.fill(code);
      await field.press('Enter');
      await phone.getByRole('button', { name: `Check out ${code}` }).click();
    },
    () => phone.getByRole('button', { name: `Return ${code}` }).waitFor(),
  );
}

const fmt = (ms: number) => `${(ms / 1000).toFixed(2)} s`;

async function main() {
  const app = await startBuiltApp();
  const browser = await launchChromium().catch(async (err: unknown) => {
    await app.close();
    throw err;
  });
  try {
    const memberId = readDb(app, (db) => (db.prepare('select id from users where email = ?').get(MEMBER) as { id: number }).id);
    const codes = checkoutCodes(app, ROUNDS * 2);

    const phone = await signedInPhone(browser, app.url, MEMBER, DEMO_PASSWORD);
    await send(phone, app.url, 'PUT', '/api/me/pin', { pin: PIN });

    const tablet = await signedInPhone(browser, app.url, 'quartermaster@example.org', DEMO_PASSWORD, { context: { viewport: { width: 800, height: 1100 } } });
    const sheet = await send(tablet, app.url, 'POST', '/api/labels/sheet', { layoutId: LAYOUT, people: [memberId] });
    const [badge] = qrTextsOnSheet(await sheet.body(), LAYOUT);
    if (!badge) throw new Error('The badge label did not read.');
    await tablet.goto(`${app.url}/stations`);
    await tablet.getByLabel('Station name').fill('Bench tablet');
    await tablet.getByRole('button', { name: 'Use this device as a station' }).click();
    await stepIs(tablet, 'badge');

    const station: Record<Step, number>[] = [];
    const stationTotals: number[] = [];
    const phoneTotals: number[] = [];
    for (let round = 0; round < ROUNDS; round++) {
      const [stationCode, phoneCode] = [codes[2 * round]!, codes[2 * round + 1]!];
      // Alternate which side goes first, so a burst of load from other work falls on both alike.
      const runStation = async () => {
        const times = await stationCheckout(tablet, badge, stationCode);
        station.push(times);
        stationTotals.push(STEPS.reduce((sum, s) => sum + times[s], 0));
      };
      const runPhone = async () => phoneTotals.push(await phoneCheckout(phone, app.url, phoneCode));
      if (round % 2) await runPhone().then(runStation);
      else await runStation().then(runPhone);
      for (const code of [stationCode, phoneCode]) await send(phone, app.url, 'POST', `/api/tools/${code}/return`, { condition: 'ok' });
    }

    console.log(`\nCrib station checkout, ${ROUNDS} rounds (medians, from each input to the screen that follows; inputs by scanner field and taps)`);
    for (const step of STEPS) console.log(`  ${step.padEnd(16)} ${fmt(median(station.map((t) => t[step])))}`);
    const stationMedian = median(stationTotals);
    const phoneMedian = median(phoneTotals);
    console.log(`  station, all steps  ${fmt(stationMedian)} over ${STATION_INPUTS} inputs by the member`);
    console.log(`  phone (baseline)    ${fmt(phoneMedian)} over ${PHONE_INPUTS} inputs, already signed in`);
    console.log(`  ratio station/phone ${(stationMedian / phoneMedian).toFixed(1)}`);
  } finally {
    await browser.close();
    await app.close();
  }
}

await main();
