import { join } from 'node:path';
import BetterSqlite3 from 'better-sqlite3';
import type { Browser, Page } from 'playwright-core';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import type { RouteObject } from 'react-router';
import { QueryClient } from '@tanstack/react-query';
import { appRoutes } from '@/app/router';
import { DEMO_PASSWORD } from '../../server/seed/demo-chapter';
import type { BuiltApp } from '../helpers/browser';
import { builtAppWithChromium } from '../helpers/browser-suite';

const suite = builtAppWithChromium();
const SUFFIX = ' · Gripline';

/** Every path pattern of the client's router ("/tools/:code"), the catch-all as "*". */
function routePatterns(routes: RouteObject[], parent = ''): string[] {
  return routes.flatMap((route) => {
    const path = route.index ? parent || '/' : route.path === undefined ? parent : route.path.startsWith('/') || route.path === '*' ? route.path : `${parent.replace(/\/$/, '')}/${route.path}`;
    const own = route.index || (route.path !== undefined && !route.children) ? [path] : [];
    return [...own, ...routePatterns(route.children ?? [], path)];
  });
}

type Who = 'visitor' | 'lead' | 'member' | 'quartermaster';

/** Old addresses that now lead to another page (and so share its title): where each lands. */
const MOVED: Record<string, string> = { '/settings/planning': '/settings' };

/** The demo chapter's things each pattern is opened with, and who opens it. */
function demoUrls(app: BuiltApp): Record<string, { url: string; who: Who }> {
  const db = new BetterSqlite3(join(app.dir, 'gripline.db'), { readonly: true });
  try {
    const tool = db.prepare('select code from tools order by code limit 1').get() as { code: string };
    const bin = db.prepare('select code from bins order by code limit 1').get() as { code: string };
    const assembly = db
      .prepare("select a.id, a.build_id as buildId from assemblies a join builds b on b.id = a.build_id join users u on u.id = b.owner_id where u.email = 'member@example.org' order by a.id limit 1")
      .get() as { id: number; buildId: number };
    const lead = (url: string) => ({ url, who: 'lead' as const });
    const member = (url: string) => ({ url, who: 'member' as const });
    const visitor = (url: string) => ({ url, who: 'visitor' as const });
    return {
      '/sign-in': visitor('/sign-in'),
      '/reset-password': visitor('/reset-password'),
      '/reset-password/:token': visitor('/reset-password/not-a-real-token'),
      '/invite/:token': visitor('/invite/not-a-real-token'),
      '/station': visitor('/station'),
      '*': visitor('/no-such-page'),
      '/': lead('/'),
      '/scan': lead('/scan'),
      '/tools': lead('/tools'),
      '/queue': lead('/queue'),
      '/tools/new': lead('/tools/new'),
      '/tools/:code': lead(`/tools/${tool.code}`),
      '/tools/:code/edit': lead(`/tools/${tool.code}/edit`),
      '/loans': lead('/loans'),
      '/bins': lead('/bins'),
      '/bins/import': lead('/bins/import'),
      '/bins/new': lead('/bins/new'),
      '/bins/:code': lead(`/bins/${bin.code}`),
      '/bins/:code/edit': lead(`/bins/${bin.code}/edit`),
      '/restock': lead('/restock'),
      '/tab': lead('/tab'),
      '/spend': lead('/spend'),
      '/payments': lead('/payments'),
      '/overview': lead('/overview'),
      '/people': lead('/people'),
      '/mail': lead('/mail'),
      '/my-mail': lead('/my-mail'),
      '/overdue': lead('/overdue'),
      '/service': lead('/service'),
      '/signoffs': lead('/signoffs'),
      '/labels': lead('/labels'),
      '/stations': lead('/stations'),
      '/alerts': lead('/alerts'),
      '/forecast': lead('/forecast'),
      '/settings/planning': lead('/settings/planning'),
      '/settings': lead('/settings'),
      '/builds': lead('/builds'),
      '/builds/:id/assemblies/new': member(`/builds/${assembly.buildId}/assemblies/new`),
      '/assemblies/:id': member(`/assemblies/${assembly.id}`),
      '/assemblies/:id/edit': member(`/assemblies/${assembly.id}/edit`),
    };
  } finally {
    db.close();
  }
}

async function signedIn(browser: Browser, url: string, who: Who, width = 1280): Promise<Page> {
  const context = await browser.newContext({ viewport: { width, height: 900 } });
  const page = await context.newPage();
  if (who === 'visitor') return page;
  await page.goto(`${url}/sign-in`);
  await page.getByLabel('E-mail').fill(`${who}@example.org`);
  await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { name: /Hello/ }).waitFor();
  return page;
}

/**
 * Moves the signed-in app to `path` as a link would (a history entry the router follows, no reload:
 * fast, and the title must change in place), or opens it afresh for a visitor; answers the page's
 * title and heading once its new heading has rendered.
 */
async function open(page: Page, base: string, path: string): Promise<{ title: string; heading: string }> {
  const here = page.url().startsWith(`${base}/`) ? new URL(page.url()).pathname : null;
  if (here && here !== path && here !== '/sign-in' && (await page.locator('h1').count()) > 0) {
    await page.evaluate((to) => {
      document.querySelector('h1')?.setAttribute('data-left', '');
      history.pushState(null, '', to);
      dispatchEvent(new PopStateEvent('popstate'));
    }, path);
  } else {
    await page.goto(`${base}${path}`);
  }
  await page
    .waitForFunction(() => document.querySelector('h1:not([data-left])') !== null && document.title !== 'Gripline', undefined, { timeout: 10_000 })
    .catch(async (e: unknown) => {
      throw new Error(`${path} did not render a page with a heading and a title of its own: at ${page.url()}, heading ${await page.locator('h1').first().textContent()}; ${String(e)}`);
    });
  return { title: await page.title(), heading: (await page.locator('h1').first().textContent()) ?? '' };
}

const activeElement = (page: Page) =>
  page.evaluate(() => {
    const el = document.activeElement;
    return { tag: el?.tagName.toLowerCase(), text: el?.textContent?.trim(), label: el?.getAttribute('aria-label') ?? el?.getAttribute('id'), inDialog: !!el?.closest('dialog[open]') };
  });

describe('page titles', () => {
  it('gives every route of the router its own title, ending in " · Gripline"', async () => {
    const urls = demoUrls(suite.app);
    expect(Object.keys(urls).sort()).toEqual(routePatterns(appRoutes(new QueryClient())).sort());

    const pages: Partial<Record<Who, Page>> = { visitor: await signedIn(suite.browser, suite.app.url, 'visitor'), lead: await signedIn(suite.browser, suite.app.url, 'lead'), member: await signedIn(suite.browser, suite.app.url, 'member') };
    const titles = new Map<string, string>();
    for (const [pattern, { url, who }] of Object.entries(urls)) {
      const { title, heading } = await open(pages[who]!, suite.app.url, url);
      expect(title, `${pattern} (${url})`).toMatch(/^\S.* · Gripline$/);
      if (pattern !== '*') expect(heading, `${url} shows its page, not an error`).not.toMatch(/^(Page not found|Something went wrong|Not for your role|Error \d+)$/);
      if (MOVED[pattern]) expect(new URL(pages[who]!.url()).pathname, `${url} moved`).toBe(MOVED[pattern]);
      else titles.set(pattern, title);
    }
    const seen = [...titles.values()];
    expect(new Set(seen).size, seen.join('\n')).toBe(seen.length);

    const tool = urls['/tools/:code']!.url.split('/').pop()!;
    const toolName = await pages.lead!.evaluate(async (code) => (await (await fetch(`/api/tools/${code}`)).json()).name as string, tool);
    expect(titles.get('/tools/:code')).toBe(`${tool} ${toolName}${SUFFIX}`);
    expect(titles.get('/overdue')).toBe(`Overdue${SUFFIX}`);
    expect(titles.get('/settings')).toBe(`Settings${SUFFIX}`);
    expect(titles.get('/')).toBe(`Home${SUFFIX}`);
    expect(titles.get('/sign-in')).toBe(`Sign in${SUFFIX}`);
    expect(titles.get('*')).toBe(`Page not found${SUFFIX}`);

    // Error pages say what happened in the title too.
    expect((await open(pages.member!, suite.app.url, '/people')).title).toBe(`Not for your role${SUFFIX}`);
    for (const page of Object.values(pages)) await page.context().close();
  });
});

describe('focus after a route change', () => {
  it('stays put on the first load, then lands on the new page’s heading; a page that asks for its field keeps it', async () => {
    const page = await signedIn(suite.browser, suite.app.url, 'lead');
    await page.goto(`${suite.app.url}/overdue`);
    await page.getByRole('heading', { name: 'Overdue' }).waitFor();
    expect((await activeElement(page)).tag).toBe('body');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Tools' }).click();
    await page.getByRole('heading', { name: 'Tools' }).waitFor();
    expect(await activeElement(page)).toMatchObject({ tag: 'h1', text: 'Tools' });
    // From the heading, Tab goes on into the page, not back to the top of the shell.
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => !!document.activeElement?.closest('main'))).toBe(true);

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Scan', exact: true }).click();
    await page.getByRole('heading', { name: 'Scan' }).waitFor();
    expect((await activeElement(page)).tag).toBe('input');
    await page.context().close();
  });
});

describe('the photo viewer', () => {
  it('is a modal dialog named by its title: focus stays inside, Escape closes it, focus returns to the thumbnail', async () => {
    const page = await signedIn(suite.browser, suite.app.url, 'quartermaster', 360);
    const code = await page.evaluate(async () => ((await (await fetch('/api/tools?limit=1')).json()) as { data: { code: string }[] }).data[0]!.code);
    await page.goto(`${suite.app.url}/tools/${code}`);
    const jpeg = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#8a6d3b' } }).jpeg().toBuffer();
    await page.getByLabel('Add photo').setInputFiles({ name: 'nosepiece.jpg', mimeType: 'image/jpeg', buffer: jpeg });
    const thumbnail = page.getByRole('button', { name: `Open photo 1 of 1 of ${code}` });
    await thumbnail.focus();
    await page.keyboard.press('Enter');

    const dialog = page.getByRole('dialog', { name: `Photo 1 of 1 of ${code}` });
    await dialog.waitFor();
    expect(await dialog.evaluate((d: HTMLDialogElement) => d.open && d.matches(':modal'))).toBe(true);
    expect(await activeElement(page)).toMatchObject({ tag: 'button', text: 'Close', inDialog: true });
    await page.screenshot({ path: 'test-results/photo-viewer-phone.png' });
    for (let i = 0; i < 4; i++) {
      await page.keyboard.press('Tab');
      expect((await activeElement(page)).inDialog, `after Tab ${i + 1}`).toBe(true);
    }

    await page.keyboard.press('Escape');
    await dialog.waitFor({ state: 'detached' });
    expect(await activeElement(page)).toMatchObject({ tag: 'button', label: `Open photo 1 of 1 of ${code}` });
    await page.context().close();
  });
});
