/**
 * `npm run bench`: how long GET /api/health takes to answer while the server imports 5,000 bins
 * from a CSV (the preview, then the import) and while it draws a 300-label sheet, against the same
 * server idle in the same run. Not a Vitest test; the figures are ratios to the idle baseline.
 *
 * One createApp() on a temporary WAL file with the real migrations, listening on 127.0.0.1; a
 * quartermaster signed in over HTTP. Each round: idle health answers, then the import into an empty
 * crib (the bins are removed after it), then the label sheet, each while health is asked for again
 * and again, one request at a time.
 */
import { join } from 'node:path';
import { hashPassword } from '../../server/accounts/passwords';
import { insertUser } from '../../server/accounts/users.repo';
import { migrateDatabase, openDatabase } from '../../server/db/client';
import { tools } from '../../server/db/schema/tools';
import { healthLatenciesDuring, idleHealthLatencies, screwsCsv } from '../helpers/health-latency';
import { closeServed, fmt, median, memberHeaders, printLoadAverage, runBench, serveApp, signIn, type Member, type Served } from './http-bench';

const ROUNDS = 3;
const IMPORT_ROWS = 5000;
const LABELS = 300;
const IDLE_SAMPLES = 60;
/** The bound for any answer while heavy work runs. */
const BOUND_MS = 200;
const WATCHDOG_MS = 300_000;
const PASSWORD = 'bench-password-long-enough';
const LAYOUT = 'thermal-1x1-2x1in';

interface Sample {
  what: string;
  latencies: number[];
  workMs: number;
}

async function importOnce(base: string, qm: Member, csv: string): Promise<void> {
  for (const path of ['/api/bins/import/preview', '/api/bins/import']) {
    const res = await fetch(`${base}${path}`, { method: 'POST', headers: memberHeaders(qm), body: JSON.stringify({ csv }) });
    if (res.status !== (path.endsWith('preview') ? 200 : 201)) throw new Error(`${path} answered ${res.status}: ${(await res.text()).slice(0, 300)}`);
    await res.arrayBuffer();
  }
}

async function sheetOnce(base: string, qm: Member, codes: string[]): Promise<void> {
  const res = await fetch(`${base}/api/labels/sheet`, { method: 'POST', headers: memberHeaders(qm), body: JSON.stringify({ layoutId: LAYOUT, codes }) });
  if (res.status !== 200) throw new Error(`the label sheet answered ${res.status}: ${(await res.text()).slice(0, 300)}`);
  await res.arrayBuffer();
}

async function timed(what: string, base: string, work: () => Promise<void>): Promise<Sample> {
  const start = performance.now();
  const { latencies } = await healthLatenciesDuring(base, work);
  return { what, latencies, workMs: performance.now() - start };
}

interface Scene {
  served: Served;
  qm: Member;
}

/** A fresh crib per round, so every import starts from the same empty crib. */
async function freshScene(dir: string, round: number, codes: readonly string[]): Promise<Scene> {
  const db = openDatabase(join(dir, `heavy-${round}.sqlite`));
  migrateDatabase(db);
  insertUser(db, { email: 'qm@example.org', name: 'Bench Quartermaster', role: 'quartermaster', passwordHash: await hashPassword(PASSWORD) });
  db.insert(tools)
    .values(codes.map((code, i) => ({ code, name: `Hand rivet puller ${i + 1}`, category: 'hand_rivet_puller' as const })))
    .run();
  const served = await serveApp(db);
  return { served, qm: await signIn(served.base, 'qm@example.org', PASSWORD) };
}

async function main(dir: string): Promise<boolean> {
  const codes = Array.from({ length: LABELS }, (_, i) => `T-${String(i + 1).padStart(4, '0')}`);
  const csv = screwsCsv(IMPORT_ROWS);
  const samples: Sample[] = [];
  const idle: number[] = [];
  for (let round = 0; round < ROUNDS; round++) {
    const { served, qm } = await freshScene(dir, round, codes);
    try {
      if (round === 0) {
        // Warm-up: the JIT and the statement caches, on a small file and sheet (the round's own file then names other screws).
        await importOnce(served.base, qm, screwsCsv(50));
        await sheetOnce(served.base, qm, codes.slice(0, 30));
      }
      idle.push(...(await idleHealthLatencies(served.base, IDLE_SAMPLES)));
      samples.push(await timed(`import ${IMPORT_ROWS} rows`, served.base, () => importOnce(served.base, qm, round === 0 ? csv.replace(/Screw #8-32/g, 'Screw #10-32') : csv)));
      samples.push(await timed(`${LABELS}-label sheet`, served.base, () => sheetOnce(served.base, qm, codes)));
    } finally {
      await closeServed(served);
    }
  }
  const idleMedian = median(idle);
  console.log(`Gripline heavy-work bench: GET /api/health asked for one request at a time, idle and while the server works (${ROUNDS} rounds, a fresh crib each).
  import      POST /api/bins/import/preview then /api/bins/import with ${IMPORT_ROWS} new bins (${(csv.length / 1000).toFixed(0)} KB of CSV)
  label sheet POST /api/labels/sheet, ${LABELS} tool labels on ${LAYOUT} (${LABELS} pages)
`);
  console.log(`${'while'.padEnd(22)}${'answers'.padStart(9)}${'median ms'.padStart(11)}${'max ms'.padStart(9)}${'median/idle'.padStart(13)}${'max/idle'.padStart(10)}${'work ms'.padStart(9)}`);
  console.log(`${'idle'.padEnd(22)}${String(idle.length).padStart(9)}${fmt(idleMedian, 2, 11)}${fmt(Math.max(...idle), 1, 9)}${fmt(1, 1, 13)}${''.padStart(10)}${''.padStart(9)}`);
  let within = true;
  for (const what of [...new Set(samples.map((s) => s.what))]) {
    const runs = samples.filter((s) => s.what === what);
    const latencies = runs.flatMap((s) => s.latencies);
    const max = Math.max(...latencies);
    within &&= max < BOUND_MS;
    console.log(
      `${what.padEnd(22)}${String(latencies.length).padStart(9)}${fmt(median(latencies), 2, 11)}${fmt(max, 1, 9)}${fmt(median(latencies) / idleMedian, 1, 13)}${fmt(max / idleMedian, 1, 10)}${fmt(median(runs.map((r) => r.workMs)), 0, 9)}`,
    );
  }
  console.log(`\ngoal: every health answer under ${BOUND_MS} ms while the work runs: ${within ? 'met' : 'NOT met'} in this run`);
  printLoadAverage();
  return true;
}

await runBench('heavy-work bench', 'gripline-heavy-', WATCHDOG_MS, main);
