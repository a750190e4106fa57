import { describe, expect, it } from 'vitest';
import { migrateDatabase, openDatabase } from '../../server/db/client';
import { seedDemoChapter } from '../../server/seed/demo-chapter';

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
    expect(one<{ n: number }>("select count(*) as n from tools where status = 'on_loan'").n).toBe(open);
    const dueForCalibration = one<{ n: number }>(
      "select count(*) as n from tools where category = 'torque_wrench' and last_service_at + service_interval_days * 86400000 < ?",
      now,
    ).n;
    expect(dueForCalibration).toBe(1);
    expect(await seedDemoChapter(db)).toBe(false);
    db.$client.close();
  }, SEEDING_MS);
});
