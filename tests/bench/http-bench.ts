/**
 * What the HTTP benches share: a full createApp() listening on 127.0.0.1 (its mail stays in the outbox),
 * signing in over HTTP, driving per-connection request lists with autocannon in a worker thread,
 * and the server thread's CPU time per answered request.
 */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { fileURLToPath } from 'node:url';
import autocannon from 'autocannon';
import { pino } from 'pino';
import { createApp, type App } from '../../server/app';
import type { Database } from '../../server/db/client';
import type { Member } from '../helpers/http-sign-in';

export { signIn, type Member } from '../helpers/http-sign-in';

/** Read by checkout-bench-client.cts in autocannon's worker. */
const BENCH_ENV = 'GRIPLINE_BENCH_CONNECTIONS';
const SETUP_CLIENT = fileURLToPath(new URL('./checkout-bench-client.cts', import.meta.url));

export interface BenchRequest {
  method: 'GET' | 'POST';
  path: string;
  headers: Record<string, string>;
  body?: string;
}

export interface Served {
  db: Database;
  app: App;
  server: Server;
  base: string;
}

export interface Run {
  reqPerSec: number;
  meanMs: number;
  p99Ms: number;
  total: number;
  non2xx: number;
  errors: number;
  timeouts: number;
  statusCodes: string;
  /** Server (main) thread CPU time per answered request; event-loop busy time where /proc is missing. */
  busyMsPerReq: number;
}

/** createApp() on a migrated, seeded database, listening on a free loopback port. `prepare` may add to the app first. */
export async function serveApp(db: Database, prepare?: (app: App) => void): Promise<Served> {
  const app = createApp({
    db,
    sessionSecret: 'bench-secret-that-is-long-enough-for-the-check',
    secureCookies: false,
    sessionIdleMs: 30 * 60_000,
    publicUrl: 'http://gripline.bench',
    catchingMail: true,
    logger: pino({ level: 'silent' }),
    rateLimit: { windowMs: 60_000, perIp: 100_000, perAccount: 100_000 },
    trustProxyHops: 0,
  });
  prepare?.(app);
  const server = createServer(app);
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => resolve());
  });
  const { port } = server.address() as AddressInfo;
  return { db, app, server, base: `http://127.0.0.1:${port}` };
}

export async function closeServed(s: Served): Promise<void> {
  s.server.closeAllConnections();
  await new Promise<void>((resolve) => s.server.close(() => resolve()));
  s.app.sessionStore.close();
  s.db.$client.close();
}

/** The headers of a signed-in JSON request. */
export const memberHeaders = (m: Member): Record<string, string> => ({ 'content-type': 'application/json', cookie: m.cookie, 'x-csrf-token': m.csrf });

/** Connection n: member n and its own tool, checkout then return, over and over. */
export function checkoutReturnRequests(members: Member[], codeOf: (n: number) => string): BenchRequest[][] {
  return members.map((m, n) => {
    const code = codeOf(n);
    const headers = memberHeaders(m);
    return [
      { method: 'POST', path: `/api/tools/${code}/checkout`, headers, body: '{}' },
      { method: 'POST', path: `/api/tools/${code}/return`, headers, body: '{"condition":"ok"}' },
    ];
  });
}

/** One connection per entry of `perConnection`, each cycling through its own requests for `seconds`. */
export async function drive(base: string, perConnection: BenchRequest[][], seconds: number): Promise<Run> {
  process.env[BENCH_ENV] = JSON.stringify(perConnection);
  const options = {
    url: base,
    connections: perConnection.length,
    pipelining: 1,
    duration: seconds,
    workers: 1,
    setupClient: SETUP_CLIENT,
    timeout: 10,
  };
  // With workers, setupClient is a file path (the types only know the function form).
  const before = performance.eventLoopUtilization();
  const cpuBefore = mainThreadCpuMs();
  try {
    const result = await autocannon(options as unknown as autocannon.Options);
    const cpuAfter = mainThreadCpuMs();
    const busyMs = cpuBefore !== undefined && cpuAfter !== undefined ? cpuAfter - cpuBefore : performance.eventLoopUtilization(before).active;
    const codes = Object.entries(result.statusCodeStats ?? {})
      .map(([code, v]) => `${code}×${v.count ?? 0}`)
      .join(' ');
    return {
      reqPerSec: result.requests.average,
      meanMs: result.latency.mean,
      p99Ms: result.latency.p99,
      total: result.requests.total,
      non2xx: result.non2xx,
      errors: result.errors,
      timeouts: result.timeouts,
      statusCodes: codes,
      busyMsPerReq: busyMs / Math.max(1, result.requests.total),
    };
  } finally {
    delete process.env[BENCH_ENV];
  }
}

/**
 * CPU time of this process's main thread (the one serving the apps; autocannon runs in a worker),
 * from /proc on Linux: utime + stime in clock ticks (100 per second). Undefined elsewhere.
 */
function mainThreadCpuMs(): number | undefined {
  try {
    const stat = readFileSync(`/proc/self/task/${process.pid}/stat`, 'utf8');
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
    return (Number(fields[11]) + Number(fields[12])) * 10;
  } catch {
    return undefined;
  }
}

/**
 * Runs a bench's `body` with a fresh temporary directory (removed at exit) under a watchdog that
 * stops it after `watchdogMs`. The exit code is 1 when `body` throws or answers false.
 */
export async function runBench(what: string, dirPrefix: string, watchdogMs: number, body: (dir: string) => Promise<boolean>): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), dirPrefix));
  const cleanup = () => rmSync(dir, { recursive: true, force: true });
  process.once('exit', cleanup);
  const watchdog = setTimeout(() => {
    console.error(`The ${what} ran past ${watchdogMs / 1000} s; stopping.`);
    process.exit(1);
  }, watchdogMs);
  watchdog.unref();
  try {
    if (!(await body(dir))) process.exitCode = 1;
  } catch (err: unknown) {
    console.error(err);
    process.exitCode = 1;
  } finally {
    cleanup();
    clearTimeout(watchdog);
  }
}

/** Printed under every table: other work on a shared machine moves absolute figures. */
export function printLoadAverage(): void {
  const [load1] = loadavg();
  console.log(`load average now: ${load1!.toFixed(1)} on ${availableParallelism()} cores (other work on this machine moves absolute figures; compare ratios)`);
}

/** Reports every run that met refusals, errors or timeouts; true when none did. */
export function noRefusals<R extends Run>(runs: R[], nameOf: (run: R) => string): boolean {
  const bad = runs.filter((f) => f.non2xx > 0 || f.errors > 0 || f.timeouts > 0);
  for (const f of bad) {
    console.error(`FAILED: ${nameOf(f)}: ${f.non2xx} non-2xx, ${f.errors} errors, ${f.timeouts} timeouts (${f.statusCodes}); a bench full of refusals measures nothing.`);
  }
  return bad.length === 0;
}

export const fmt = (n: number, digits = 1, width = 9) => n.toFixed(digits).padStart(width);
export const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;
export { median } from './median';

/** Seconds since `startedAt`, for progress lines. */
export const elapsedSince = (startedAt: number) => () => `[${((Date.now() - startedAt) / 1000).toFixed(0).padStart(3)} s]`;
