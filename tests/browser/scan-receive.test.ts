import { join } from 'node:path';
import BetterSqlite3 from 'better-sqlite3';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { launchWithCameraOn, signedInPhone, startBuiltApp } from '../helpers/browser';

let app: Awaited<ReturnType<typeof startBuiltApp>>;
let browser: Browser;
let bin: { code: string; onHand: number };

const onHandNow = () => {
  const db = new BetterSqlite3(join(app.dir, 'gripline.db'), { readonly: true });
  const row = db.prepare('select on_hand as onHand, (select sum(quantity) from stock_movements m where m.bin_id = bins.id) as ledger from bins where code = ?').get(bin.code) as { onHand: number; ledger: number };
  db.close();
  return row;
};

beforeAll(async () => {
  app = await startBuiltApp();
  const db = new BetterSqlite3(join(app.dir, 'gripline.db'), { readonly: true });
  bin = db.prepare("select code, on_hand as onHand from bins where kind = 'solid_rivet' and pack_size > 1 order by code limit 1").get() as typeof bin;
  db.close();
  browser = await launchWithCameraOn(app.dir, bin.code);
});
afterAll(async () => {
  await browser?.close();
  await app?.close();
});

describe('the quartermaster scanning a bin label with the phone camera', () => {
  it('opens the bin, receives a delivery, and sees on hand go up at once', async () => {
    const page = await signedInPhone(browser, app.url, 'quartermaster@example.org', DEMO_PASSWORD);

    await page.getByRole('link', { name: 'Scan', exact: true }).click();
    await page.waitForURL(new RegExp(`/bins/${bin.code}$`), { timeout: 15_000 });
    const onHand = page.getByTestId('bin-on-hand');
    await onHand.waitFor();
    expect(Number((await onHand.textContent())!.replace(/,/g, ''))).toBe(bin.onHand);

    await page.getByRole('radio', { name: 'Receive', exact: true }).check();
    await page.getByLabel('Quantity received').fill('250');
    await page.getByRole('button', { name: `Receive into ${bin.code}` }).click();
    await page.getByText(`${(bin.onHand + 250).toLocaleString('en-US')}`, { exact: true }).first().waitFor();
    expect(Number((await onHand.textContent())!.replace(/,/g, ''))).toBe(bin.onHand + 250);
    await page.screenshot({ path: 'test-results/scan-bin-received-phone.png', fullPage: true });

    const stored = onHandNow();
    expect(stored.onHand).toBe(bin.onHand + 250);
    expect(stored.ledger).toBe(stored.onHand);
    await page.context().close();
  });
});
