import { describe, expect, it } from 'vitest';
import { migrateDatabase, openDatabase } from '../../server/db/client';
import { listAssemblies } from '../../server/features/planning/assemblies.repo';
import { assemblyKit } from '../../server/features/planning/assembly-estimate.service';
import { loanStats } from '../../server/features/tools/loan-stats.service';
import { seedDemoChapter } from '../../server/seed/demo-chapter';
import { findUserByEmail } from '../../server/accounts/users.repo';
import { tabBalanceCents } from '../../server/features/stock/money.service';

/** Six password hashes, the crib and the stock ledger: slow on a busy test machine. */
const SEEDING_MS = 30_000;

describe('the demo chapter', () => {
  it('seeds people, about sixty tools, loans with two overdue, a hold and a tool due for calibration', async () => {
    const db = openDatabase(':memory:');
    migrateDatabase(db);
    const now = Date.now();
    expect(await seedDemoChapter(db)).toBe(true);
    const one = <T>(sql: string, ...args: unknown[]) => db.$client.prepare(sql).get(...args) as T;
    expect(one<{ n: number }>('select count(*) as n from users').n).toBe(6);
    const tools = one<{ n: number }>('select count(*) as n from tools').n;
    expect(tools).toBeGreaterThanOrEqual(55);
    expect(tools).toBeLessThanOrEqual(65);
    const open = one<{ n: number }>('select count(*) as n from loans where returned_at is null').n;
    expect(open).toBeGreaterThanOrEqual(5);
    expect(one<{ n: number }>('select count(*) as n from loans where returned_at is null and due_at < ?', now).n).toBe(2);
    expect(one<{ n: number }>("select count(*) as n from holds where status = 'waiting'").n).toBe(1);
    // The invented past's mail counts as sent: none waits for the outbox worker to send it now.
    expect(one<{ n: number }>("select count(*) as n from outbox_mail where state != 'sent'").n).toBe(0);
    expect(one<{ n: number }>("select count(*) as n from tools where status = 'on_loan'").n).toBe(open);
    const dueForCalibration = one<{ n: number }>(
      "select count(*) as n from tools where category = 'torque_wrench' and last_service_at + service_interval_days * 86400000 < ?",
      now,
    ).n;
    expect(dueForCalibration).toBe(1);
    // Builds across the next six months: most assemblies planned, a few begun, one done.
    expect(one<{ n: number }>('select count(*) as n from builds').n).toBeGreaterThanOrEqual(3);
    const statuses = db.$client.prepare('select status, count(*) as n from assemblies group by status').all() as { status: string; n: number }[];
    const byStatus = Object.fromEntries(statuses.map((r) => [r.status, r.n]));
    expect(byStatus.done).toBe(1);
    expect(byStatus.in_progress).toBeGreaterThanOrEqual(2);
    expect(byStatus.planned).toBeGreaterThanOrEqual(5);
    const total = statuses.reduce((s, r) => s + r.n, 0);
    expect(total).toBeGreaterThanOrEqual(8);
    expect(total).toBeLessThanOrEqual(12);
    const lastFinish = one<{ at: number }>('select max(planned_finish) as at from assemblies').at;
    expect(lastFinish).toBeGreaterThan(now + 120 * 86_400_000);
    expect(lastFinish).toBeLessThanOrEqual(now + 190 * 86_400_000);
    // Draws name the assemblies already begun, and only those.
    const drawnFor = db.$client.prepare('select distinct a.status from stock_movements m join assemblies a on a.id = m.assembly_id').all() as { status: string }[];
    expect(drawnFor.map((r) => r.status).sort()).toEqual(['done', 'in_progress']);
    expect(await seedDemoChapter(db)).toBe(false);
    db.$client.close();
  }, SEEDING_MS);

  it('has people who joined before anything they did: no sign-off, loan, draw or other dated row of theirs is older', async () => {
    const db = openDatabase(':memory:');
    migrateDatabase(db);
    const now = Date.now();
    await seedDemoChapter(db);
    const sqlite = db.$client;
    const people = sqlite.prepare('select id, name, created_at as joined from users').all() as { id: number; name: string; joined: number }[];
    // Joined over the chapter's years, not all on the day the demo was seeded.
    expect(new Set(people.map((p) => p.joined)).size).toBe(people.length);
    for (const p of people) expect(p.joined).toBeLessThan(now - 30 * 86_400_000);
    const tables = (sqlite.prepare("select name from sqlite_master where type = 'table' and name not like 'sqlite_%' and name not like '__drizzle%'").all() as { name: string }[]).map((t) => t.name);
    const early: string[] = [];
    let checked = 0;
    for (const table of tables) {
      const byPerson = (sqlite.prepare(`pragma foreign_key_list("${table}")`).all() as { table: string; from: string }[]).filter((k) => k.table === 'users').map((k) => k.from);
      const dated = (sqlite.prepare(`pragma table_info("${table}")`).all() as { name: string }[]).map((c) => c.name).filter((c) => c.endsWith('_at'));
      for (const who of byPerson) {
        for (const when of dated) {
          checked += 1;
          const rows = sqlite
            .prepare(`select u.name as name, t."${when}" as at, u.created_at as joined from "${table}" t join users u on u.id = t."${who}" where t."${when}" is not null and t."${when}" < u.created_at`)
            .all() as { name: string; at: number; joined: number }[];
          for (const r of rows) early.push(`${table}.${when} by ${who}: ${r.name} on ${new Date(r.at).toISOString()}, joined ${new Date(r.joined).toISOString()}`);
        }
      }
    }
    expect(checked).toBeGreaterThan(10);
    expect(early.slice(0, 5)).toEqual([]);
    db.$client.close();
  }, SEEDING_MS);

  it('gives the lead’s overview half a year of loans: most weeks lent, some late, busy tools and idle ones', async () => {
    const db = openDatabase(':memory:');
    migrateDatabase(db);
    await seedDemoChapter(db);
    const stats = loanStats({ db, publicUrl: 'http://localhost', now: () => new Date() });
    expect(stats.weeks).toHaveLength(26);
    expect(stats.weeks.filter((w) => w.total > 0).length).toBeGreaterThanOrEqual(20);
    expect(stats.weeks.filter((w) => w.overdueDays > 0).length).toBeGreaterThanOrEqual(10);
    expect(stats.kinds.length).toBeGreaterThanOrEqual(6);
    expect(stats.mostUsed).toHaveLength(10);
    expect(stats.idle.length).toBeGreaterThan(0);
    // The history is all back: the open loans are still only the recent ones, two of them overdue.
    const open = db.$client.prepare('select count(*) as n from loans where returned_at is null and checked_out_at < ?').get(Date.now() - 22 * 86_400_000) as { n: number };
    expect(open.n).toBe(0);
    db.$client.close();
  }, SEEDING_MS);

  it('stocks the crib with a 1/8 in countersink cutter on a #30 pilot and 3/32 and 1/8 in dimple dies, which the flush assemblies’ kits pick', async () => {
    const db = openDatabase(':memory:');
    migrateDatabase(db);
    await seedDemoChapter(db);
    const sized = db.$client.prepare("select code, category, rivet_diameter32 as d32, drill_size as pilot from tools where category in ('countersink_cutter', 'dimple_dies') order by category, rivet_diameter32").all() as { code: string; category: string; d32: number; pilot: string | null }[];
    expect(sized.map(({ category, d32, pilot }) => [category, d32, pilot])).toEqual([
      ['countersink_cutter', 4, '#30'],
      ['dimple_dies', 3, null],
      ['dimple_dies', 4, null],
    ]);
    for (const t of sized) expect(t.code).toMatch(/^T-\d{4}$/);
    const flushItems = listAssemblies(db, {})
      .flatMap((a) => assemblyKit(db, a))
      .filter((k) => k.role === 'countersink_cutter' || k.role === 'dimple_dies');
    // The demo's flush lines: a 1/8 in hinge doubler countersunk, 3/32 and 1/8 in lines over thin skins dimpled.
    expect(new Set(flushItems.map((k) => k.need))).toEqual(new Set(['100° countersink cutter, 1/8 in, #30 pilot', '100° dimple dies, 3/32 in', '100° dimple dies, 1/8 in']));
    for (const k of flushItems) expect(k.tool?.category).toBe(k.role);
    db.$client.close();
  }, SEEDING_MS);

  it('has three members who paid part of their tab in cash, in whole dollars and never more than they owe, and leaves Marco’s tab unpaid', async () => {
    const db = openDatabase(':memory:');
    migrateDatabase(db);
    await seedDemoChapter(db);
    const paid = db.$client
      .prepare("select u.email, p.amount_cents as cents, p.method, p.at from member_payments p join users u on u.id = p.user_id order by p.at")
      .all() as { email: string; cents: number; method: string; at: number }[];
    expect(paid.map((p) => p.email)).toEqual(['kelechi.obi@example.org', 'ines.parra@example.org', 'tomasz.wren@example.org']);
    for (const p of paid) {
      expect(p.method).toBe('cash');
      expect(p.cents % 100).toBe(0);
      expect(p.cents).toBeGreaterThan(0);
      expect(p.at).toBeLessThan(Date.now());
      const user = findUserByEmail(db, p.email)!;
      expect(tabBalanceCents(db, user.id)).toBeGreaterThan(0);
    }
    const marco = findUserByEmail(db, 'member@example.org')!;
    expect(tabBalanceCents(db, marco.id)).toBeGreaterThan(0);
    db.$client.close();
  }, SEEDING_MS);
});
