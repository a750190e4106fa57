import { join } from 'node:path';
import BetterSqlite3 from 'better-sqlite3';
import { request, type Browser, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { launchChromium, signedInPhone, startBuiltApp } from '../helpers/browser';

let app: Awaited<ReturnType<typeof startBuiltApp>>;
let browser: Browser;
let tools: { code: string; name: string }[];
let bin: { code: string; onHand: number };
let member: { id: number };
let ines: { name: string };

/** Reads the running app's database, read-only, for what reached the server. */
function queryAll<T>(sql: string, ...params: unknown[]): T[] {
  const db = new BetterSqlite3(join(app.dir, 'gripline.db'), { readonly: true });
  try {
    return db.prepare(sql).all(...params) as T[];
  } finally {
    db.close();
  }
}
const query = <T>(sql: string, ...params: unknown[]): T => queryAll<T>(sql, ...params)[0]!;

const loansOf = (code: string, userId: number) =>
  query<{ all: number; open: number }>(
    'select count(*) as "all", count(*) filter (where returned_at is null) as open from loans where user_id = ? and tool_id = (select id from tools where code = ?)',
    userId,
    code,
  );
const drawsOf = (code: string, userId: number) =>
  query<{ n: number }>("select count(*) as n from stock_movements where kind = 'draw' and member_id = ? and bin_id = (select id from bins where code = ?)", userId, code).n;
const onHandOf = (code: string) => query<{ onHand: number }>('select on_hand as onHand from bins where code = ?', code).onHand;

/** Signed in, with the phone's offline copy taken (the Scan screen says so). */
async function memberWithOfflineCopy(): Promise<Page> {
  const page = await signedInPhone(browser, app.url, 'member@example.org', DEMO_PASSWORD);
  await page.getByRole('link', { name: 'Scan', exact: true }).click();
  await page.getByText(/^Offline copy on this phone, from just now/).waitFor({ timeout: 15_000 });
  return page;
}

/** Types a label's code on the Scan screen, as a USB scanner would. */
async function scan(page: Page, code: string): Promise<void> {
  await page.getByRole('link', { name: 'Scan', exact: true }).click();
  await page.getByLabel('Or type the code on the label').fill(code);
  await page.getByRole('button', { name: 'Open' }).click();
}

beforeAll(async () => {
  app = await startBuiltApp();
  tools = queryAll(
    "select code, name from tools where status = 'available' and required_signoff_id is null and category <> 'temporary_fastener_tray' order by code limit 2",
  );
  bin = query("select code, on_hand as onHand from bins where on_hand >= 50 order by code limit 1");
  member = query("select id from users where email = 'member@example.org'");
  ines = query("select name from users where email = 'ines.parra@example.org'");
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
  await app?.close();
});

describe('a member scanning with no connection', () => {
  it('checks a tool out and draws from a bin from the offline copy, and both reach the server exactly once when the connection is back', async () => {
    const [tool] = tools;
    const loansBefore = loansOf(tool!.code, member.id);
    const drawsBefore = drawsOf(bin.code, member.id);
    const page = await memberWithOfflineCopy();
    await page.context().setOffline(true);

    await scan(page, tool!.code);
    await page.getByRole('heading', { name: tool!.name }).waitFor();
    expect(await page.getByText(/^Offline copy from just now/).isVisible()).toBe(true);
    expect(await page.getByText(/^Offline — scans use the copy from just now/).isVisible()).toBe(true);
    await page.getByRole('button', { name: `Check out ${tool!.code}` }).click();
    await page.getByRole('link', { name: '1 action waiting to send' }).waitFor();
    expect(await page.getByRole('button', { name: `Return ${tool!.code}` }).isVisible()).toBe(true);

    await scan(page, bin.code);
    await page.getByLabel('Quantity to draw').fill('5');
    await page.getByRole('button', { name: `Draw from ${bin.code}` }).click();
    await page.getByRole('link', { name: '2 actions waiting to send' }).waitFor();
    await page.screenshot({ path: 'test-results/offline-queue-waiting-phone.png', fullPage: true });
    expect(loansOf(tool!.code, member.id)).toEqual(loansBefore);

    // The first check out reaches the server but its answer is lost on the way back: the phone
    // keeps it and sends it again later with the same key, and the server applies it once.
    const checkoutKeys: string[] = [];
    let firstAnswer = 0;
    await page.route(`**/api/tools/${tool!.code}/checkout`, async (route) => {
      checkoutKeys.push(route.request().headers()['idempotency-key'] ?? '');
      if (checkoutKeys.length === 1) {
        firstAnswer = (await route.fetch()).status();
        await route.abort('connectionreset');
      } else {
        await route.continue();
      }
    });
    await page.context().setOffline(false);
    await page.getByRole('link', { name: /waiting to send/ }).waitFor({ state: 'detached', timeout: 30_000 });

    expect(firstAnswer).toBe(201);
    expect(checkoutKeys).toHaveLength(2);
    expect(checkoutKeys[1]).toBe(checkoutKeys[0]);
    expect(loansOf(tool!.code, member.id)).toEqual({ all: loansBefore.all + 1, open: 1 });
    expect(drawsOf(bin.code, member.id)).toBe(drawsBefore + 1);
    expect(onHandOf(bin.code)).toBe(bin.onHand - 5);
    // Back online, the bin page is the server's again, with the new figure.
    // (the sent draw refreshes the bin's query; on a loaded machine the refetch lands a moment later).
    await page.getByTestId('bin-on-hand').waitFor();
    await expect
      .poll(async () => Number((await page.getByTestId('bin-on-hand').textContent())!.replace(/,/g, '')), { timeout: 10_000 })
      .toBe(bin.onHand - 5);
    await page.context().close();
  });

  it('shows a queued check out the server refused, because someone checked the tool out meanwhile, with the reason in Not sent', async () => {
    const [, tool] = tools;
    const page = await memberWithOfflineCopy();
    await page.context().setOffline(true);
    await scan(page, tool!.code);
    await page.getByRole('button', { name: `Check out ${tool!.code}` }).click();
    await page.getByRole('link', { name: '1 action waiting to send' }).waitFor();

    // Ines, online at the other end of the hangar, takes the same tool.
    const other = await request.newContext({ baseURL: app.url });
    const { token } = (await (await other.get('/api/auth/csrf')).json()) as { token: string };
    const login = await other.post('/api/auth/login', { headers: { 'X-CSRF-Token': token }, data: { email: 'ines.parra@example.org', password: DEMO_PASSWORD } });
    const { csrfToken } = (await login.json()) as { csrfToken: string };
    const taken = await other.post(`/api/tools/${tool!.code}/checkout`, { headers: { 'X-CSRF-Token': csrfToken }, data: {} });
    expect(taken.status()).toBe(201);
    await other.dispose();

    await page.context().setOffline(false);
    await page.getByRole('link', { name: '1 not sent — see why' }).click();
    await page.getByRole('heading', { name: 'Waiting to send', level: 1 }).waitFor();
    expect(await page.title()).toBe('Waiting to send · Gripline');
    await page.getByRole('heading', { name: 'Not sent (1)' }).waitFor();
    expect(await page.getByText(`Check out ${tool!.code}`, { exact: true }).first().isVisible()).toBe(true);
    expect(await page.getByText(new RegExp(`${tool!.code} is on loan\\. ${ines.name} has it until [A-Z][a-z]+day, `)).isVisible()).toBe(true);
    expect(await page.getByText('Someone else has the tool: put it back on the shelf or join the queue for it.').isVisible()).toBe(true);
    expect(await page.getByRole('heading', { name: 'Waiting to send (0)' }).isVisible()).toBe(true);
    await page.screenshot({ path: 'test-results/offline-queue-not-sent-phone.png', fullPage: true });
    expect(loansOf(tool!.code, member.id).open).toBe(0);

    await page.getByRole('button', { name: `Dismiss Check out ${tool!.code}` }).click();
    await page.getByText('Gripline has refused nothing.').waitFor();
    expect(await page.getByRole('link', { name: /not sent/ }).count()).toBe(0);
    await page.context().close();
  });
});
