import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { binListSchema, restockListSchema, type Bin } from '@shared/schemas/bins';
import { purchaseListSchema } from '@shared/schemas/forecast';
import { insertUser } from '../../server/accounts/users.repo';
import { migrateDatabase, openDatabase } from '../../server/db/client';
import { DEMO_PASSWORD, DEMO_PEOPLE, seedDemoChapter } from '../../server/seed/demo-chapter';
import { seedDemoStock } from '../../server/seed/demo-stock';
import { buildTestApp, type SignedInAgent, type TestApp } from '../helpers/test-app';

const DAY_MS = 24 * 60 * 60 * 1000;
/** Seeding hashes six passwords and writes a few hundred entries: slow on a busy test machine. */
const SEEDING_MS = 30_000;

let t: TestApp;
let qm: SignedInAgent;
let seededAt: number;
let bins: Bin[];

interface Entry {
  bin_id: number;
  kind: string;
  quantity: number;
  balance_after: number;
  at: number;
  member_id: number | null;
  assembly_id: number | null;
  unit_cost_e_4: number;
}

const all = <T>(sql: string, ...args: unknown[]) => t.db.$client.prepare(sql).all(...args) as T[];
const entries = () => all<Entry>('select * from stock_movements order by id');

beforeAll(async () => {
  t = await buildTestApp();
  seededAt = Date.now();
  expect(await seedDemoChapter(t.db)).toBe(true);
  qm = await t.signIn('quartermaster@example.org', DEMO_PASSWORD);
  const res = await qm.agent.get('/api/bins?pageSize=500');
  expect(res.status).toBe(200);
  bins = binListSchema.parse(res.body).data;
}, SEEDING_MS);
afterAll(() => t.close());

describe('the demo chapter’s stock', () => {
  it('has about forty bins of every kind a sheet-metal shop keeps', () => {
    expect(bins.length).toBeGreaterThanOrEqual(35);
    expect(bins.length).toBeLessThanOrEqual(45);
    const kinds = new Set(bins.map((b) => b.kind));
    for (const kind of ['blind_structural', 'blind_general', 'solid_rivet', 'screw', 'nut', 'washer', 'drill_bit', 'deburring_blade', 'sealant_primer']) {
      expect(kinds).toContain(kind);
    }
    const blind = bins.filter((b) => b.kind === 'blind_structural');
    expect(new Set(blind.map((b) => b.diameter32))).toEqual(new Set([3, 4, 5, 6]));
    expect(new Set(blind.map((b) => b.head))).toEqual(new Set(['dome', 'countersunk']));
    expect(new Set(blind.map((b) => b.grip16))).toEqual(new Set([1, 2, 3, 4, 6, 8]));
    expect(new Set(blind.map((b) => b.material))).toEqual(new Set(['5056', 'stainless', 'monel']));
    expect(new Set(bins.filter((b) => b.kind === 'drill_bit').map((b) => b.drillSize))).toEqual(new Set(['#40', '#30', '#21', '#20', '#11']));
  });

  it('names solid rivets in the MS20470 and MS20426 forms', () => {
    const designations = bins.filter((b) => b.kind === 'solid_rivet').map((b) => b.designation);
    // AC 43.13-1B para 4-57a: head number, material letters, diameter in 32nds, dash, length in 16ths.
    expect(designations).toContain('MS20470AD4-4');
    expect(designations).toContain('MS20470AD4-6');
    expect(designations).toContain('MS20426AD3-3.5');
    expect(designations).toContain('MS20426AD3-4');
    // The blind rivets carry their grip range beside the dash (TM 10-5410-221-14/1 Table 4-3: -2 covers 0.063–0.125 in).
    expect(bins.map((b) => b.designation)).toContain('Blind, structural, dome, 5056, steel stem · 1/8 in · grip −2 (0.063–0.125 in)');
  });

  it('keeps every bin’s on-hand equal to the sum of its ledger, with no balance ever below zero', () => {
    const sums = new Map(all<{ bin_id: number; n: number }>('select bin_id, sum(quantity) as n from stock_movements group by bin_id').map((r) => [r.bin_id, r.n]));
    for (const bin of bins) expect(bin.onHand).toBe(sums.get(bin.id) ?? 0);
    const running = new Map<number, number>();
    for (const e of entries()) {
      const balance = (running.get(e.bin_id) ?? 0) + e.quantity;
      expect(e.balance_after).toBe(balance);
      expect(e.balance_after).toBeGreaterThanOrEqual(0);
      running.set(e.bin_id, balance);
    }
  });

  it('tells six months of history in order: receipts with price changes, draws by members, returns, a write-off and one count', () => {
    const ledger = entries();
    const kinds = (k: string) => ledger.filter((e) => e.kind === k);
    expect(kinds('count')).toHaveLength(1);
    expect(kinds('count')[0]!.quantity).not.toBe(0);
    expect(kinds('write_off').length).toBeGreaterThanOrEqual(1);
    expect(kinds('return_unused').length).toBeGreaterThanOrEqual(3);
    expect(kinds('draw').length).toBeGreaterThanOrEqual(150);
    expect(new Set(kinds('draw').map((e) => e.member_id)).size).toBeGreaterThanOrEqual(4);
    // Only the demo builds' draws name an assembly, each the drawing member's own.
    const owners = new Map(all<{ id: number; owner_id: number }>('select a.id, b.owner_id from assemblies a join builds b on b.id = a.build_id').map((r) => [r.id, r.owner_id]));
    const forAssemblies = ledger.filter((e) => e.assembly_id !== null);
    expect(forAssemblies.length).toBeGreaterThan(0);
    for (const e of forAssemblies) expect([e.kind, e.member_id]).toEqual(['draw', owners.get(e.assembly_id!)]);

    const receipts = kinds('receive');
    const reorders = receipts.filter((e) => receipts.some((first) => first.bin_id === e.bin_id && first.at < e.at));
    expect(reorders.length).toBeGreaterThanOrEqual(10);
    const repriced = new Set(reorders.filter((e) => receipts.some((r) => r.bin_id === e.bin_id && r.unit_cost_e_4 !== e.unit_cost_e_4)).map((e) => e.bin_id));
    expect(repriced.size).toBeGreaterThanOrEqual(2);

    const times = ledger.map((e) => e.at);
    expect(Math.min(...times)).toBeLessThanOrEqual(seededAt - 150 * DAY_MS);
    expect(Math.max(...times)).toBeLessThanOrEqual(Date.now());
    // Entry by entry, each bin's history runs forward in time.
    const last = new Map<number, number>();
    for (const e of ledger) {
      expect(e.at).toBeGreaterThanOrEqual(last.get(e.bin_id) ?? 0);
      last.set(e.bin_id, e.at);
    }
  });

  it('leaves a few bins to order, every one at or below its own reorder point and not yet ordered among them, and the purchase list agrees', async () => {
    const low = bins.filter((b) => b.onHand <= b.reorderPoint && b.onOrder === 0);
    expect(low.length).toBeGreaterThanOrEqual(2);
    expect(low.length).toBeLessThanOrEqual(5);
    // Two of the low bins were ordered four days ago (one is late): they wait for their delivery, off the list.
    expect(bins.filter((b) => b.onHand <= b.reorderPoint && b.onOrder > 0)).toHaveLength(2);
    const res = await qm.agent.get('/api/bins/restock');
    expect(res.status).toBe(200);
    const restock = restockListSchema.parse(res.body).data;
    // The bin's own point is a floor under the forecast's: every bin at or below it is on the list, with any the forecast adds.
    expect(restock.map((b) => b.code)).toEqual(expect.arrayContaining(low.map((b) => b.code)));
    expect(restock.length).toBeLessThanOrEqual(low.length + 2);
    expect(restock.map((b) => b.code).sort()).toEqual(bins.filter((b) => b.toOrder > 0).map((b) => b.code).sort());
    expect(restock.length).toBeGreaterThanOrEqual(3);
    for (const item of restock) expect(item.packsToOrder).toBeGreaterThanOrEqual(1);
    // The case found in use on this chapter: Restock and the purchase list now list the same bins, quantities and costs.
    const purchase = purchaseListSchema.parse((await qm.agent.get('/api/alerts/purchase-list')).body).data.flatMap((g) => g.lines);
    const line = (code: string, quantity: number, costCents: number) => ({ code, quantity, costCents });
    expect(purchase.map((l) => line(l.bin.code, l.quantity, l.costCents)).sort((a, b) => a.code.localeCompare(b.code))).toEqual(
      restock.map((i) => line(i.code, i.toOrder, i.orderCostCents)).sort((a, b) => a.code.localeCompare(b.code)),
    );
  });

  it('is the same history every time it is seeded for the same day', () => {
    const now = new Date('2026-11-30T15:00:00Z');
    const histories = [1, 2].map(() => {
      const db = openDatabase(':memory:');
      migrateDatabase(db);
      for (const { email, name, role } of DEMO_PEOPLE) insertUser(db, { email, name, role, passwordHash: 'not-used' });
      seedDemoStock(db, now);
      const rows = db.$client.prepare('select bin_id, kind, quantity, balance_after, unit_cost_e_4, at, actor_id, member_id, note from stock_movements order by id').all();
      db.$client.close();
      return rows;
    });
    expect(histories[0]!.length).toBeGreaterThan(200);
    expect(histories[1]).toEqual(histories[0]);
  }, SEEDING_MS);
});
