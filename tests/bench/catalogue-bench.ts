/**
 * Offline catalogue bench (run with tsx): the whole GET /api/offline/catalogue work on the server
 * side (every tool but retired ones with holders, holds and sign-offs; every bin with what the member
 * drew; their loans, sign-offs and assemblies) for 300 and for 3,000 tools and bins, against a
 * baseline measured in the same run: a bare better-sqlite3 read of the same tool and bin rows
 * (`select *`, no joins), the least any copy of the catalogue could cost. An in-memory SQLite with the
 * real migrations, filled from a seeded generator. Median of timed runs after warm-up; the HTTP
 * layer is not timed.
 */
import type { ServiceContext } from '../../server/context';
import { migrateDatabase, openDatabase } from '../../server/db/client';
import { takeCatalogue } from '../../server/features/offline/offline.service';
import { DRAWS_PER_BIN, fillCrib, NOW, timed } from './offline-crib-fill';

const MEMBERS = 40;

function measure(size: number) {
  const db = openDatabase(':memory:');
  migrateDatabase(db);
  const member = fillCrib(db, size, MEMBERS)[0]!;
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
