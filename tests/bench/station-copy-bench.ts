/**
 * Station copy bench (run with tsx): the whole GET /api/station/copy work on the server side (the
 * catalogue's tools and bins, and every badge holder with their hashes, loans, sign-offs, open
 * assemblies and what they drew) for 300 and 3,000 tools and bins with 20 and 200 badge holders,
 * against the phone's catalogue (GET /api/offline/catalogue for one member) on the same database in
 * the same run. An in-memory SQLite with the real migrations, filled as the catalogue bench fills it.
 * Median of timed runs after warm-up; the HTTP layer is not timed.
 */
import { createHash } from 'node:crypto';
import type { ServiceContext } from '../../server/context';
import { migrateDatabase, openDatabase } from '../../server/db/client';
import { badges } from '../../server/db/schema/badges';
import { stations } from '../../server/db/schema/stations';
import { takeCatalogue } from '../../server/features/offline/offline.service';
import { takeStationCopy } from '../../server/features/stations/station-copy.service';
import { DRAWS_PER_BIN, fillCrib, NOW, timed } from './offline-crib-fill';

const sha256 = (text: string) => createHash('sha256').update(text).digest('hex');
/** An argon2id PHC string's length and shape; the copy only carries it. */
const PIN_HASH = '$argon2id$v=19$m=19456,t=2,p=1$c29tZXNhbHRzb21lc2FsdA$' + 'A'.repeat(43);

function measure(size: number, holders: number) {
  const db = openDatabase(':memory:');
  migrateDatabase(db);
  const people = fillCrib(db, size, Math.max(40, holders));
  db.$client.prepare('update users set pin_hash = ?').run(PIN_HASH);
  db.insert(badges)
    .values(people.slice(0, holders).map((p) => ({ userId: p.id, tokenHash: sha256(`badge-${p.id}`), issuedById: p.id, issuedAt: NOW })))
    .run();
  const stationToken = 'bench-station-token';
  db.insert(stations).values({ name: 'Crib door', tokenHash: sha256(stationToken), enrolledById: people[0]!.id, enrolledAt: NOW }).run();
  const ctx: ServiceContext = { db, publicUrl: 'http://bench.test', now: () => NOW };

  // Interleaved (ABBA) so both sides see the same neighbours on a shared machine.
  const copy = [timed(() => takeStationCopy(ctx, stationToken))];
  const phone = [timed(() => takeCatalogue(ctx, people[0]!)), timed(() => takeCatalogue(ctx, people[0]!))];
  copy.push(timed(() => takeStationCopy(ctx, stationToken)));
  const answer = takeStationCopy(ctx, stationToken);
  db.$client.close();
  const copyMs = (copy[0]! + copy[1]!) / 2;
  const phoneMs = (phone[0]! + phone[1]!) / 2;
  return { size, holders, people: answer.people.length, bytes: JSON.stringify(answer).length, copyMs, phoneMs };
}

const rows = [measure(300, 20), measure(300, 200), measure(3000, 20), measure(3000, 200)];
console.log(`Gripline station copy bench: ${DRAWS_PER_BIN} draws per bin, about 30% of tools on loan; against one member's phone catalogue`);
for (const r of rows) {
  console.log(
    `${String(r.size).padStart(5)} tools and bins, ${String(r.holders).padStart(3)} badge holders  (${(r.bytes / 1024).toFixed(0)} KB of JSON)  ` +
      `station copy ${r.copyMs.toFixed(2)} ms, phone catalogue ${r.phoneMs.toFixed(2)} ms: ratio ${(r.copyMs / r.phoneMs).toFixed(2)}`,
  );
}
