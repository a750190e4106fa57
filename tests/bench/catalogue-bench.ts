/**
 * Offline catalogue bench (run with tsx): the whole GET /api/offline/catalogue work on the server
 * side (every tool but retired ones with holders, holds and sign-offs; every bin with what the member
 * drew; their loans, sign-offs and assemblies) for 300 and for 3,000 tools and bins, against a
 * baseline measured in the same run: a bare better-sqlite3 read of the same tool and bin rows
 * (`select *`, no joins), the least any copy of the catalogue could cost. An in-memory SQLite with the
 * real migrations, filled from a seeded generator. Median of timed runs after warm-up; the HTTP
 * layer is not timed.
 */
import { performance } from 'node:perf_hooks';
import { seededRandom } from '@shared/random/seeded';
import type { ServiceContext } from '../../server/context';
import { migrateDatabase, openDatabase, type Database } from '../../server/db/client';
import { assemblies, builds } from '../../server/db/schema/builds';
import { memberSignoffs, signoffs } from '../../server/db/schema/signoffs';
import { bins, stockMovements } from '../../server/db/schema/stock';
import { loans, tools } from '../../server/db/schema/tools';
import { users, type UserRow } from '../../server/db/schema/users';
import { takeCatalogue } from '../../server/features/offline/offline.service';
import { median } from './median';

const RUNS = 15;
const MEMBERS = 40;
const DRAWS_PER_BIN = 20;
const NOW = new Date('2026-12-03T08:00:00Z');
const DAY_MS = 86_400_000;

function fill(db: Database, size: number): UserRow {
  const random = seededRandom(417 + size);
  const between = (lo: number, hi: number) => lo + Math.floor(random() * (hi - lo + 1));
  const people = db
    .insert(users)
    .values(Array.from({ length: MEMBERS }, (_, i) => ({ email: `builder${i}@example.org`, name: `Builder ${i}`, role: 'member' as const, passwordHash: 'x' })))
    .returning()
    .all();
  const powered = db.insert(signoffs).values({ name: 'Powered tools' }).returning().get();
  db.insert(memberSignoffs).values(people.slice(0, MEMBERS / 2).map((p) => ({ signoffId: powered.id, userId: p.id, grantedAt: NOW, grantedById: p.id }))).run();
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
        tx.insert(loans).values({ toolId: tool.id, userId: people[between(0, MEMBERS - 1)]!.id, checkedOutAt: out, dueAt: new Date(out.getTime() + 14 * DAY_MS) }).run();
      }
      const bin = tx
        .insert(bins)
        .values({ code: `B-${String(i).padStart(4, '0')}`, kind: 'screw', name: `Screw ${i}`, location: `Shelf ${i % 12}`, onHand: 5000 })
        .returning()
        .get();
      for (let k = 0; k < DRAWS_PER_BIN; k++) {
        const member = people[between(0, MEMBERS - 1)]!;
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
  return people[0]!;
}


function timed(work: () => unknown): number {
  for (let i = 0; i < 5; i++) work();
  const times: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const start = performance.now();
    work();
    times.push(performance.now() - start);
  }
  return median(times);
}

function measure(size: number) {
  const db = openDatabase(':memory:');
  migrateDatabase(db);
  const member = fill(db, size);
  const ctx: ServiceContext = { db, publicUrl: 'http://bench.test', now: () => NOW };
  const bareTools = db.$client.prepare('select * from tools');
  const bareBins = db.$client.prepare('select * from bins');
  // Interleaved (ABBA) so both sides see the same neighbours on a shared machine.
  const catalogue = [timed(() => takeCatalogue(ctx, member))];
  const baseline = [timed(() => [bareTools.all(), bareBins.all()]), timed(() => [bareTools.all(), bareBins.all()])];
  catalogue.push(timed(() => takeCatalogue(ctx, member)));
  const copy = takeCatalogue(ctx, member);
  db.$client.close();
  const catalogueMs = (catalogue[0]! + catalogue[1]!) / 2;
  const baselineMs = (baseline[0]! + baseline[1]!) / 2;
  return { size, tools: copy.tools.length, bins: copy.bins.length, bytes: JSON.stringify(copy).length, catalogueMs, baselineMs };
}

const small = measure(300);
const large = measure(3000);
console.log(`Gripline offline catalogue bench: ${MEMBERS} members, ${DRAWS_PER_BIN} draws per bin, about 30% of tools on loan`);
for (const r of [small, large]) {
  console.log(
    `${String(r.size).padStart(5)} tools and bins  (${r.tools} tools, ${r.bins} bins, ${(r.bytes / 1024).toFixed(0)} KB of JSON)  ` +
      `catalogue ${r.catalogueMs.toFixed(2)} ms, bare rows ${r.baselineMs.toFixed(2)} ms: ratio ${(r.catalogueMs / r.baselineMs).toFixed(1)}`,
  );
}
console.log(`3,000/300 time ratio: catalogue ${(large.catalogueMs / small.catalogueMs).toFixed(1)}, bare rows ${(large.baselineMs / small.baselineMs).toFixed(1)}`);
