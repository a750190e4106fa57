/**
 * `npm run bench`: checkout/return throughput over HTTP, Gripline against a bare better-sqlite3
 * baseline measured in the same process and the same run. Not a Vitest test (npm test never
 * picks up tests/bench/); figures are ratios against the baseline, never absolute promises.
 *
 * Both sides are a full createApp() on their own temporary WAL database file with the real
 * migrations and the same seed, listening on 127.0.0.1. The baseline app gets one extra router,
 * spliced into its /api stack just before the tools router, that answers the same two URLs with
 * raw better-sqlite3 statements prepared once: so each request pays for the same middleware
 * (helmet, pino-http, express.json, session, loadUser, CSRF) on both sides, and only the route
 * (zod parsing, Drizzle, the service) differs.
 */
import { join } from 'node:path';
import express, { type Request, type RequestHandler, type Response } from 'express';
import { hasRole } from '@shared/roles';
import { TOOL_CODE_PATTERN } from '@shared/schemas/tools';
import { CATEGORY_LABELS, DEFAULT_LOAN_DAYS, POWERED_CATEGORIES, isRivetSized, TOOL_CATEGORIES, type ToolCategory } from '@shared/tools/categories';
import type { App } from '../../server/app';
import { hashPassword } from '../../server/accounts/passwords';
import { migrateDatabase, openDatabase, type Database } from '../../server/db/client';
import type { UserRow } from '../../server/db/schema/users';
import { HttpError } from '../../server/lib/http-error';
import { checkoutReturnRequests, closeServed, drive, elapsedSince, fmt, mean, median, noRefusals, printLoadAverage, runBench, serveApp, signIn, type Member, type Run, type Served } from './http-bench';

const CONNECTIONS = 50;
const WARMUP_SECONDS = 3;
const RUN_SECONDS = 4;
/**
 * The machine is shared, so the load from other work swings within seconds: short runs in rounds of
 * Gripline, baseline, baseline, Gripline (ABBA), and the throughput ratio taken per round, so both
 * sides of each ratio saw the same neighbourhood. The headline is the median of the round ratios.
 */
const ROUNDS = 4;
const ROUND = ['gripline', 'baseline', 'baseline', 'gripline'] as const;
/** Each phase (warm-up, then each measured run) uses a fresh block of tools, all on the shelf. */
const PHASES_PER_SIDE = 1 + (ROUNDS * ROUND.length) / 2;
const TOOL_COUNT = 600;
const TRAY_FROM = 551; // tools 551..600 are temporary fastener trays (their return needs a count): never benched
const GOAL_RATIO = 0.85;
const GOAL_P99_MS = 25;
const WATCHDOG_MS = 150_000;
const PASSWORD = 'bench password that is long enough';

type Side = 'gripline' | 'baseline';

interface Target extends Served {
  side: Side;
  members: Member[];
}

interface Figures extends Run {
  side: Side;
}

// ---------------------------------------------------------------------------------------------
// Seed: the same chapter on both databases.

// Trays are added apart; cutters and dimple dies would need a rivet size the insert does not give.
const TOOL_CATEGORIES_BENCHED = TOOL_CATEGORIES.filter((c) => c !== 'temporary_fastener_tray' && !isRivetSized(c));

function seed(db: Database, passwordHash: string): void {
  const sqlite = db.$client;
  sqlite.transaction(() => {
    const addUser = sqlite.prepare<[string, string, string, string]>('insert into users (email, name, role, password_hash) values (?, ?, ?, ?)');
    const leadId = Number(addUser.run('lead@example.org', 'Lena Lead', 'lead', passwordHash).lastInsertRowid);
    const signoffId = Number(
      sqlite.prepare('insert into signoffs (name, description) values (?, ?)').run('Powered tools', 'Air drills, rivet guns, pneumatic pullers').lastInsertRowid,
    );
    const grant = sqlite.prepare<[number, number, number, number]>('insert into member_signoffs (signoff_id, user_id, granted_at, granted_by_id) values (?, ?, ?, ?)');
    for (let i = 1; i <= CONNECTIONS; i++) {
      const id = Number(addUser.run(`builder${i}@example.org`, `Builder ${i}`, 'member', passwordHash).lastInsertRowid);
      grant.run(signoffId, id, Date.now(), leadId);
    }
    const addTool = sqlite.prepare<[string, string, string, number | null, string | null, string | null, number | null, string, string]>(
      'insert into tools (code, name, category, required_signoff_id, drill_size, tray_size, tray_capacity, accessories, location) values (?, ?, ?, ?, ?, ?, ?, ?, ?)',
    );
    for (let i = 1; i <= TOOL_COUNT; i++) {
      const tray = i >= TRAY_FROM;
      const category: ToolCategory = tray ? 'temporary_fastener_tray' : TOOL_CATEGORIES_BENCHED[i % TOOL_CATEGORIES_BENCHED.length]!;
      const accessories = category.endsWith('rivet_puller') ? ['nosepiece 3/32', 'nosepiece 1/8'] : category === 'rivet_gun' ? ['spring retainer'] : [];
      addTool.run(
        toolCode(i),
        `${CATEGORY_LABELS[category]} ${i}`,
        category,
        POWERED_CATEGORIES.includes(category) ? signoffId : null,
        category === 'drill_bit' ? '#40' : null,
        tray ? '1/8' : null,
        tray ? 100 : null,
        JSON.stringify(accessories),
        `Shelf ${1 + (i % 12)}`,
      );
    }
  })();
}

const toolCode = (n: number) => `T-${String(n).padStart(4, '0')}`;

// ---------------------------------------------------------------------------------------------
// The baseline: the same checkout and return rules with raw statements prepared once.

interface ToolRowRaw {
  id: number;
  code: string;
  category: ToolCategory;
  status: string;
  status_note: string | null;
  loan_days: number | null;
  required_signoff_id: number | null;
  tray_capacity: number | null;
  accessories: string;
}

function bareRouter(db: Database) {
  const sqlite = db.$client;
  const s = {
    toolByCode: sqlite.prepare<[string], ToolRowRaw>('select * from tools where code = ?'),
    openLoan: sqlite.prepare<[number], { id: number; userId: number; holderName: string; dueAt: number }>(
      'select l.id, l.user_id as userId, u.name as holderName, l.due_at as dueAt from loans l join users u on u.id = l.user_id where l.tool_id = ? and l.returned_at is null',
    ),
    hasSignoff: sqlite.prepare<[number, number], { id: number }>('select id from member_signoffs where signoff_id = ? and user_id = ? and revoked_at is null'),
    offeredHold: sqlite.prepare<[number], { id: number; userId: number; name: string }>(
      "select h.id, h.user_id as userId, u.name from holds h join users u on u.id = h.user_id where h.tool_id = ? and h.status = 'offered'",
    ),
    firstWaiting: sqlite.prepare<[number], { id: number }>(
      "select h.id, h.user_id, u.name, u.email from holds h join users u on u.id = h.user_id where h.tool_id = ? and h.status = 'waiting' order by h.created_at, h.id limit 1",
    ),
    insertLoan: sqlite.prepare<[number, number, number, number], { id: number }>(
      'insert into loans (tool_id, user_id, checked_out_at, due_at) values (?, ?, ?, ?) returning id',
    ),
    setToolStatus: sqlite.prepare<[string, string | null, number, number]>('update tools set status = ?, status_note = ?, updated_at = ? where id = ?'),
    fulfilHold: sqlite.prepare<[number, number]>("update holds set status = 'fulfilled', closed_at = ? where id = ?"),
    closeLoan: sqlite.prepare<[number, number, string, string | null, number | null, number | null, number | null, number]>(
      'update loans set returned_at = ?, returned_by_id = ?, return_condition = ?, return_note = ?, returned_count = ?, shortfall = ?, return_photo_id = ? where id = ? and returned_at is null',
    ),
    insertEvent: sqlite.prepare<[number, number, number, string, string, string, string]>(
      'insert into tool_events (tool_id, actor_id, at, action, from_status, to_status, detail) values (?, ?, ?, ?, ?, ?, ?)',
    ),
  };
  const day = 24 * 60 * 60 * 1000;
  const dateWords = (ms: number) => new Date(ms).toISOString().slice(0, 10);
  const toolOrThrow = (code: string) => {
    const tool = s.toolByCode.get(code);
    if (!tool) throw new HttpError(404, 'TOOL_NOT_FOUND', `No tool has the code ${code}.`);
    return tool;
  };

  const checkOut = sqlite.transaction((user: UserRow, code: string, now: number) => {
    const tool = toolOrThrow(code);
    let holdId: number | undefined;
    if (tool.status === 'on_loan') {
      const loan = s.openLoan.get(tool.id);
      throw new HttpError(409, 'TOOL_ON_LOAN', `${tool.code} is on loan until ${loan ? dateWords(loan.dueAt) : 'its return'}.`);
    } else if (tool.status === 'held') {
      const offer = s.offeredHold.get(tool.id);
      if (offer && offer.userId !== user.id) throw new HttpError(409, 'TOOL_HELD', `${tool.code} is held for ${offer.name}.`);
      holdId = offer?.id;
    } else if (tool.status !== 'available') {
      throw new HttpError(403, 'TOOL_UNAVAILABLE', `${tool.code} is ${tool.status}.`);
    }
    if (tool.required_signoff_id !== null && !s.hasSignoff.get(tool.required_signoff_id, user.id)) {
      throw new HttpError(403, 'SIGNOFF_REQUIRED', `${tool.code} needs a sign-off.`);
    }
    const due = now + (tool.loan_days ?? DEFAULT_LOAN_DAYS[tool.category]) * day;
    const loanId = s.insertLoan.get(tool.id, user.id, now, due)!.id;
    s.setToolStatus.run('on_loan', null, now, tool.id);
    if (holdId !== undefined) s.fulfilHold.run(now, holdId);
    s.insertEvent.run(tool.id, user.id, now, 'checked_out', tool.status, 'on_loan', `Due ${dateWords(due)}`);
    return {
      id: loanId,
      toolId: tool.id,
      code: tool.code,
      holder: { id: user.id, name: user.name },
      checkedOutAt: new Date(now).toISOString(),
      dueAt: new Date(due).toISOString(),
      accessories: JSON.parse(tool.accessories) as string[],
    };
  });

  const returnTool = sqlite.transaction((user: UserRow, code: string, now: number) => {
    const tool = toolOrThrow(code);
    const loan = s.openLoan.get(tool.id);
    if (!loan) throw new HttpError(409, 'TOOL_NOT_ON_LOAN', `${tool.code} is not on loan.`);
    if (loan.userId !== user.id && !hasRole(user.role, 'quartermaster')) throw new HttpError(403, 'NOT_YOUR_LOAN', `${tool.code} is not yours.`);
    if (tool.category === 'temporary_fastener_tray') throw new HttpError(400, 'COUNT_REQUIRED', 'The baseline does not bench trays.');
    s.closeLoan.run(now, user.id, 'ok', null, null, null, null, loan.id);
    const detail = ['Came back ok', loan.userId !== user.id ? `returned for ${loan.holderName}` : ''].filter(Boolean).join('; ');
    if (s.firstWaiting.get(tool.id)) throw new HttpError(500, 'BENCH_UNEXPECTED_HOLD', 'The bench seeds no holds.');
    s.setToolStatus.run('available', null, now, tool.id);
    s.insertEvent.run(tool.id, user.id, now, 'returned', 'on_loan', 'available', detail);
    return { loanId: loan.id, code: tool.code, status: 'available', shortfall: null, offeredTo: null };
  });

  const parsed = (req: Request) => {
    if (!req.user) throw new HttpError(401, 'NOT_SIGNED_IN', 'Sign in to continue.');
    const code = String(req.params.code).trim().toUpperCase();
    if (!TOOL_CODE_PATTERN.test(code)) throw new HttpError(400, 'VALIDATION_FAILED', 'A tool code looks like T-0042.');
    return { user: req.user, code, body: (req.body ?? {}) as { dueAt?: unknown; condition?: unknown } };
  };

  const router = express.Router();
  router.post('/:code/checkout', (req: Request, res: Response) => {
    const { user, code, body } = parsed(req);
    if (body.dueAt !== undefined) throw new HttpError(400, 'VALIDATION_FAILED', 'The baseline takes no due date.');
    res.status(201).json(checkOut(user, code, Date.now()));
  });
  router.post('/:code/return', (req: Request, res: Response) => {
    const { user, code, body } = parsed(req);
    if (body.condition !== 'ok') throw new HttpError(400, 'VALIDATION_FAILED', 'The baseline benches condition "ok" only.');
    res.json(returnTool(user, code, Date.now()));
  });
  return router;
}

interface RouterLayer {
  rawPath?: unknown;
  handle: RequestHandler & { stack?: RouterLayer[] };
}

/**
 * Puts the bare router into the app's own /api stack, just before the tools router, without
 * touching server code: the request goes through exactly the middleware a Gripline request does.
 */
function spliceBareRouter(app: App, router: express.Router): void {
  const appStack = (app as unknown as { router: { stack: RouterLayer[] } }).router.stack;
  const api = appStack.find((l) => l.rawPath === '/api' && Array.isArray(l.handle.stack))?.handle as unknown as
    | { stack: RouterLayer[]; use(path: string, router: express.Router): unknown }
    | undefined;
  if (!api) throw new Error('Could not find the /api router in the app stack; the baseline cannot share the middleware.');
  const toolsAt = api.stack.findIndex((l) => l.rawPath === '/tools');
  if (toolsAt < 0) throw new Error('Could not find the /tools router in the /api stack.');
  api.use('/tools', router);
  const added = api.stack.pop()!;
  api.stack.splice(toolsAt, 0, added);
}

// ---------------------------------------------------------------------------------------------
// Building, signing in, driving.

async function buildTarget(side: Side, dir: string, passwordHash: string): Promise<Target> {
  const db = openDatabase(join(dir, `${side}.sqlite`));
  migrateDatabase(db);
  seed(db, passwordHash);
  const served = await serveApp(db, side === 'baseline' ? (app) => spliceBareRouter(app, bareRouter(db)) : undefined);
  const members: Member[] = [];
  for (let i = 1; i <= CONNECTIONS; i += 5) {
    const batch = Array.from({ length: Math.min(5, CONNECTIONS - i + 1) }, (_, k) => signIn(served.base, `builder${i + k}@example.org`, PASSWORD));
    members.push(...(await Promise.all(batch)));
  }
  return { ...served, side, members };
}

/** Connection n: member n, tool (block * CONNECTIONS + n). */
async function driveSide(target: Target, block: number, seconds: number): Promise<Figures> {
  const run = await drive(target.base, checkoutReturnRequests(target.members, (n) => toolCode(block * CONNECTIONS + n + 1)), seconds);
  return { ...run, side: target.side };
}

// ---------------------------------------------------------------------------------------------
// Report.

const startedAt = Date.now();
const elapsed = elapsedSince(startedAt);

interface Summary {
  reqPerSec: number;
  meanMs: number;
  p99Ms: number;
  worstP99Ms: number;
  busyMsPerReq: number;
  non2xx: number;
  errors: number;
}

function row(label: string, f: Summary): string {
  return `${label.padEnd(24)}${fmt(f.reqPerSec, 0)}${fmt(f.meanMs, 2)}${fmt(f.p99Ms, 0)}${fmt(f.worstP99Ms, 0, 11)}${fmt(f.busyMsPerReq, 3, 13)}${String(f.non2xx + f.errors).padStart(9)}`;
}

function header(): void {
  console.log(`Gripline checkout/return bench: ${CONNECTIONS} connections, ${WARMUP_SECONDS} s warm-up per side, then ${ROUNDS} rounds of ${ROUND.join(', ')} (${RUN_SECONDS} s each).
Load: autocannon in a worker thread of this process; connection n is signed in as its own member
(session cookie + X-CSRF-Token obtained over HTTP) and alternates POST /api/tools/T-xxxx/checkout {}
and POST /api/tools/T-xxxx/return {"condition":"ok"} on its own tool; a fresh block of tools per phase.
Each side: createApp() on its own temporary WAL file (openDatabase + migrateDatabase), the same seed
(${TOOL_COUNT} tools, ${CONNECTIONS} members with the powered-tools sign-off), 127.0.0.1, port 0.
  gripline  the real route: tools router (requireRole, zod params/body), loans.service checkOut/returnTool
            with the Drizzle statements prepared in loans.repo, the return's hold-queue check included.
  baseline  a bare Express router spliced into a second createApp's /api stack before the tools router:
            the same URLs through the SAME middleware (helmet, pino-http (silent), express.json, session
            store read + rolling touch, loadUser, CSRF check), then raw better-sqlite3 statements prepared
            once in one sqlite.transaction per request: tool by code, status / sign-off / open-loan checks,
            insert or close the loan, update the tool status, check the hold queue (return), insert the
            tool_events row; same JSON answer. Code and body are checked by hand, not with zod.
`);
}

async function main(dir: string): Promise<boolean> {
  if (PHASES_PER_SIDE * CONNECTIONS >= TRAY_FROM) throw new Error('Not enough seeded tools for a fresh block per phase.');
  header();
  const targets: Target[] = [];
  try {
    const passwordHash = await hashPassword(PASSWORD);
    const gripline = await buildTarget('gripline', dir, passwordHash);
    targets.push(gripline);
    const baseline = await buildTarget('baseline', dir, passwordHash);
    targets.push(baseline);
    const bySide = { gripline, baseline };

    console.log(`${elapsed()} both apps built and ${CONNECTIONS * 2} sessions signed in`);

    const all: Figures[] = [];
    for (const t of [gripline, baseline]) {
      const f = await driveSide(t, 0, WARMUP_SECONDS);
      console.log(`${elapsed()} warm-up ${t.side.padEnd(9)} ${f.total} requests (${f.statusCodes})`);
      all.push(f);
    }
    const blockOf = { gripline: 1, baseline: 1 };
    const rounds: Figures[][] = [];
    for (let r = 0; r < ROUNDS; r++) {
      const round: Figures[] = [];
      for (const side of ROUND) {
        const f = await driveSide(bySide[side], blockOf[side]++, RUN_SECONDS);
        console.log(
          `${elapsed()} round ${r + 1} ${side.padEnd(9)} ${f.reqPerSec.toFixed(0).padStart(5)} req/s, p99 ${f.p99Ms} ms, cpu ${f.busyMsPerReq.toFixed(3)} ms/req (${f.statusCodes})`,
        );
        round.push(f);
        all.push(f);
      }
      rounds.push(round);
    }
    const measured = rounds.flat();

    const summary = (side: Side) => {
      const fs = measured.filter((f) => f.side === side);
      return {
        reqPerSec: mean(fs.map((f) => f.reqPerSec)),
        meanMs: mean(fs.map((f) => f.meanMs)),
        p99Ms: median(fs.map((f) => f.p99Ms)),
        worstP99Ms: Math.max(...fs.map((f) => f.p99Ms)),
        busyMsPerReq: median(fs.map((f) => f.busyMsPerReq)),
        non2xx: fs.reduce((a, f) => a + f.non2xx, 0),
        errors: fs.reduce((a, f) => a + f.errors + f.timeouts, 0),
      };
    };
    const sideMean = (fs: Figures[], side: Side) => mean(fs.filter((f) => f.side === side).map((f) => f.reqPerSec));
    const roundRatios = rounds.map((round) => sideMean(round, 'gripline') / sideMean(round, 'baseline'));
    const g = summary('gripline');
    const b = summary('baseline');
    const ratio = median(roundRatios);

    console.log(`\n${''.padEnd(24)}${'req/s'.padStart(9)}${'mean ms'.padStart(9)}${'p99 ms'.padStart(9)}${'worst p99'.padStart(11)}${'cpu ms/req'.padStart(13)}${'errors'.padStart(9)}`);
    console.log(row('Gripline', g));
    console.log(row('baseline (bare sqlite)', b));
    console.log(`(req/s and mean: mean of ${ROUNDS * 2} runs of ${RUN_SECONDS} s per side; p99: median run, then worst run;`);
    console.log(` cpu ms/req: the server thread's CPU time per answered request, median run: less moved by neighbours than req/s)`);
    console.log(`\nround ratios gripline/baseline: ${roundRatios.map((x) => x.toFixed(2)).join('  ')}; pooled ${(g.reqPerSec / b.reqPerSec).toFixed(2)}`);
    console.log(`throughput ratio (median round): ${ratio.toFixed(2)}× (goal ≥ ${GOAL_RATIO}×): ${ratio >= GOAL_RATIO ? 'met' : 'NOT met'}`);
    console.log(`server CPU per request gripline/baseline: ${(g.busyMsPerReq / b.busyMsPerReq).toFixed(2)}× (1/that = ${(b.busyMsPerReq / g.busyMsPerReq).toFixed(2)}× throughput when the CPU is ours)`);
    console.log(`Gripline p99 (median run): ${g.p99Ms} ms, worst ${g.worstP99Ms} ms (goal < ${GOAL_P99_MS} ms): ${g.p99Ms < GOAL_P99_MS ? 'met' : 'NOT met'}`);
    const neededRps = (CONNECTIONS * 1000) / GOAL_P99_MS;
    console.log(
      `(closed loop: mean latency = connections / throughput, so p99 < ${GOAL_P99_MS} ms at ${CONNECTIONS} connections needs well over ${neededRps.toFixed(0)} req/s; the baseline, with the same middleware, made ${b.reqPerSec.toFixed(0)})`,
    );
    printLoadAverage();

    for (const t of targets) {
      const loans = t.db.$client.prepare('select count(*) as n, count(returned_at) as closed from loans').get() as { n: number; closed: number };
      const events = t.db.$client.prepare('select count(*) as n from tool_events').get() as { n: number };
      console.log(`${t.side.padEnd(9)} wrote ${loans.n} loans (${loans.closed} returned) and ${events.n} tool_events rows`);
    }

    return noRefusals(all, (f) => f.side);
  } finally {
    for (const t of targets) await closeServed(t);
  }
}

void runBench('bench', 'gripline-bench-', WATCHDOG_MS, main);
