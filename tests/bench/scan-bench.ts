/**
 * `npm run bench`: what a scan asks for, GET /api/tools/:code and GET /api/bins/:code, against
 * alternating checkout and return requests on the same app in the same run. Not a Vitest test;
 * figures are ratios against the checkout/return rate, never absolute promises.
 *
 * One createApp() on a temporary WAL file with the real migrations and the demo chapter, signed in
 * over HTTP as the demo member on every connection. GET /api/health (no session, no database) is
 * shown beside them as the ceiling of the middleware in front of every route.
 */
import { join } from 'node:path';
import { migrateDatabase, openDatabase } from '../../server/db/client';
import { DEMO_PASSWORD, seedDemoChapter } from '../../server/seed/demo-chapter';
import {
  checkoutReturnRequests,
  closeServed,
  drive,
  elapsedSince,
  fmt,
  mean,
  median,
  memberHeaders,
  noRefusals,
  printLoadAverage,
  runBench,
  serveApp,
  signIn,
  type BenchRequest,
  type Member,
  type Run,
  type Served,
} from './http-bench';

const CONNECTIONS = 10;
const WARMUP_SECONDS = 2;
const RUN_SECONDS = 3;
/** The load from other work on a shared machine swings within seconds: each round runs every kind once, in a rotated order, and ratios are taken per round. */
const ROUNDS = 6;
const KINDS = ['checkout', 'tool', 'bin', 'health'] as const;
type Kind = (typeof KINDS)[number];
const LABELS: Record<Kind, string> = {
  checkout: 'checkout/return',
  tool: 'GET /api/tools/:code',
  bin: 'GET /api/bins/:code',
  health: 'GET /api/health',
};
const GOAL_RATIO = 1;
const WATCHDOG_MS = 150_000;
const MEMBER = 'member@example.org';
const SETTLE_MS = 300;

interface Figures extends Run {
  kind: Kind;
}

interface Scene {
  served: Served;
  members: Member[];
  /** The tools connection n checks out and returns: on the shelf, no tray count, no sign-off the member lacks. */
  checkoutCodes: string[];
  toolCodes: string[];
  binCodes: string[];
}

async function buildScene(dir: string): Promise<Scene> {
  const db = openDatabase(join(dir, 'demo.sqlite'));
  migrateDatabase(db);
  await seedDemoChapter(db);
  const sqlite = db.$client;
  const codes = (query: string, ...params: unknown[]) => (sqlite.prepare(query).all(...params) as { code: string }[]).map((r) => r.code);
  const checkoutCodes = codes(
    `select code from tools t where status = 'available' and category <> 'temporary_fastener_tray'
       and (required_signoff_id is null or exists (select 1 from member_signoffs ms join users u on u.id = ms.user_id
            where ms.signoff_id = t.required_signoff_id and u.email = ? and ms.revoked_at is null))
     order by code limit ?`,
    MEMBER,
    CONNECTIONS,
  );
  if (checkoutCodes.length < CONNECTIONS) throw new Error(`The demo crib has ${checkoutCodes.length} tools the member may check out; ${CONNECTIONS} are needed.`);
  const served = await serveApp(db);
  const members: Member[] = [];
  for (let i = 0; i < CONNECTIONS; i++) members.push(await signIn(served.base, MEMBER, DEMO_PASSWORD));
  return { served, members, checkoutCodes, toolCodes: codes('select code from tools order by code'), binCodes: codes('select code from bins order by code') };
}

/** Each connection opens every code in turn, starting at its own place in the list. */
function scanRequests(members: Member[], prefix: string, codes: string[]): BenchRequest[][] {
  return members.map((m, n) => {
    const start = Math.floor((n * codes.length) / members.length);
    const rotated = [...codes.slice(start), ...codes.slice(0, start)];
    return rotated.map((code) => ({ method: 'GET', path: `${prefix}/${code}`, headers: { cookie: m.cookie } }));
  });
}

function requestsFor(scene: Scene, kind: Kind): BenchRequest[][] {
  switch (kind) {
    case 'checkout':
      return checkoutReturnRequests(scene.members, (n) => scene.checkoutCodes[n]!);
    case 'tool':
      return scanRequests(scene.members, '/api/tools', scene.toolCodes);
    case 'bin':
      return scanRequests(scene.members, '/api/bins', scene.binCodes);
    case 'health':
      return scene.members.map(() => [{ method: 'GET', path: '/api/health', headers: {} }]);
  }
}

/**
 * A run ends wherever it is: a tool left on loan is returned, so the next checkout run starts on the
 * shelf again. Requests already on the wire when autocannon stops are still answered, so first wait.
 */
async function settle(scene: Scene): Promise<void> {
  await new Promise((resolve) => setTimeout(resolve, SETTLE_MS));
  const onLoan = scene.served.db.$client.prepare<[string], { status: string }>('select status from tools where code = ?');
  for (const [n, code] of scene.checkoutCodes.entries()) {
    if (onLoan.get(code)?.status !== 'on_loan') continue;
    const res = await fetch(`${scene.served.base}/api/tools/${code}/return`, { method: 'POST', headers: memberHeaders(scene.members[n]!), body: '{"condition":"ok"}' });
    if (res.status !== 200) throw new Error(`could not return ${code} after a run: ${res.status} ${await res.text()}`);
  }
}

async function run(scene: Scene, kind: Kind, seconds: number): Promise<Figures> {
  const figures = { ...(await drive(scene.served.base, requestsFor(scene, kind), seconds)), kind };
  if (kind === 'checkout') await settle(scene);
  return figures;
}

function header(scene: Scene): void {
  console.log(`Gripline scan bench: ${CONNECTIONS} connections, ${WARMUP_SECONDS} s warm-up per kind, then ${ROUNDS} rounds of every kind in a rotated order (${RUN_SECONDS} s each).
One createApp() on a temporary WAL file, migrated, with the demo chapter (${scene.toolCodes.length} tools, ${scene.binCodes.length} bins);
every connection is signed in over HTTP as ${MEMBER} (its own session cookie and X-CSRF-Token).
  ${LABELS.checkout.padEnd(22)}connection n alternates POST /api/tools/<its tool>/checkout {} and /return {"condition":"ok"}
  ${''.padEnd(22)}on its own tool from the shelf (${scene.checkoutCodes[0]} ...): the rate the scan reads are measured against
  ${LABELS.tool.padEnd(22)}each connection opens every tool in turn (the tool and what the member may do with it)
  ${LABELS.bin.padEnd(22)}each connection opens every bin in turn (the bin and what the member may do with it)
  ${LABELS.health.padEnd(22)}no session, no database: the ceiling of the middleware in front of every route
`);
}

async function main(dir: string): Promise<boolean> {
  const elapsed = elapsedSince(Date.now());

  let scene: Scene | undefined;
  try {
    scene = await buildScene(dir);
    header(scene);
    const all: Figures[] = [];
    for (const kind of KINDS) {
      const f = await run(scene, kind, WARMUP_SECONDS);
      console.log(`${elapsed()} warm-up ${kind.padEnd(9)} ${f.total} requests (${f.statusCodes})`);
      all.push(f);
    }
    const rounds: Figures[][] = [];
    for (let r = 0; r < ROUNDS; r++) {
      const order = [...KINDS.slice(r % KINDS.length), ...KINDS.slice(0, r % KINDS.length)];
      const round: Figures[] = [];
      for (const kind of order) {
        const f = await run(scene, kind, RUN_SECONDS);
        console.log(`${elapsed()} round ${r + 1} ${kind.padEnd(9)} ${f.reqPerSec.toFixed(0).padStart(5)} req/s, p99 ${f.p99Ms} ms, cpu ${f.busyMsPerReq.toFixed(3)} ms/req (${f.statusCodes})`);
        round.push(f);
        all.push(f);
      }
      rounds.push(round);
    }

    const of = (fs: Figures[], kind: Kind) => fs.find((f) => f.kind === kind)!;
    const measured = rounds.flat();
    console.log(`\n${''.padEnd(24)}${'req/s'.padStart(9)}${'mean ms'.padStart(9)}${'p99 ms'.padStart(9)}${'cpu ms/req'.padStart(13)}${'× checkout'.padStart(12)}${'cpu ×'.padStart(8)}${'  round ratios'}`);
    let goalMet = true;
    const cpuOf = (kind: Kind) => median(measured.filter((f) => f.kind === kind).map((f) => f.busyMsPerReq));
    for (const kind of KINDS) {
      const fs = measured.filter((f) => f.kind === kind);
      const ratios = rounds.map((round) => of(round, kind).reqPerSec / of(round, 'checkout').reqPerSec);
      const ratio = median(ratios);
      if ((kind === 'tool' || kind === 'bin') && ratio < GOAL_RATIO) goalMet = false;
      console.log(
        `${LABELS[kind].padEnd(24)}${fmt(mean(fs.map((f) => f.reqPerSec)), 0)}${fmt(mean(fs.map((f) => f.meanMs)), 2)}${fmt(median(fs.map((f) => f.p99Ms)), 0)}${fmt(cpuOf(kind), 3, 13)}${fmt(ratio, 2, 11)}×${fmt(cpuOf('checkout') / cpuOf(kind), 2, 7)}×  ${kind === 'checkout' ? '' : ratios.map((x) => x.toFixed(2)).join('  ')}`,
      );
    }
    console.log(`(req/s and mean: mean of ${ROUNDS} runs of ${RUN_SECONDS} s; p99 and cpu ms/req (server thread CPU per answered request): median run;`);
    console.log(` × checkout: the median over rounds of req/s against the checkout/return run of the same round;`);
    console.log(` cpu ×: checkout/return CPU per request over this kind's, the throughput ratio when the CPU is ours alone)`);
    console.log(`scan reads at least ${GOAL_RATIO.toFixed(2)}× the checkout/return rate: ${goalMet ? 'met' : 'NOT met'}`);
    printLoadAverage();
    return noRefusals(all, (f) => f.kind);
  } finally {
    if (scene) await closeServed(scene.served);
  }
}

void runBench('scan bench', 'gripline-scan-bench-', WATCHDOG_MS, main);
