/**
 * The crib the offline benches read (catalogue-bench.ts, station-copy-bench.ts): `size` tools and as
 * many bins, `members` builders who hold loans, sign-offs, draws and assemblies, filled from a seeded
 * generator into a database with the real migrations. And `timed`, their one way of timing a read.
 */
import { performance } from 'node:perf_hooks';
import { seededRandom } from '@shared/random/seeded';
import type { Database } from '../../server/db/client';
import { assemblies, builds } from '../../server/db/schema/builds';
import { memberSignoffs, signoffs } from '../../server/db/schema/signoffs';
import { bins, stockMovements } from '../../server/db/schema/stock';
import { loans, tools } from '../../server/db/schema/tools';
import { users, type UserRow } from '../../server/db/schema/users';
import { median } from './median';

const RUNS = 15;
export const DRAWS_PER_BIN = 20;
export const NOW = new Date('2026-12-03T08:00:00Z');
const DAY_MS = 86_400_000;

/** Fills the crib; answers its builders (half of them hold the one sign-off). */
export function fillCrib(db: Database, size: number, members: number): UserRow[] {
  const random = seededRandom(417 + size);
  const between = (lo: number, hi: number) => lo + Math.floor(random() * (hi - lo + 1));
  const people = db
    .insert(users)
    .values(Array.from({ length: members }, (_, i) => ({ email: `builder${i}@example.org`, name: `Builder ${i}`, role: 'member' as const, passwordHash: 'x' })))
    .returning()
    .all();
  const powered = db.insert(signoffs).values({ name: 'Powered tools' }).returning().get();
  db.insert(memberSignoffs).values(people.slice(0, members / 2).map((p) => ({ signoffId: powered.id, userId: p.id, grantedAt: NOW, grantedById: p.id }))).run();
  db.transaction((tx) => {
    for (let i = 1; i <= size; i++) {
      const onLoan = random() < 0.3;
      const tool = tx
        .insert(tools)
        .values({
          code: `T-${String(i).padStart(4, '0')}`,
          name: `Tool ${i}`,
          category: 'other',
          location: `Shelf ${i % 12}`,
          requiredSignoffId: random() < 0.2 ? powered.id : null,
          accessories: JSON.stringify(random() < 0.3 ? ['nosepiece 1/8'] : []),
          status: onLoan ? 'on_loan' : random() < 0.05 ? 'retired' : 'available',
        })
        .returning()
        .get();
      if (onLoan) {
        const out = new Date(NOW.getTime() - between(1, 10) * DAY_MS);
        tx.insert(loans).values({ toolId: tool.id, userId: people[between(0, members - 1)]!.id, checkedOutAt: out, dueAt: new Date(out.getTime() + 14 * DAY_MS) }).run();
      }
      const bin = tx
        .insert(bins)
        .values({ code: `B-${String(i).padStart(4, '0')}`, kind: 'screw', name: `Screw ${i}`, location: `Shelf ${i % 12}`, onHand: 5000 })
        .returning()
        .get();
      for (let k = 0; k < DRAWS_PER_BIN; k++) {
        const member = people[between(0, members - 1)]!;
        tx.insert(stockMovements)
          .values({ binId: bin.id, kind: 'draw', quantity: -between(1, 20), balanceAfter: 0, unitCostE4: 100, at: new Date(NOW.getTime() - between(1, 180) * DAY_MS), actorId: member.id, memberId: member.id })
          .run();
      }
    }
    for (const person of people) {
      const build = tx.insert(builds).values({ ownerId: person.id, name: `Build of ${person.name}` }).returning().get();
      tx.insert(assemblies).values(Array.from({ length: 5 }, (_, k) => ({ buildId: build.id, name: `Assembly ${k}` }))).run();
    }
  });
  return people;
}

/** The median of timed runs after a warm-up. */
export function timed(work: () => unknown): number {
  for (let i = 0; i < 5; i++) work();
  const times: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const start = performance.now();
    work();
    times.push(performance.now() - start);
  }
  return median(times);
}
