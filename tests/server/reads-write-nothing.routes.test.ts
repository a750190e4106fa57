import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, seedDemoChapter } from '../../server/seed/demo-chapter';
import { dataSnapshot } from '../helpers/db-snapshot';
import { buildTestApp, type SignedInAgent, type TestApp } from '../helpers/test-app';

/**
 * A GET only reads: opening a screen never raises an alert, closes a hold or stamps a row. Every GET
 * route of the API is called here, on the demo chapter, a week after it was seeded (so anything that
 * waits for "stale" would run), and the data must be unchanged. The sessions table is left out: a
 * request renews its own session.
 */
let t: TestApp;
let lead: SignedInAgent;
let member: SignedInAgent;
let ids: { tool: string; bin: string; assembly: number; build: number; user: number; photo: number; slip: number };

beforeAll(async () => {
  t = await buildTestApp();
  expect(await seedDemoChapter(t.db)).toBe(true);
  t.clock.now = new Date(Date.now() + 7 * 86_400_000);
  // A bin emptied since the last alert check (as by a draw): a read that checked alerts would raise one.
  t.db.$client
    .prepare("update bins set on_hand = 0 where id = (select id from bins where reorder_point > 0 and id not in (select bin_id from bin_alerts where state in ('open', 'ordered')) order by id limit 1)")
    .run();
  lead = await t.signIn('lead@example.org', DEMO_PASSWORD);
  member = await t.signIn('member@example.org', DEMO_PASSWORD);
  const one = <T>(sql: string) => t.db.$client.prepare(sql).get() as T;
  ids = {
    tool: one<{ code: string }>('select code from tools order by id limit 1').code,
    bin: one<{ code: string }>('select code from bins order by id limit 1').code,
    assembly: one<{ id: number }>('select id from assemblies order by id limit 1').id,
    build: one<{ id: number }>('select id from builds order by id limit 1').id,
    user: one<{ id: number }>("select id from users where email = 'member@example.org'").id,
    photo: one<{ id: number } | undefined>('select id from photos order by id limit 1')?.id ?? 1,
    slip: one<{ id: number } | undefined>('select id from stock_slips order by id limit 1')?.id ?? 1,
  };
});
afterAll(() => t.close());

/** Every GET the server serves (each is asked by the lead and by a member; refusals count too). */
const GETS = (): string[] => [
  '/api/health',
  '/api/auth/csrf',
  '/api/auth/me',
  '/api/invitations',
  `/api/invitations/by-token/${'x'.repeat(43)}`,
  '/api/users',
  '/api/stations',
  '/api/station/session',
  '/api/station/copy',
  '/api/mail',
  '/api/mail/mine',
  '/api/reference/drills',
  '/api/tools',
  `/api/tools/${ids.tool}`,
  `/api/tools/${ids.tool}/events`,
  `/api/photos/${ids.photo}`,
  `/api/photos/${ids.photo}/thumbnail`,
  '/api/loans/mine',
  '/api/loans/open',
  '/api/loans/stats',
  '/api/overdue',
  '/api/service-due',
  '/api/signoffs',
  '/api/signoffs/mine',
  '/api/signoffs/requests',
  '/api/signoffs/requests/mine',
  '/api/settings/planning',
  '/api/settings/crib',
  '/api/labels/layouts',
  '/api/labels/people',
  '/api/bins',
  '/api/bins/restock',
  `/api/bins/slips/${ids.slip}`,
  `/api/bins/${ids.bin}`,
  `/api/bins/${ids.bin}/reorder`,
  `/api/bins/${ids.bin}/ledger`,
  '/api/bins/import/template.csv',
  '/api/bins/export.csv',
  '/api/bins/ledger.csv',
  '/api/stock/tab',
  '/api/stock/tabs',
  `/api/stock/tabs/${ids.user}`,
  '/api/stock/spend',
  '/api/payments/settings',
  '/api/payments/checkouts/cs_test_none',
  '/api/payments?method=online',
  '/api/payments/refused',
  '/api/payments/export.csv?from=2026-11-01',
  '/api/builds',
  `/api/builds/${ids.build}`,
  '/api/assemblies',
  `/api/assemblies/${ids.assembly}`,
  `/api/assemblies/${ids.assembly}/estimate`,
  '/api/me/preferences',
  '/api/forecast',
  '/api/alerts',
  '/api/alerts?state=all',
  '/api/alerts/purchase-list',
  '/api/alerts/purchase-list.csv',
  '/api/waste',
  '/api/today/member',
  '/api/today/quartermaster',
  '/api/today/lead',
  '/api/offline/catalogue',
  '/certificate',
];

/** How many GET handlers the server's routers declare (a new one must join the list above). */
function declaredGets(dir: string): number {
  return readdirSync(dir).reduce((n, name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return n + declaredGets(path);
    return name.endsWith('.router.ts') ? n + (readFileSync(path, 'utf8').match(/router\.get\(/g) ?? []).length : n;
  }, 0);
}

describe('every GET of the API', () => {
  it('is listed here: as many paths as the routers declare GET handlers', () => {
    const distinct = new Set(GETS().map((p) => p.replace(/\?.*$/, '')));
    expect(distinct.size).toBe(declaredGets('server'));
  });

  it('writes nothing, for the lead and for a member, even a week after the last look', async () => {
    const before = dataSnapshot(t.db);
    for (const who of [lead, member]) {
      for (const path of GETS()) {
        const res = await who.agent.get(path);
        expect(res.status, `${path} answers without a server error`).toBeLessThan(500);
        expect(dataSnapshot(t.db), `${path} left the data as it was`).toEqual(before);
      }
    }
    // The lead's reads are real answers, not refusals.
    for (const path of ['/api/alerts', '/api/alerts/purchase-list', '/api/today/lead', '/api/bins', `/api/bins/${ids.bin}/reorder`, '/api/forecast']) {
      expect((await lead.agent.get(path)).status, path).toBe(200);
    }
    // A snapshot of every table after each of some two hundred reads: seconds of work, more on a busy machine.
  }, 30_000);
});
