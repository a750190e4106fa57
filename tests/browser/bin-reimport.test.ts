import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import { signedInPhone } from '../helpers/browser';
import { builtAppWithChromium } from '../helpers/browser-suite';

const suite = builtAppWithChromium();

/** The demo crib's export with the first bin moved to another shelf and its on-hand figure typed over. */
async function editedExport(get: (path: string) => Promise<string>): Promise<{ csv: string; code: string; from: string }> {
  const rows = Papa.parse<Record<string, string>>((await get('/api/bins/export.csv')).replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: true }).data;
  const first = rows[0]!;
  const from = first.location!;
  first.location = 'Shelf Z9';
  first.on_hand = String(Number(first.on_hand) + 7);
  return { csv: Papa.unparse(rows, { newline: '\r\n' }), code: first.code!, from };
}

describe('the quartermaster bringing an edited export back in', () => {
  for (const viewport of [
    { name: 'phone', width: 360, height: 780 },
    { name: 'desktop', width: 1280, height: 900 },
  ]) {
    it(`sees the one update with its change, the rest unchanged, and imports it (${viewport.name})`, async () => {
      const { app, browser } = suite;
      const page = await signedInPhone(browser, app.url, 'quartermaster@example.org', DEMO_PASSWORD, { context: { viewport } });
      await page.goto(`${app.url}/bins/import`);
      await page.getByRole('heading', { name: 'Import and export bins' }).waitFor();
      const title = await page.title();
      const { csv, code, from } = await editedExport(async (path) => (await page.request.get(`${app.url}${path}`)).text());

      await page.getByLabel('Or paste the CSV here').fill(csv);
      await page.getByRole('button', { name: 'Check file' }).click();
      await page.getByText(/^41 rows: 1 update, 40 unchanged\. 1 to check\.$/).waitFor();
      const changes = page.getByRole('list', { name: `Changes to ${code}` });
      expect(await changes.textContent()).toContain(`location: ${from} →  becomes Shelf Z9`);
      await page.getByText(/on hand and the bin holds .*count the bin to correct it/).waitFor();
      await page.screenshot({ path: `test-results/bin-reimport-preview-${viewport.name}.png`, fullPage: true });
      // Nothing overflows the phone's width.
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(viewport.width);

      await page.getByRole('button', { name: 'Import 1 update' }).click();
      await page.getByText('Updated 1 bin').waitFor();
      expect(await page.title()).toBe(title);
      const bin = (await (await page.request.get(`${app.url}/api/bins/${code}`)).json()) as { location: string };
      expect(bin.location).toBe('Shelf Z9');

      // Back again: the bin is moved, so the same file now changes nothing.
      await page.getByLabel('Or paste the CSV here').fill(csv);
      await page.getByRole('button', { name: 'Check file' }).click();
      await page.getByText('Every row of the file already matches its bin.').waitFor();
      // Put the shelf back for the other viewport's run.
      await page.getByLabel('Or paste the CSV here').fill(csv.replace('Shelf Z9', Papa.unparse([[from]])));
      await page.getByRole('button', { name: 'Check file' }).click();
      await page.getByRole('button', { name: 'Import 1 update' }).click();
      await page.getByText('Updated 1 bin').waitFor();
      await page.context().close();
    });
  }
});
