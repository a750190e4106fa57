/**
 * Forecast bench against a real database (run with tsx): the whole GET /api/forecast work on the
 * server side, queries, one estimate per assembly, the mapping to bins and every bin's forecast, for
 * 50 and for 500 bins with 200 planned assemblies (three rivet lines and two extra items each) and
 * 26 weeks of draw history (3 draws per bin-week). An in-memory SQLite with the real migrations,
 * filled from a seeded generator. Median of timed runs after warm-up; the HTTP layer is not timed.
 */
import { performance } from 'node:perf_hooks';
import { seededRandom as seeded } from '@shared/random/seeded';
import { BLIND_GRIP_RANGES } from '@shared/stock/fasteners';
import type { ServiceContext } from '../../server/context';
import { migrateDatabase, openDatabase, type Database } from '../../server/db/client';
import { assemblies, binAlerts, builds } from '../../server/db/schema/builds';
import { bins, stockMovements } from '../../server/db/schema/stock';
import { users } from '../../server/db/schema/users';
import { forecastList } from '../../server/features/planning/forecast-list';
import { median } from './median';

const ASSEMBLIES = 200;
const WEEKS = 26;
const DRAWS_PER_BIN_WEEK = 3;
const RUNS = 15;
const GOAL_MS_500 = 200;
const DAY_MS = 86_400_000;
const NOW = new Date('2026-12-02T15:30:00Z');

/** 72 rivet specs: two blind kinds × two heads × three diameters × six grips. */
const SPECS = (['blind_structural', 'blind_general'] as const).flatMap((kind) =>
  (['dome', 'countersunk'] as const).flatMap((head) => [3, 4, 5].flatMap((diameter32) => BLIND_GRIP_RANGES.slice(0, 6).map((g) => ({ kind, head, diameter32, grip: g })))),
);

function fill(db: Database, binCount: number, seed: number): void {
  const random = seeded(seed);
  const between = (lo: number, hi: number) => lo + Math.floor(random() * (hi - lo + 1));
  const user = db.insert(users).values({ email: 'bench@example.org', name: 'Bench', role: 'lead', passwordHash: 'x' }).returning().get();
  const rivetBins = Math.min(SPECS.length, Math.floor(binCount / 3));
  const binRows = Array.from({ length: binCount }, (_, i) => {
    const spec = i < rivetBins ? SPECS[i]! : null;
    return {
      code: `B-${String(i + 1).padStart(4, '0')}`,
      kind: spec?.kind ?? ('screw' as const),
      name: spec ? '' : `Screw ${i}`,
      head: spec?.head ?? null,
      material: spec ? '5056' : null,
      diameter32: spec?.diameter32 ?? null,
      grip16: spec?.grip.dash ?? null,
      packSize: [1, 25, 100, 250][between(0, 3)]!,
      unitCostE4: between(100, 50_000),
      supplier: ['Cedar Valley Fastener Supply', 'Harbour Hardware Co.', 'Ridge Line Aero Parts'][between(0, 2)]!,
      leadTimeDays: [7, 10, 14, 21][between(0, 3)]!,
      onHand: between(0, 3000),
    };
  });
  const ids = db.insert(bins).values(binRows).returning({ id: bins.id }).all().map((r) => r.id);

  const build = db.insert(builds).values({ ownerId: user.id, name: 'Bench build' }).returning().get();
  const assemblyRows = Array.from({ length: ASSEMBLIES }, (_, i) => {
    const lines = Array.from({ length: 3 }, () => {
      const spec = SPECS[between(0, rivetBins - 1)]!;
      const kind = spec.kind === 'blind_structural' ? 'blind-structural' : 'blind-general';
      return { length: between(12, 60), rows: between(1, 2), pitch: 0.8, stack: [(spec.grip.min + spec.grip.max) / 2], structural: false, rivet: { kind, head: spec.head, diameter32: spec.diameter32, material: '5056' } };
    });
    const extraItems = Array.from({ length: 2 }, () => ({ binCode: binRows[between(rivetBins, binCount - 1)]!.code, quantity: between(5, 200) }));
    const startDay = between(-30, 200);
    const dated = random() > 0.1;
    return {
      buildId: build.id,
      name: `Assembly ${i}`,
      status: random() < 0.3 ? ('in_progress' as const) : ('planned' as const),
      plannedStart: dated ? new Date(NOW.getTime() + startDay * DAY_MS) : null,
      plannedFinish: dated ? new Date(NOW.getTime() + (startDay + between(3, 90)) * DAY_MS) : null,
      unit: 'in' as const,
      lines: JSON.stringify(lines),
      extraItems: JSON.stringify(extraItems),
    };
  });
  const assemblyIds = db.insert(assemblies).values(assemblyRows).returning({ id: assemblies.id }).all().map((r) => r.id);

  db.transaction((tx) => {
    for (const binId of ids) {
      for (let k = 0; k < WEEKS * DRAWS_PER_BIN_WEEK; k++) {
        const quantity = random() < 0.1 ? between(1, 10) : -between(1, 60);
        tx.insert(stockMovements)
          .values({
            binId,
            kind: quantity > 0 ? 'return_unused' : 'draw',
            quantity,
            balanceAfter: 0,
            unitCostE4: 1000,
            at: new Date(NOW.getTime() - between(1, WEEKS * 7 + 3) * DAY_MS),
            actorId: user.id,
            memberId: user.id,
            assemblyId: random() < 0.2 ? assemblyIds[between(0, ASSEMBLIES - 1)]! : null,
          })
          .run();
      }
      if (random() < 0.1) {
        tx.insert(binAlerts)
          .values({ binId, state: 'ordered', raisedAt: NOW, reason: 'bench', onHandAtRaise: 0, reorderPoint: 0, safetyStock: 0, suggestedQty: 100, orderedQty: 100, expectedAt: new Date(NOW.getTime() + between(-3, 40) * DAY_MS) })
          .run();
      }
    }
  });
}


function measure(binCount: number) {
  const db = openDatabase(':memory:');
  migrateDatabase(db);
  fill(db, binCount, 417 + binCount);
  const ctx: ServiceContext = { db, publicUrl: 'http://bench.test', now: () => NOW };
  let alerts = 0;
  for (let i = 0; i < 5; i++) forecastList(ctx);
  const times: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const start = performance.now();
    alerts = forecastList(ctx).data.filter((f) => f.needsAlert).length;
    times.push(performance.now() - start);
  }
  const movements = db.$client.prepare('select count(*) as n from stock_movements').get() as { n: number };
  db.$client.close();
  return { binCount, movements: movements.n, alerts, medianMs: median(times), minMs: Math.min(...times), maxMs: Math.max(...times) };
}

const small = measure(50);
const large = measure(500);
console.log(`Gripline forecast bench with the database: ${WEEKS} weeks, ${ASSEMBLIES} assemblies (3 rivet lines, 2 extra items each)`);
for (const r of [small, large]) {
  console.log(`${String(r.binCount).padStart(4)} bins  ${String(r.movements).padStart(6)} ledger rows  ${r.alerts} alerts  median ${r.medianMs.toFixed(2)} ms of ${RUNS} (min ${r.minMs.toFixed(2)}, max ${r.maxMs.toFixed(2)})`);
}
const met = large.medianMs < GOAL_MS_500;
console.log(`\n500 bins from the database: ${large.medianMs.toFixed(2)} ms (goal < ${GOAL_MS_500} ms): ${met ? 'met' : 'NOT met'}`);
console.log(`500/50 time ratio: ${(large.medianMs / small.medianMs).toFixed(2)}`);
if (!met) process.exitCode = 1;
