/**
 * autocannon `setupClient` for the HTTP benches (drive() in tests/bench/http-bench.ts). autocannon runs its connections in a
 * worker thread (so the load generator does not share the server's event loop) and loads this file
 * there by path; a worker receives no functions, so the per-connection requests come through the
 * environment the bench sets before each run (a worker starts with a copy of the parent's env).
 *
 * Connection n gets the n-th entry: its own member's session cookie and CSRF token and its own
 * list of requests (checkout and return of its own tool, or the scans it opens), cycled for the whole run.
 */

interface BenchRequest {
  method: 'GET' | 'POST';
  path: string;
  headers: Record<string, string>;
  body?: string;
}

interface BenchClient {
  setRequests(requests: BenchRequest[]): void;
}

/** Same name as in http-bench.ts (a CommonJS file with `export =` exports nothing else). */
const BENCH_ENV = 'GRIPLINE_BENCH_CONNECTIONS';

let next = 0;

function setupClient(client: BenchClient): void {
  const all = JSON.parse(process.env[BENCH_ENV] ?? '[]') as BenchRequest[][];
  const mine = all[next++];
  if (!mine) throw new Error(`${BENCH_ENV} holds ${all.length} connections; connection ${next} has none.`);
  client.setRequests(mine);
}

export = setupClient;
